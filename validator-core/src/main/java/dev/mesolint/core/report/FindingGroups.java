package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Week;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Sorts a file's findings into the week and session they are about, for the HTML report.
 *
 * <p>The week comes from the message ("week 3 ...") when it names one, else from the first week whose written
 * YAML node contains the finding's pointer; the session is the one of that week whose node contains the pointer (a
 * repeated week shares the nodes of the week it repeats), else the day the message names. Findings about neither go to
 * the whole-programme group.
 */
final class FindingGroups {
    private static final Pattern WEEK = Pattern.compile("\\bweek (\\d+)\\b", Pattern.CASE_INSENSITIVE);
    private static final Pattern DAY = Pattern.compile("\\bday (\\d+)\\b", Pattern.CASE_INSENSITIVE);

    /** One group: {@code week} and {@code day} are null for the whole programme, {@code day} null for a whole week. */
    record Group(Integer week, Integer day, String title, List<Finding> findings) {
    }

    private FindingGroups() {
    }

    static List<Group> of(FileReport file, List<Finding> findings) {
        Map<String, Group> groups = new LinkedHashMap<>();
        for (Finding f : findings) {
            Place place = place(file.programme(), f);
            String key = place.week + "/" + place.day + "/" + place.session;
            groups.computeIfAbsent(key, k -> new Group(place.week, place.day, title(file.programme(), place),
                    new ArrayList<>())).findings().add(f);
        }
        List<Group> sorted = new ArrayList<>(groups.values());
        sorted.sort(Comparator.comparing(Group::week, Comparator.nullsFirst(Comparator.naturalOrder()))
                .thenComparing(Group::day, Comparator.nullsFirst(Comparator.naturalOrder())));
        return sorted.stream().map(g -> new Group(g.week(), g.day(), g.title(), List.copyOf(g.findings()))).toList();
    }

    /** Where a finding belongs; {@code session} is the label of the session found by pointer, if any. */
    record Place(Integer week, Integer day, String session) {
    }

    static Place place(Optional<Programme> programme, Finding f) {
        Integer named = number(WEEK, f.message());
        Integer namedDay = number(DAY, f.message());
        if (programme.isEmpty()) {
            return new Place(named, named == null ? null : namedDay, null);
        }
        String pointer = f.location().pointer();
        Integer week = named;
        Integer day = null;
        for (Week w : programme.get().weeks()) {
            if (named != null && w.number() != named) {
                continue;
            }
            for (Session s : w.sessions()) {
                if (contains(s.location().pointer(), pointer)) {
                    return new Place(w.number(), s.day(), s.label());
                }
            }
            if (week == null && contains(w.location().pointer(), pointer)) {
                week = w.number();
            }
        }
        if (week != null && namedDay != null) {
            day = namedDay;
        }
        return new Place(week, day, null);
    }

    private static boolean contains(String node, String pointer) {
        return !node.isEmpty() && (pointer.equals(node) || pointer.startsWith(node + "/"));
    }

    private static Integer number(Pattern pattern, String text) {
        Matcher m = pattern.matcher(text);
        return m.find() ? Integer.valueOf(m.group(1)) : null;
    }

    private static String title(Optional<Programme> programme, Place place) {
        if (place.week == null) {
            return "Whole programme";
        }
        String week = "Week " + place.week;
        if (place.day == null) {
            return week;
        }
        if (place.session != null) {
            return week + " · " + place.session;
        }
        String session = programme.flatMap(p -> p.weeks().stream().filter(w -> w.number() == place.week)
                .flatMap(w -> w.sessions().stream()).filter(s -> s.day() == place.day).findFirst())
                .map(Session::label).orElse("day " + place.day);
        return week + " · " + session;
    }
}
