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
import java.util.SortedSet;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Sorts a file's findings into the weeks and session they are about, for the HTML report.
 *
 * <p>The weeks are those the message names ({@code weeks 5-7}), else the first week whose written YAML node contains
 * the finding's pointer; the session is the one of the first of those weeks whose node contains the pointer (a
 * repeated week shares the nodes of the week it repeats), else the day the message names. A finding about weeks 5-7
 * is grouped under "Weeks 5-7", never under week 1 whose lines those weeks repeat. Findings about no week go to the
 * whole-programme group.
 */
final class FindingGroups {
    private static final Pattern DAY = Pattern.compile("\\bday (\\d+)\\b", Pattern.CASE_INSENSITIVE);

    /**
     * One group: {@code weeks} empty for the whole programme, {@code day} null for whole weeks.
     *
     * @param weeks the weeks the group's findings are about, in order
     */
    record Group(SortedSet<Integer> weeks, Integer day, String title, List<Finding> findings) {
        /** The first week, or null for the whole programme. */
        Integer week() {
            return weeks.isEmpty() ? null : weeks.first();
        }
    }

    private FindingGroups() {
    }

    static List<Group> of(FileReport file, List<Finding> findings) {
        Map<String, Group> groups = new LinkedHashMap<>();
        for (Finding f : findings) {
            Place place = place(file.programme(), f);
            String key = place.weeks + "/" + place.day + "/" + place.session;
            groups.computeIfAbsent(key, k -> new Group(place.weeks, place.day, title(file.programme(), place),
                    new ArrayList<>())).findings().add(f);
        }
        List<Group> sorted = new ArrayList<>(groups.values());
        sorted.sort(Comparator.comparing(Group::week, Comparator.nullsFirst(Comparator.naturalOrder()))
                .thenComparing(g -> g.weeks().size())
                .thenComparing(Group::day, Comparator.nullsFirst(Comparator.naturalOrder())));
        return sorted.stream().map(g -> new Group(g.weeks(), g.day(), g.title(), List.copyOf(g.findings()))).toList();
    }

    /** Where a finding belongs; {@code session} is the label of the session found by pointer, if any. */
    record Place(SortedSet<Integer> weeks, Integer day, String session) {
    }

    static Place place(Optional<Programme> programme, Finding f) {
        SortedSet<Integer> named = FindingWeeks.of(f);
        Integer namedDay = f.facts().subject().day() != null ? f.facts().subject().day() : number(DAY, f.message());
        if (programme.isEmpty()) {
            return new Place(named, named.isEmpty() ? null : namedDay, null);
        }
        String pointer = f.location().pointer();
        SortedSet<Integer> weeks = named;
        for (Week w : programme.get().weeks()) {
            if (!named.isEmpty() && w.number() != named.first()) {
                continue;
            }
            for (Session s : w.sessions()) {
                if (contains(s.location().pointer(), pointer)) {
                    return new Place(named.isEmpty() ? single(w.number()) : named, s.day(), s.label());
                }
            }
            if (weeks.isEmpty() && contains(w.location().pointer(), pointer)) {
                weeks = single(w.number());
            }
        }
        return new Place(weeks, !weeks.isEmpty() && namedDay != null ? namedDay : null, null);
    }

    /** True when the finding at {@code pointer} lies inside the node at {@code node}. */
    static boolean contains(String node, String pointer) {
        return !node.isEmpty() && (pointer.equals(node) || pointer.startsWith(node + "/"));
    }

    private static SortedSet<Integer> single(int week) {
        SortedSet<Integer> one = new TreeSet<>();
        one.add(week);
        return one;
    }

    private static Integer number(Pattern pattern, String text) {
        Matcher m = pattern.matcher(text);
        return m.find() ? Integer.valueOf(m.group(1)) : null;
    }

    private static String title(Optional<Programme> programme, Place place) {
        if (place.weeks.isEmpty()) {
            return "Whole programme";
        }
        String weeks = FindingWeeks.title(place.weeks);
        if (place.day == null) {
            return weeks;
        }
        if (place.session != null) {
            return weeks + " · " + place.session;
        }
        int first = place.weeks.first();
        String session = programme.flatMap(p -> p.weeks().stream().filter(w -> w.number() == first)
                .flatMap(w -> w.sessions().stream()).filter(s -> s.day() == place.day).findFirst())
                .map(Session::label).orElse("day " + place.day);
        return weeks + " · " + session;
    }
}
