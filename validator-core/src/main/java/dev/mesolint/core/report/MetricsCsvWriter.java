package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.model.EffortAgreement;
import dev.mesolint.core.model.MuscleWeek;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import java.io.IOException;
import java.io.Writer;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.stream.Collectors;

/**
 * Writes the model's figures as CSV for spreadsheets, in two tables (a CSV file holds one table):
 *
 * <ul>
 *   <li>{@link #write}: one row per working set, with its week and session;</li>
 *   <li>{@link #writeMuscleWeeks}: one row per week and muscle, with the trend figures.</li>
 * </ul>
 *
 * <p>Comma-separated, CRLF line ends and quoting as in RFC 4180, a header row first, decimal points, an empty field
 * for a figure the model cannot know. The last row carries the caution in its first field, the others empty, so
 * that the table keeps its shape and whoever opens it sees the caution. Thread-safe.
 */
public final class MetricsCsvWriter {

    static final List<String> SET_COLUMNS = List.of("file", "programme", "week", "deload", "day", "session",
            "exercise", "set", "round", "line", "reps", "rir", "effort_source", "hard", "stimulating_reps",
            "extra_reps", "prime_mover", "recruitment", "stimulus", "rest_after_s", "load_fraction", "volume_load",
            "agreement", "reps_to_failure", "implied_rir", "stated_rir");

    static final List<String> MUSCLE_WEEK_COLUMNS = List.of("file", "programme", "week", "deload", "muscle",
            "hard_sets", "stimulating_reps", "stimulus", "hard_sessions", "gaps_h", "unknown_effort_sets",
            "acute_chronic", "change");

    /** One row per working set. */
    public void write(List<FileMetrics> files, Writer out) throws IOException {
        out.write(CsvRow.of(SET_COLUMNS));
        for (FileMetrics file : files) {
            for (WeekMetrics week : file.metrics().weeks()) {
                for (SessionMetrics session : week.sessions()) {
                    for (SetMetrics set : session.sets()) {
                        out.write(CsvRow.of(setRow(file, week, session, set)));
                    }
                }
            }
        }
        out.write(cautionRow(SET_COLUMNS.size()));
        out.flush();
    }

    /** One row per week and muscle trained that week. */
    public void writeMuscleWeeks(List<FileMetrics> files, Writer out) throws IOException {
        out.write(CsvRow.of(MUSCLE_WEEK_COLUMNS));
        for (FileMetrics file : files) {
            for (WeekMetrics week : file.metrics().weeks()) {
                for (Map.Entry<Muscle, MuscleWeek> e : week.muscles().entrySet()) {
                    out.write(CsvRow.of(muscleWeekRow(file, week, e.getKey(), e.getValue())));
                }
            }
        }
        out.write(cautionRow(MUSCLE_WEEK_COLUMNS.size()));
        out.flush();
    }

    /** The closing row: the caution, then empty fields up to the header's width. */
    static String cautionRow(int columns) {
        List<String> fields = new java.util.ArrayList<>(java.util.Collections.nCopies(columns, ""));
        fields.set(0, "Caution: " + Mesolint.CAUTION);
        return CsvRow.of(fields);
    }

    private static List<String> setRow(FileMetrics file, WeekMetrics week, SessionMetrics session, SetMetrics set) {
        EffortAgreement a = set.agreement();
        return List.of(file.file(), file.metrics().programmeId(), Integer.toString(week.number()),
                Boolean.toString(week.deload()), Integer.toString(session.day()),
                session.name() == null ? "" : session.name(), set.exerciseId(), Integer.toString(set.setNumber()),
                Integer.toString(set.round()), Integer.toString(set.location().line()), CsvRow.number(set.reps()),
                CsvRow.number(set.rir()), EnumNames.of(set.effortSource()), Boolean.toString(set.hard()),
                CsvRow.number(set.stimulatingReps()), CsvRow.number(set.extraReps()),
                set.primeMover().map(Muscle::yamlName).orElse(""), CsvRow.number(set.recruitment()),
                CsvRow.number(set.stimulus()), CsvRow.number(set.restAfterSeconds()),
                CsvRow.number(set.effort().loadFraction()), CsvRow.number(set.volumeLoad()), EnumNames.of(a.status()),
                CsvRow.number(a.repsToFailure()), CsvRow.number(a.impliedRir()), CsvRow.number(a.statedRir()));
    }

    private static List<String> muscleWeekRow(FileMetrics file, WeekMetrics week, Muscle muscle, MuscleWeek m) {
        String gaps = m.gapsHours().stream().map(Numbers::text).collect(Collectors.joining(" "));
        return List.of(file.file(), file.metrics().programmeId(), Integer.toString(week.number()),
                Boolean.toString(week.deload()), muscle.yamlName(), CsvRow.number(m.hardSets()),
                CsvRow.number(m.stimulatingReps()), CsvRow.number(m.stimulus()), Integer.toString(m.hardSessions()),
                gaps, CsvRow.number(m.unknownEffortSets()), CsvRow.number(optional(week.acuteChronic(), muscle)),
                CsvRow.number(optional(week.change(), muscle)));
    }

    private static OptionalDouble optional(Map<Muscle, Double> map, Muscle muscle) {
        Double v = map.get(muscle);
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }
}
