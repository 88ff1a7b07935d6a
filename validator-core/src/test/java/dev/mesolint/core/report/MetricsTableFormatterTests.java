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
    void sessionsListTheirMinutes() {
        List<String> sessionLines = text.lines().filter(l -> l.matches("\\d\\s+\\d\\s+.*")).toList();
        assertEquals(6, sessionLines.size(), text);
        assertTrue(sessionLines.get(0).matches("1\\s+1\\s+Upper A\\s+\\d+\\.\\d\\s+\\d+"), sessionLines.get(0));
    }
}
