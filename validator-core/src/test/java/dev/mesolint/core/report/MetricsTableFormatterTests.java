package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.testing.HarbourDemo;
import java.util.List;
import org.junit.jupiter.api.Test;

class MetricsTableFormatterTests {

    private final String text = new MetricsTableFormatter()
            .format(List.of(new FileMetrics("harbour.yaml", HarbourDemo.metrics())));

    private String line(String start) {
        return text.lines().filter(l -> l.startsWith(start)).findFirst().orElseThrow(() -> new AssertionError(
                "no line starting with '" + start + "' in\n" + text));
    }

    @Test
    void weeksAreColumnsAndDeloadsAreMarked() {
        assertTrue(line("muscle").matches("muscle\\s+w1\\s+w2\\*"), line("muscle"));
        assertTrue(text.contains("* deload week"));
    }

    @Test
    void musclesAreRowsOfCreditedHardSets() {
        // Week 1 chest: 3 bench sets at RIR 2 (credit 1) + 2 fly sets at RIR 1 (credit 1) = 5 hard sets.
        assertTrue(line("chest ").matches("chest\\s+5\\.0\\s+5\\.0"), line("chest "));
    }

    @Test
    void liftsAreRowsOfTheirTopSetsPercentOfOneRepMax() {
        // Bench 75% of 1RM in week 1, 65% in the deload week; squat 100 kg of a 140 kg 1RM = 71.4% (100 / 140).
        assertTrue(line("barbell-bench-press ").matches("barbell-bench-press\\s+75\\.0\\s+65\\.0"),
                line("barbell-bench-press "));
        assertTrue(line("barbell-back-squat ").matches("barbell-back-squat\\s+71\\.4\\s+71\\.4"),
                line("barbell-back-squat "));
        // A weight with no 1RM (the row at 60 kg) has no share of 1RM: no row.
        assertTrue(text.lines().noneMatch(l -> l.startsWith("barbell-row ")), text);
    }

    @Test
    void sessionsListTheirMinutes() {
        List<String> sessionLines = text.lines().filter(l -> l.matches("\\d\\s+\\d\\s+.*")).toList();
        assertEquals(6, sessionLines.size(), text);
        assertTrue(sessionLines.get(0).matches("1\\s+1\\s+Upper A\\s+\\d+\\.\\d\\s+\\d+"), sessionLines.get(0));
    }
}
