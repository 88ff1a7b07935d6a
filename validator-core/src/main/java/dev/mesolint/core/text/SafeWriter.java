package dev.mesolint.core.text;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.Writer;

/**
 * A writer that passes on only what {@link SafeText#data} keeps: every report file is written through one, so a string
 * a writer forgot to clean can neither stop the UTF-8 encoder (a lone surrogate) nor make the XML invalid. A high
 * surrogate is held back until the next character shows whether it completes a pair.
 */
public final class SafeWriter extends FilterWriter {
    private char pendingHigh;
    private boolean pending;

    public SafeWriter(Writer out) {
        super(out);
    }

    @Override
    public void write(int c) throws IOException {
        char ch = (char) c;
        if (pending) {
            pending = false;
            if (Character.isLowSurrogate(ch)) {
                out.write(pendingHigh);
                out.write(ch);
                return;
            }
            out.write(SafeText.REPLACEMENT);
        }
        if (Character.isHighSurrogate(ch)) {
            pendingHigh = ch;
            pending = true;
        } else {
            out.write(SafeText.data(String.valueOf(ch)));
        }
    }

    @Override
    public void write(char[] chars, int offset, int length) throws IOException {
        write(new String(chars, offset, length), 0, length);
    }

    @Override
    public void write(String text, int offset, int length) throws IOException {
        String part = text.substring(offset, offset + length);
        int start = 0;
        if (pending && !part.isEmpty()) {
            write(part.charAt(0));
            start = 1;
        }
        int end = part.length();
        boolean holdLast = end > start && Character.isHighSurrogate(part.charAt(end - 1));
        if (holdLast) {
            end--;
        }
        out.write(SafeText.data(part.substring(start, end)));
        if (holdLast) {
            pendingHigh = part.charAt(end);
            pending = true;
        }
    }

    @Override
    public void flush() throws IOException {
        out.flush();
    }

    @Override
    public void close() throws IOException {
        if (pending) {
            pending = false;
            out.write(SafeText.REPLACEMENT);
        }
        out.close();
    }
}
