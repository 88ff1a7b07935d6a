package dev.mesolint.core.yaml;

import java.io.StringReader;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.reader.StreamReader;
import org.yaml.snakeyaml.scanner.Constant;

/**
 * SnakeYAML's reader over a text already in memory: the text's code points in one array, made in one pass, where
 * the stock reader copies a sliding window and tests every character again on each 1,024-character refill (about a
 * tenth of a check's time in parsing). Positions, marks and the values it gives are the stock reader's, step for
 * step ({@code WholeTextReaderTests} drives both with the same calls); a text with a character the stock reader
 * refuses gets the stock reader ({@link #of}), so that its error is raised where and as SnakeYAML raises it.
 * Confined to the parse of one document, as the stock reader is.
 */
final class WholeTextReader extends StreamReader {
    private final int[] points;
    private final int length;
    private int pointer;
    private int index;
    private int documentIndex;
    private int line;
    private int column;

    private WholeTextReader(int[] points, int length) {
        super(new StringReader(""));
        this.points = points;
        this.length = length;
    }

    /** A reader of {@code text}: this one when every character is one SnakeYAML accepts, else the stock reader. */
    static StreamReader of(String text) {
        int n = text.length();
        int[] points = new int[n];
        int count = 0;
        for (int i = 0; i < n; ) {
            int c = Character.codePointAt(text, i);
            if (!StreamReader.isPrintable(c)) {
                return new StreamReader(new StringReader(text));
            }
            points[count++] = c;
            i += Character.charCount(c);
        }
        return new WholeTextReader(points, count);
    }

    @Override
    public Mark getMark() {
        return new Mark("'reader'", index, line, column, points, pointer);
    }

    @Override
    public void forward() {
        forward(1);
    }

    @Override
    public void forward(int n) {
        for (int i = 0; i < n && pointer < length; i++) {
            int c = points[pointer++];
            index++;
            documentIndex++;
            if (Constant.LINEBR.has(c) || c == '\r' && pointer < length && points[pointer] != '\n') {
                line++;
                column = 0;
            } else if (c != 0xFEFF) {
                column++;
            }
        }
    }

    @Override
    public int peek() {
        return pointer < length ? points[pointer] : 0;
    }

    @Override
    public int peek(int n) {
        return pointer + n < length ? points[pointer + n] : 0;
    }

    @Override
    public String prefix(int n) {
        if (n == 0) {
            return "";
        }
        return new String(points, pointer, pointer + n < length ? n : Math.min(n, length - pointer));
    }

    @Override
    public String prefixForward(int n) {
        String prefix = prefix(n);
        pointer += n;
        index += n;
        documentIndex += n;
        column += n;
        return prefix;
    }

    @Override
    public int getColumn() {
        return column;
    }

    @Override
    public int getDocumentIndex() {
        return documentIndex;
    }

    @Override
    public void resetDocumentIndex() {
        documentIndex = 0;
    }

    @Override
    public int getIndex() {
        return index;
    }

    @Override
    public int getLine() {
        return line;
    }
}
