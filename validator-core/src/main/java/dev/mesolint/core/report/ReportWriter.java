package dev.mesolint.core.report;

import java.io.IOException;
import java.io.Writer;

/** Writes one run in one format. Implementations hold no state between calls. */
public interface ReportWriter {
    /** Writes the whole report to {@code out} (UTF-8 text); does not close it. */
    void write(ReportInput input, Writer out) throws IOException;
}
