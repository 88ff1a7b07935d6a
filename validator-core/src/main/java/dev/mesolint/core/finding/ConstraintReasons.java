package dev.mesolint.core.finding;

/**
 * Leaves the reasons of athlete constraints out of a message. The constraint rules quote the reason as
 * {@code (reason given: ...)}; a reason is health data and does not belong in a comment others read, nor in a report
 * uploaded to a code-scanning service.
 */
public final class ConstraintReasons {
    /** How a rule quotes a reason in a message; {@link #leaveOut} finds it by this. */
    public static final String MARK = "(reason given: ";
    public static final String LEFT_OUT = "(reason left out)";

    private ConstraintReasons() {
    }

    /** {@code message} with each {@code (reason given: ...)}, nested brackets and all, as {@link #LEFT_OUT}. */
    public static String leaveOut(String message) {
        StringBuilder out = new StringBuilder();
        int from = 0;
        int at;
        while ((at = message.indexOf(MARK, from)) >= 0) {
            out.append(message, from, at).append(LEFT_OUT);
            int depth = 1;
            int i = at + MARK.length();
            while (i < message.length() && depth > 0) {
                char c = message.charAt(i++);
                depth += c == '(' ? 1 : c == ')' ? -1 : 0;
            }
            from = i;
        }
        return out.append(message.substring(from)).toString();
    }
}
