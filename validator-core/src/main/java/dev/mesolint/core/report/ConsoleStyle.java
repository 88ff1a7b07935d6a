package dev.mesolint.core.report;

import dev.mesolint.core.finding.Severity;

/**
 * How the console form marks up its text: not at all (files, pipes, {@code NO_COLOR}), or with ANSI colours for a
 * terminal. Only the path and the severity word are coloured, so a reader who cannot tell the colours apart loses
 * nothing.
 */
public enum ConsoleStyle {
    PLAIN,
    ANSI;

    private static final String RESET = "\u001b[0m";

    /** The file path: bold. */
    public String path(String text) {
        return this == ANSI ? "\u001b[1m" + text + RESET : text;
    }

    /** The severity word: red for errors, yellow for warnings, cyan for info; dim when waived or baselined. */
    public String severity(Severity severity, boolean quietened, String text) {
        if (this == PLAIN) {
            return text;
        }
        String code = quietened ? "2" : switch (severity) {
            case ERROR -> "1;31";
            case WARNING -> "33";
            case INFO -> "36";
            case OFF -> "2";
        };
        return "\u001b[" + code + "m" + text + RESET;
    }

    /** The fix and waiver lines under a finding: dim. */
    public String detail(String text) {
        return this == ANSI ? "\u001b[2m" + text + RESET : text;
    }

    /**
     * The style for a stream: {@code always} and {@code never} decide; {@code auto} colours a terminal unless the
     * {@code NO_COLOR} convention (any non-empty value) says not to.
     */
    public static ConsoleStyle choose(String mode, boolean terminal, String noColor) {
        return switch (mode) {
            case "always" -> ANSI;
            case "never" -> PLAIN;
            default -> terminal && (noColor == null || noColor.isEmpty()) ? ANSI : PLAIN;
        };
    }
}
