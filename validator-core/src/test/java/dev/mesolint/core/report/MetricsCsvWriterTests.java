package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.testing.HarbourDemo;
import java.io.IOException;
import java.io.StringWriter;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

class MetricsCsvWriterTests {

    private static final ProgrammeMetrics METRICS = HarbourDemo.metrics();

    private static List<String> lines(String csv) {
        return Arrays.asList(csv.split("\r\n"));
    }

    @Test
    void oneRowPerWorkingSetAfterTheHeader() throws IOException {
        StringWriter out = new StringWriter();
        new MetricsCsvWriter().write(List.of(new FileMetrics("harbour.yaml", METRICS)), out);
        List<String> lines = lines(out.toString());
        long sets = METRICS.weeks().stream().flatMap(w -> w.sessions().stream()).mapToLong(s -> s.sets().size())
                .sum();
        assertEquals(String.join(",", MetricsCsvWriter.SET_COLUMNS), lines.get(0));
        assertEquals(sets + 2, lines.size(), "the header, a row per set, the caution");
        assertEquals(MetricsCsvWriter.cautionRow(MetricsCsvWriter.SET_COLUMNS.size()).strip(),
                lines.get(lines.size() - 1));
        assertTrue(lines.get(lines.size() - 1).contains("not a medical assessment"));
        assertTrue(out.toString().endsWith("\r\n"), "RFC 4180 record ends");
        // First set: bench press, 8 reps at RIR 2: 3 stimulating reps (common practice).
        List<String> first = Arrays.asList(lines.get(1).split(",", -1));
        assertEquals("barbell-bench-press", first.get(MetricsCsvWriter.SET_COLUMNS.indexOf("exercise")));
        assertEquals("8", first.get(MetricsCsvWriter.SET_COLUMNS.indexOf("reps")));
        assertEquals("2", first.get(MetricsCsvWriter.SET_COLUMNS.indexOf("rir")));
        assertEquals("3", first.get(MetricsCsvWriter.SET_COLUMNS.indexOf("stimulating_reps")));
    }

    @Test
    void unknownFiguresAreEmptyFields() throws IOException {
        StringWriter out = new StringWriter();
        new MetricsCsvWriter().write(List.of(new FileMetrics("harbour.yaml", METRICS)), out);
        String legExtension = lines(out.toString()).stream().filter(l -> l.contains(",leg-extension,1,"))
                .findFirst().orElseThrow();
        List<String> fields = Arrays.asList(legExtension.split(",", -1));
        assertEquals("", fields.get(MetricsCsvWriter.SET_COLUMNS.indexOf("rir")));
        assertEquals("unknown", fields.get(MetricsCsvWriter.SET_COLUMNS.indexOf("effort_source")));
    }

    @Test
    void fieldsWithCommasOrQuotesAreQuoted() throws IOException {
        StringWriter out = new StringWriter();
        new MetricsCsvWriter().write(List.of(new FileMetrics("blocks/\"spring, 2025\".yaml", METRICS)), out);
        // RFC 4180, section 2: quotes around the field, inner quotes doubled.
        assertTrue(lines(out.toString()).get(1).startsWith("\"blocks/\"\"spring, 2025\"\".yaml\","));
    }

    @Test
    void oneRowPerWeekAndMuscle() throws IOException {
        StringWriter out = new StringWriter();
        new MetricsCsvWriter().writeMuscleWeeks(List.of(new FileMetrics("harbour.yaml", METRICS)), out);
        List<String> lines = lines(out.toString());
        long rows = METRICS.weeks().stream().mapToLong(w -> w.muscles().size()).sum();
        assertEquals(rows + 2, lines.size(), "the header, a row per week and muscle, the caution");
        String chestWeek2 = lines.stream().filter(l -> l.startsWith("harbour.yaml,harbour-test-block,2,true,chest,"))
                .findFirst().orElseThrow();
        List<String> fields = Arrays.asList(chestWeek2.split(",", -1));
        // Week 2 repeats week 1 (same sets), so chest hard sets are unchanged: change 0, acute:chronic 1.
        assertEquals("0", fields.get(MetricsCsvWriter.MUSCLE_WEEK_COLUMNS.indexOf("change")));
        assertEquals("1", fields.get(MetricsCsvWriter.MUSCLE_WEEK_COLUMNS.indexOf("acute_chronic")));
    }
}
