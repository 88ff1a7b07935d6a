package dev.mesolint.core.engine;

/**
 * Told after each programme file of a run is checked, from the checking thread, so that a caller can show how far a
 * long run has come. Implementations must be thread-safe and cheap: files are checked in parallel.
 */
@FunctionalInterface
public interface RunProgress {
    /** Nobody is listening. */
    RunProgress NONE = (done, total, findings) -> { };

    /**
     * @param done     files checked so far, this one included
     * @param total    files the run checks
     * @param findings findings reported so far, over all checked files
     */
    void fileChecked(int done, int total, int findings);
}
