package dev.mesolint.core.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.source.Violation;
import dev.mesolint.core.testing.Programmes;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import dev.mesolint.core.yaml.YamlProblem;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The inputs that crashed or blew up earlier versions, kept as regressions: chained repeats that grow past the format's
 * bounds, and numbers too large for the int and long they are read into. Each is a located error naming its key.
 */
class ExpansionBoundsTests {
    private static final FormatSchema SCHEMA = FormatSchema.load(FormatSchema.PROGRAMME);
    private final LocatedYamlReader reader = new LocatedYamlReader(YamlLimits.DEFAULTS);

    private List<Violation> problems(String text) throws YamlProblem {
        LocatedDocument doc = reader.read(text);
        List<Violation> schema = SCHEMA.validate(doc);
        return schema.isEmpty() ? new ProgrammeBinder().bind(doc).violations() : schema;
    }

    private static String week1(String work) {
        return Programmes.HEADER + """
                weeks:
                  - week: 1
                    sessions:
                      - day: 1
                        name: Upper
                        work:
                """ + "          " + work + "\n";
    }

    @Test
    void chainedRepeatsThatAddSetsStopAtTwentyWithAnErrorAtTheAdjustKey() throws YamlProblem {
        StringBuilder text = new StringBuilder(week1("- {exercise: barbell-bench-press, sets: 3, reps: 8, rir: 2}"));
        for (int k = 2; k <= 104; k++) {
            text.append("  - {week: ").append(k).append(", repeat: ").append(k - 1).append(", adjust: {sets: 19}}\n");
        }
        List<Violation> v = problems(text.toString());
        // Week 2 asks 3 + 19 = 22 sets; the schema's bound is 20 sets (docs/format.md, Limits).
        Violation first = v.get(0);
        assertEquals("/weeks/1/adjust/sets", first.location().pointer());
        assertEquals(text.toString().lines().toList().indexOf("  - {week: 2, repeat: 1, adjust: {sets: 19}}") + 1,
                first.location().line());
        assertTrue(first.message().contains("barbell-bench-press sets reach 22; the format allows at most 20"),
                first.message());
        assertEquals(103, v.size(), "one error per repeating week, each at its own adjust: sets");
    }

    @Test
    void aRepCountPushedOverAHundredByAdjustIsAnError() throws YamlProblem {
        String text = week1("- {exercise: barbell-bench-press, sets: 3, reps: 90, rir: 2}")
                + "  - {week: 2, repeat: 1, adjust: {reps: 20}}\n";
        List<Violation> v = problems(text);
        assertEquals(1, v.size(), v.toString());
        assertEquals("/weeks/1/adjust/reps", v.get(0).location().pointer());
        assertTrue(v.get(0).message().contains("reach 110; the format allows at most 100"), v.get(0).message());
    }

    @Test
    void aFileThatExpandsPastTwentyThousandSetsStopsWithAnErrorAtTheRepeat() throws YamlProblem {
        StringBuilder work = new StringBuilder();
        for (int d = 1; d <= 7; d++) {
            work.append("      - day: ").append(d).append("\n        work:\n");
            for (int e = 0; e < 12; e++) {
                work.append("          - {exercise: barbell-bench-press, sets: 20, reps: 8, rir: 2}\n");
            }
        }
        // 7 days x 12 entries x 20 sets = 1,680 sets a week: week 12 crosses 20,000.
        StringBuilder text = new StringBuilder(Programmes.HEADER + "weeks:\n  - week: 1\n    sessions:\n" + work);
        for (int k = 2; k <= 20; k++) {
            text.append("  - {week: ").append(k).append(", repeat: 1}\n");
        }
        List<Violation> v = problems(text.toString());
        assertEquals(1, v.size(), v.toString());
        assertEquals("/weeks/11/repeat", v.get(0).location().pointer());
        assertTrue(v.get(0).message().contains("by week 12 the programme expands to more than 20,000 sets"),
                v.get(0).message());
    }

    @Test
    void numbersTooLargeForALongAreOutOfRangeAtTheirKey() throws YamlProblem {
        // The crashing inputs: 1.0e19 and twenty digits for week, sets, day, reps and repeat.
        String base = week1("- {exercise: barbell-bench-press, sets: 3, reps: 8, rir: 2}")
                + "  - {week: 2, repeat: 1}\n";
        for (String number : List.of("10000000000000000000", "1.0e19", "99999999999999999999")) {
            for (String key : List.of("week: 1", "sets: 3", "day: 1", "reps: 8", "repeat: 1")) {
                String text = base.replaceFirst(key, key.substring(0, key.indexOf(' ') + 1) + number);
                List<Violation> v = problems(text);
                assertEquals(1, v.size(), key + " " + number + ": " + v);
                assertTrue(v.get(0).message().contains("is out of range (found "), v.get(0).message());
                assertTrue(v.get(0).location().pointer().endsWith("/" + key.substring(0, key.indexOf(':'))),
                        v.get(0).location().pointer());
            }
        }
    }

    @Test
    void aRepRangeBeyondAnIntIsOutOfRangeNotACrash() throws YamlProblem {
        List<Violation> v = problems(week1("- {exercise: barbell-bench-press, sets: 3, reps: 1-2147483648, rir: 2}"));
        assertEquals(1, v.size(), v.toString());
        assertTrue(v.get(0).message().contains("out of range"), v.get(0).message());
        assertTrue(v.get(0).location().pointer().endsWith("/reps"));
    }

    @Test
    void aVeryLongExerciseIdIsRefusedByTheSchemaBeforeAnyRuleComparesIt() throws YamlProblem {
        List<Violation> v = problems(week1("- {exercise: " + "a".repeat(200_000) + ", sets: 3, reps: 8, rir: 2}"));
        assertEquals(1, v.size(), v.size() + " violations");
        assertTrue(v.get(0).location().pointer().endsWith("/exercise"), v.get(0).location().pointer());
    }
}
