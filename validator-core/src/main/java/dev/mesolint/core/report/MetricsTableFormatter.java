package dev.mesolint.core.report;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.model.LiftWeek;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Plain-text tables for a terminal: credited hard sets per muscle (rows) and week (columns), the top set's %1RM per
 * lift and week, then each session with its estimated minutes and hard sets. Thread-safe.
 */
public final class MetricsTableFormatter {
    private static final String NL = System.lineSeparator();
    private static final int MUSCLE_WIDTH = 12;
    private static final int WEEK_WIDTH = 7;

    public void write(List<FileMetrics> files, Writer out) throws IOException {
        out.write(format(files));
        out.flush();
    }

    public String format(List<FileMetrics> files) {
        StringBuilder sb = new StringBuilder();
        for (FileMetrics file : files) {
            if (sb.length() > 0) {
                sb.append(NL);
            }
            programme(sb, file);
        }
        return sb.toString();
    }

    private static void programme(StringBuilder sb, FileMetrics file) {
        ProgrammeMetrics m = file.metrics();
        sb.append(m.programmeId()).append(" (").append(file.file()).append(')').append(NL).append(NL);
        hardSetGrid(sb, m.weeks());
        sb.append(NL);
        topSetGrid(sb, m);
        sessions(sb, m.weeks());
    }

    /** Lifts with a known share of 1RM in some week: the top set's %1RM per week, "-" where unknown or not done. */
    private static void topSetGrid(StringBuilder sb, ProgrammeMetrics m) {
        Set<String> lifts = new LinkedHashSet<>();
        m.weeks().forEach(w -> w.lifts().stream().filter(l -> l.topSetFraction().isPresent())
                .forEach(l -> lifts.add(l.exerciseId())));
        if (lifts.isEmpty()) {
            return;
        }
        int width = lifts.stream().mapToInt(String::length).max().orElse(0) + 2;
        sb.append("Top set, % of 1RM, per week").append(NL);
        StringBuilder header = new StringBuilder(alignLeft("lift", width));
        m.weeks().forEach(w -> header.append(alignRight("w" + w.number() + (w.deload() ? "*" : ""), WEEK_WIDTH)));
        sb.append(header.toString().stripTrailing()).append(NL);
        for (String lift : lifts) {
            StringBuilder row = new StringBuilder(alignLeft(lift, width));
            for (WeekMetrics w : m.weeks()) {
                OptionalDouble top = w.lift(lift).map(LiftWeek::topSetFraction).orElse(OptionalDouble.empty());
                row.append(alignRight(top.isPresent() ? Numbers.fixed(100 * top.getAsDouble(), 1) : "-", WEEK_WIDTH));
            }
            sb.append(row).append(NL);
        }
        sb.append(NL);
    }

    private static void hardSetGrid(StringBuilder sb, List<WeekMetrics> weeks) {
        sb.append("Credited hard sets per week (prime mover 1, synergist 0.5)").append(NL);
        StringBuilder header = new StringBuilder(alignLeft("muscle", MUSCLE_WIDTH));
        boolean anyDeload = false;
        for (WeekMetrics w : weeks) {
            header.append(alignRight("w" + w.number() + (w.deload() ? "*" : ""), WEEK_WIDTH));
            anyDeload |= w.deload();
        }
        sb.append(header.toString().stripTrailing()).append(NL);
        for (Muscle muscle : trained(weeks)) {
            StringBuilder row = new StringBuilder(alignLeft(muscle.yamlName(), MUSCLE_WIDTH));
            for (WeekMetrics w : weeks) {
                row.append(alignRight(Numbers.fixed(w.hardSets(muscle), 1), WEEK_WIDTH));
            }
            sb.append(row).append(NL);
        }
        if (anyDeload) {
            sb.append("* deload week").append(NL);
        }
    }

    private static void sessions(StringBuilder sb, List<WeekMetrics> weeks) {
        sb.append("Sessions").append(NL);
        sb.append(alignLeft("week", 6)).append(alignLeft("day", 5)).append(alignLeft("session", 20)).append(alignRight("minutes", 8))
                .append(alignRight("hard sets", 11)).append(NL);
        for (WeekMetrics w : weeks) {
            for (SessionMetrics s : w.sessions()) {
                long hardSets = s.sets().stream().filter(SetMetrics::hard).count();
                String name = s.name() == null || s.name().isBlank() ? "-" : s.name();
                sb.append(alignLeft(Integer.toString(w.number()), 6)).append(alignLeft(Integer.toString(s.day()), 5))
                        .append(alignLeft(name, 20)).append(alignRight(Numbers.fixed(s.minutes(), 1), 8))
                        .append(alignRight(Long.toString(hardSets), 11)).append(NL);
            }
        }
    }

    private static List<Muscle> trained(List<WeekMetrics> weeks) {
        Set<Muscle> muscles = EnumSet.noneOf(Muscle.class);
        weeks.forEach(w -> muscles.addAll(w.muscles().keySet()));
        return new ArrayList<>(muscles);
    }

    private static String alignLeft(String text, int width) {
        String t = text.length() >= width ? text.substring(0, width - 1) : text;
        return t + " ".repeat(width - t.length());
    }

    private static String alignRight(String text, int width) {
        return text.length() >= width ? " " + text : " ".repeat(width - text.length()) + text;
    }
}
