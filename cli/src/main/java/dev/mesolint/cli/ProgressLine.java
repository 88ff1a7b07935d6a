package dev.mesolint.cli;

import dev.mesolint.core.engine.RunProgress;
import java.io.PrintWriter;
import java.util.function.LongSupplier;

/**
 * One line on standard error that a long run keeps rewriting ("mesolint: 412/900 files, 37 findings"), so that a
 * person at a terminal sees it is moving. It stays silent for the first second (short runs print nothing), redraws
 * at most ten times a second, and {@link #finish()} wipes it so the report that follows starts on a clean line.
 */
final class ProgressLine implements RunProgress {
    /** Runs shorter than this print nothing: a line that flashes and vanishes only distracts. */
    static final long QUIET_NANOS = 1_000_000_000L;
    private static final long REDRAW_NANOS = 100_000_000L;

    private final PrintWriter err;
    private final LongSupplier clock;
    private final long started;
    private long lastDrawn = Long.MIN_VALUE;
    private int width;

    ProgressLine(PrintWriter err, LongSupplier clock) {
        this.err = err;
        this.clock = clock;
        this.started = clock.getAsLong();
    }

    /**
     * The progress a command should use: a line on standard error for {@code --progress=always}, or for
     * {@code auto} when it is a terminal and {@code --quiet} is off; otherwise none.
     */
    static RunProgress choose(OutputOptions.ProgressMode mode, boolean quiet, boolean terminal, PrintWriter err) {
        boolean on = switch (mode) {
            case ALWAYS -> true;
            case NEVER -> false;
            case AUTO -> terminal && !quiet;
        };
        return on ? new ProgressLine(err, System::nanoTime) : RunProgress.NONE;
    }

    @Override
    public synchronized void fileChecked(int done, int total, int findings) {
        long now = clock.getAsLong();
        if (now - started < QUIET_NANOS || (done < total && lastDrawn != Long.MIN_VALUE
                && now - lastDrawn < REDRAW_NANOS)) {
            return;
        }
        lastDrawn = now;
        String text = "mesolint: " + done + "/" + total + " files, " + findings + " finding" + (findings == 1 ? "" : "s");
        err.print("\r" + text + " ".repeat(Math.max(0, width - text.length())));
        width = text.length();
        err.flush();
    }

    /** Wipes the line, if one was drawn. */
    synchronized void finish() {
        if (width > 0) {
            err.print("\r" + " ".repeat(width) + "\r");
            err.flush();
            width = 0;
        }
    }

    /** Wipes the line of {@code progress} when it is one. */
    static void finish(RunProgress progress) {
        if (progress instanceof ProgressLine line) {
            line.finish();
        }
    }
}
