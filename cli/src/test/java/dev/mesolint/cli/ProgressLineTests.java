package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.RunProgress;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

class ProgressLineTests {
    private final StringWriter text = new StringWriter();
    private final AtomicLong now = new AtomicLong(0);
    private final ProgressLine line = new ProgressLine(new PrintWriter(text), now::get);

    @Test
    void aRunShorterThanASecondPrintsNothingAtAll() {
        now.set(ProgressLine.QUIET_NANOS - 1);
        line.fileChecked(3, 3, 2);
        line.finish();
        assertEquals("", text.toString());
    }

    @Test
    void aLongRunRewritesOneLineAndWipesItAtTheEnd() {
        now.set(ProgressLine.QUIET_NANOS);
        line.fileChecked(1, 900, 1);
        now.addAndGet(1_000_000); // 1 ms later: not redrawn, the terminal is not flooded
        line.fileChecked(2, 900, 5);
        now.addAndGet(200_000_000);
        line.fileChecked(3, 900, 5);
        assertEquals("\rmesolint: 1/900 files, 1 finding\rmesolint: 3/900 files, 5 findings", text.toString());
        line.finish();
        assertTrue(text.toString().endsWith("\r" + " ".repeat("mesolint: 3/900 files, 5 findings".length()) + "\r"),
                "the line is wiped so that the report starts at the left margin");
        assertFalse(text.toString().contains("\n"), "never a new line: it is one line rewritten");
    }

    @Test
    void theLastFileIsAlwaysDrawnSoTheCountEndsAtTheTotal() {
        now.set(ProgressLine.QUIET_NANOS);
        line.fileChecked(899, 900, 10);
        line.fileChecked(900, 900, 10);
        assertTrue(text.toString().endsWith("mesolint: 900/900 files, 10 findings"));
    }

    @Test
    void autoIsOnOnlyAtATerminalAndNeverWhenQuiet() {
        PrintWriter err = new PrintWriter(new StringWriter());
        assertSame(RunProgress.NONE, ProgressLine.choose(OutputOptions.ProgressMode.AUTO, false, false, err));
        assertSame(RunProgress.NONE, ProgressLine.choose(OutputOptions.ProgressMode.AUTO, true, true, err));
        assertTrue(ProgressLine.choose(OutputOptions.ProgressMode.AUTO, false, true, err) instanceof ProgressLine);
        assertTrue(ProgressLine.choose(OutputOptions.ProgressMode.ALWAYS, true, false, err) instanceof ProgressLine);
        assertSame(RunProgress.NONE, ProgressLine.choose(OutputOptions.ProgressMode.NEVER, false, true, err));
    }
}
