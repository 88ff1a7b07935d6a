package dev.mesolint.core.rules;

import static dev.mesolint.core.rules.RuleRun.exercise;
import static dev.mesolint.core.rules.RuleRun.header;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.mesolint.core.finding.Finding;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The one way rules report a line that repeated weeks copy: once, naming the weeks, and apart for a week whose
 * finding reads differently. Shown through a framework rule (steps added one at a time), a model rule's per-set
 * hits and a model rule's session finding.
 */
class OccurrencesTests {
    @TempDir
    Path dir;

    /** Week 1 written out, week 2 repeating it, week 3 a deload of it with one set fewer. */
    private static String programme(String sessionName, String minutes, String... exercises) {
        return header("intermediate", "hypertrophy", minutes) + "weeks:\n  - week: 1\n    sessions:\n"
                + "      - day: 1\n        name: " + sessionName + "\n        work:\n" + String.join("", exercises)
                + "  - week: 2\n    repeat: 1\n  - week: 3\n    repeat: 1\n    deload: true\n    adjust: {sets: -1}\n";
    }

    /** The messages, sorted (findings are reported in line order; these share a line). */
    private static List<String> messages(List<Finding> findings) {
        return findings.stream().map(Finding::message).sorted().toList();
    }

    @Test
    void stepsSplitTheWeeksWhoseSetsDiffer() {
        List<Finding> found = RuleRun.defaults().findings(dir, programme("Upper", null,
                exercise("barbell-bench-press", "sets: 3\nreps: 8\nrir: 2\nrest: 90s"),
                exercise("cable-chest-fly", "sets: 2\nreps: 12\nrir: 2\nrest: 90s")), ShortRestCompoundRule.ID);
        assertEquals(List.of("barbell-bench-press, week 3 day 1 (Upper), sets 1 -> 2, 2 -> cable-chest-fly: rest 90 s, "
                + "the hypertrophy profile asks for at least 120 s after compound sets",
                "barbell-bench-press, weeks 1-2 day 1 (Upper), sets 1 -> 2, 2 -> 3, 3 -> cable-chest-fly: rest 90 s, "
                        + "the hypertrophy profile asks for at least 120 s after compound sets"), messages(found));
    }

    @Test
    void setHitsNameEveryWeekAndSetOfTheirPlace() {
        String text = header() + "weeks:\n  - week: 1\n    sessions:\n      - day: 1\n        work:\n"
                + exercise("barbell-back-squat", "sets: 3\nreps: 20\nrir: 1\nrest: 3min")
                + "  - week: 2\n    repeat: 1\n  - week: 3\n    repeat: 1\n";
        List<Finding> found = RuleRun.defaults().findings(dir, text, HighRepFatigueRule.ID);
        assertEquals(List.of("barbell-back-squat, weeks 1-3 day 1, sets 1-3: 20 reps at RIR 1 is a 21-rep effort "
                + "taken close to failure on a compound lift; the hypertrophy profile flags compound sets of 15 or "
                + "more reps to failure taken to RIR 2 or closer"), messages(found));
    }

    @Test
    void theWeeksGoWhereTheRuleSaysAndOnlyThere() {
        // A session name is the user's text: a "{weeks}" in it is printed as written.
        List<Finding> found = RuleRun.defaults().findings(dir, programme("\"{weeks} circuit\"", "10",
                exercise("barbell-bench-press", "warm-up: 2\nsets: 4\nreps: 8\nrir: 2\nrest: 3min")),
                SessionTimeRule.ID);
        // docs/model.md, section 5: 1 min set-up + 2 warm-ups x 1.5 min + 4 x 8 reps x 4 s + 3 rests of 3 min = 15.1
        // min; the deload week's 3 sets: 1 + 3 + 3 x 32 s + 2 x 3 min = 11.6 min
        assertEquals(List.of("week 3 day 1 ({weeks} circuit): about 12 min estimated (3 working sets with rests, "
                + "warm-ups and set-ups), over the programme's session-minutes: 10",
                "weeks 1-2 day 1 ({weeks} circuit): about 15 min estimated (4 working sets with rests, warm-ups and "
                        + "set-ups), over the programme's session-minutes: 10"), messages(found));
    }
}
