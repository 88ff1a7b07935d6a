package dev.mesolint.core.review;

import java.io.IOException;
import java.io.Writer;

/** Writes one review in one format. Implementations hold no state between calls. */
public interface ReviewWriter {
    /** Writes the whole review to {@code out} (UTF-8 text); does not close it. */
    void write(ReviewInput input, Writer out) throws IOException;
}
