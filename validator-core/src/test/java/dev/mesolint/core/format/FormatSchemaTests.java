package dev.mesolint.core.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.source.Violation;
import dev.mesolint.core.testing.Programmes;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import dev.mesolint.core.yaml.YamlProblem;
import java.util.List;
import org.junit.jupiter.api.Test;

class FormatSchemaTests {
    private static final FormatSchema SCHEMA = FormatSchema.load(FormatSchema.PROGRAMME);
    private final LocatedYamlReader reader = new LocatedYamlReader(YamlLimits.DEFAULTS);

    private List<Violation> validate(String text) throws YamlProblem {
        return SCHEMA.validate(reader.read(text));
    }

    @Test
    void aValidProgrammeHasNoViolations() throws YamlProblem {
        assertEquals(List.of(), validate(Programmes.oneWeek()));
    }

    @Test
    void wrongValuesAreLocatedAtTheirNodeWithAHint() throws YamlProblem {
        String text = Programmes.oneWeek().replace("rest: 3min", "rest: 90").replace("reps: 8", "reps: twelve");
        List<Violation> v = validate(text);
        assertEquals(2, v.size(), v.toString());
        Violation reps = v.get(0);
        assertEquals(16, reps.location().line());
        assertEquals(19, reps.location().column());
        assertTrue(reps.message().contains("reps"), reps.message());
        assertTrue(reps.hint().contains("8-12"), reps.hint());
        Violation rest = v.get(1);
        assertEquals(18, rest.location().line());
        assertEquals(19, rest.location().column());
        assertTrue(rest.hint().contains("90s"), rest.hint());
    }

    @Test
    void clockDurationsAreTextAndABadOneIsLocated() throws YamlProblem {
        assertEquals(List.of(), validate(Programmes.oneWeek().replace("rest: 3min", "rest: 2:30")));
        List<Violation> v = validate(Programmes.oneWeek().replace("rest: 3min", "rest: 2:75"));
        assertEquals(1, v.size(), v.toString());
        assertEquals(18, v.get(0).location().line());
        assertEquals(19, v.get(0).location().column());
        assertTrue(v.get(0).message().contains("'2:75'"), v.get(0).message());
    }

    @Test
    void aMisspeltKeyPointsAtTheKeyAndSuggestsTheRightOne() throws YamlProblem {
        List<Violation> v = validate(Programmes.oneWeek().replace("sets: 3", "sest: 3"));
        assertEquals(1, v.size(), v.toString());
        assertEquals(15, v.get(0).location().line());
        assertEquals(13, v.get(0).location().column());
        assertTrue(v.get(0).message().contains("unknown key 'sest'"), v.get(0).message());
        assertEquals("did you mean 'sets'?", v.get(0).hint());
    }

    @Test
    void aMissingKeyIsReportedOnItsParent() throws YamlProblem {
        List<Violation> v = validate(Programmes.oneWeek().replace("  goal: hypertrophy\n", ""));
        assertEquals(1, v.size(), v.toString());
        assertEquals(3, v.get(0).location().line());
        assertTrue(v.get(0).message().contains("missing 'goal'"), v.get(0).message());
        assertTrue(v.get(0).hint().contains("hypertrophy, strength, general-fitness"));
    }

    @Test
    void yesNoIsNotABoolean() throws YamlProblem {
        String text = Programmes.oneWeek().replace("  - week: 1\n", "  - week: 1\n    deload: no\n");
        List<Violation> v = validate(text);
        assertEquals(1, v.size(), v.toString());
        assertEquals(10, v.get(0).location().line());
        assertTrue(v.get(0).hint().contains("true"), v.get(0).hint());
    }

    @Test
    void errorsInsideAnAnchoredWeekPointAtTheLinesThatWroteThem() throws YamlProblem {
        String text = Programmes.HEADER + """
                weeks:
                  - &base
                    week: 1
                    sessions:
                      - day: 1
                        work:
                          - exercise: barbell-bench-press
                            sets: 3
                            reps: 8
                            rir: 2
                            rest: 2:75
                  - <<: *base
                    week: 2
                """;
        List<Violation> v = validate(text);
        // one place in the file, reached through week 1 and through the alias in week 2
        assertTrue(v.stream().allMatch(x -> x.location().line() == 18 && x.location().column() == 19), v.toString());
        assertTrue(v.stream().anyMatch(x -> x.location().pointer().startsWith("/weeks/1/")), v.toString());
    }

    @Test
    void aWeekNeedsSessionsOrARepeat() throws YamlProblem {
        List<Violation> v = validate(Programmes.HEADER + "weeks:\n  - week: 1\n");
        assertEquals(1, v.size(), v.toString());
        assertTrue(v.get(0).message().contains("needs sessions, or repeat"), v.get(0).message());
    }
}
