package dev.mesolint.core.text;

/**
 * Makes text from input files safe at the edges where it leaves the tool: every report writer and the console.
 *
 * <p>Two forms. {@link #data} is for structured outputs (JSON, SARIF, JUnit XML, HTML): a lone surrogate cannot be
 * encoded in UTF-8 (the encoder fails mid-file) and most control characters are not allowed in XML, so both become
 * U+FFFD. {@link #line} is for lines a person or a CI log parser reads: nothing from input may start a new line or
 * drive the terminal, so control, line-separator and bidirectional-override characters are shown as escapes
 * ({@code \n}, {@code \e}, {@code \u202e}) and a lone surrogate as its code ({@code \ud800}).
 */
public final class SafeText {
    /** The replacement character written where input held something that cannot be written. */
    public static final char REPLACEMENT = '\uFFFD';

    private SafeText() {
    }

    /** {@code text} with lone surrogates and the control characters XML forbids replaced; tab, LF and CR kept. */
    public static String data(String text) {
        if (text == null || isCleanData(text)) {
            return text;
        }
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isHighSurrogate(c) && i + 1 < text.length() && Character.isLowSurrogate(text.charAt(i + 1))) {
                out.append(c).append(text.charAt(++i));
            } else if (Character.isSurrogate(c) || !allowedInData(c)) {
                out.append(REPLACEMENT);
            } else {
                out.append(c);
            }
        }
        return out.toString();
    }

    /** {@code text} on one line with nothing that moves the cursor or styles the terminal: escapes instead. */
    public static String line(String text) {
        if (text == null || isCleanLine(text)) {
            return text;
        }
        StringBuilder out = new StringBuilder(text.length() + 8);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isHighSurrogate(c) && i + 1 < text.length() && Character.isLowSurrogate(text.charAt(i + 1))) {
                out.append(c).append(text.charAt(++i));
            } else if (Character.isSurrogate(c) || !allowedInLine(c)) {
                out.append(escape(c));
            } else {
                out.append(c);
            }
        }
        return out.toString();
    }

    private static String escape(char c) {
        return switch (c) {
            case '\n' -> "\\n";
            case '\r' -> "\\r";
            case '\t' -> "\\t";
            case '\u001b' -> "\\e";
            case '\u0007' -> "\\a";
            case '\b' -> "\\b";
            case '\0' -> "\\0";
            default -> String.format("\\u%04x", (int) c);
        };
    }

    private static boolean isCleanData(String text) {
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isSurrogate(c) || !allowedInData(c)) {
                return false;
            }
        }
        return true;
    }

    private static boolean isCleanLine(String text) {
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isSurrogate(c) || !allowedInLine(c)) {
                return false;
            }
        }
        return true;
    }

    /** XML 1.0's characters (minus the non-characters U+FFFE/U+FFFF); C1 controls are legal there but dropped too. */
    private static boolean allowedInData(char c) {
        if (c < 0x20) {
            return c == '\t' || c == '\n' || c == '\r';
        }
        return !(c >= 0x7f && c <= 0x9f) && c != '\uFFFE' && c != '\uFFFF';
    }

    /** Printable characters only: no C0/C1 controls, no line or paragraph separators, no bidirectional controls. */
    private static boolean allowedInLine(char c) {
        if (c >= 0x20 && c < 0x7f) {
            return true; // printable ASCII, nearly every character a report writes: no table lookup
        }
        if (c <= 0x9f) { // C0 controls, DEL and C1 controls
            return false;
        }
        return switch (Character.getType(c)) {
            case Character.LINE_SEPARATOR, Character.PARAGRAPH_SEPARATOR, Character.UNASSIGNED -> false;
            case Character.FORMAT -> !isBidiControl(c) && c != '\uFEFF';
            default -> c != '\uFFFE' && c != '\uFFFF';
        };
    }

    private static boolean isBidiControl(char c) {
        return c >= '\u202a' && c <= '\u202e' || c >= '\u2066' && c <= '\u2069' || c == '\u200e' || c == '\u200f'
                || c == '\u061c';
    }
}
