package dev.mesolint.core.rules;

import static dev.mesolint.core.rules.RuleRun.exercise;
import static dev.mesolint.core.rules.RuleRun.header;
import static dev.mesolint.core.rules.RuleRun.session;
import static dev.mesolint.core.rules.RuleRun.week;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.mesolint.core.finding.Finding;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EffortMissingRuleTests {
    @TempDir
    Path dir;

    @Test
    void aWrittenPlaceIsReportedOnceForEveryWeekThatRepeatsIt() {
        String yaml = header() + "weeks:\n" + week(1, false, session(1,
                exercise("barbell-bench-press", "sets: 4\nreps: 8\nrir: 2\nrest: 3min"),
                exercise("cable-chest-fly", "sets: 3\nreps: 12\nrest: 90s")))
                + "  - week: 2\n    repeat: 1\n  - week: 3\n    repeat: 2\n    adjust: {sets: +1}\n";
        List<Finding> findings = RuleRun.defaults().findings(dir, yaml, EffortMissingRule.ID);
        assertEquals(1, findings.size(), findings.toString());
        assertEquals("cable-chest-fly, weeks 1-3 day 1, sets 1-4: 12 reps with no effort stated (rir, rpe or load), "
                + "so these sets never count as hard sets", findings.get(0).message());
    }

    @Test
    void amrapStatesItsEffort() {
        String yaml = header() + "weeks:\n" + week(1, false, session(1,
                exercise("barbell-bench-press", "sets: 4\nreps: 8\nrir: 2\nrest: 3min"),
                exercise("push-up", "sets: 1\nreps: amrap")));
        assertEquals(List.of(), RuleRun.defaults().findings(dir, yaml, EffortMissingRule.ID));
    }
}
