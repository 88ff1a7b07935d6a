package dev.mesolint.core.report;

import dev.mesolint.core.finding.ConstraintReasons;
import dev.mesolint.core.finding.Finding;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * What the machine-readable reports (SARIF, JSON) say of athlete-constraint reasons: nothing, unless the front end
 * asks ({@link ReportOptions#includeReasons()}). Reasons are health data, and these reports are uploaded to
 * code-scanning services and kept in CI logs. Works on findings alone (a cached run has no loaded programme), so
 * the constraint rules' quoted reasons and the {@code reason:} values of quoted source lines are what it removes.
 * Fingerprints never contain a reason to begin with.
 */
final class ReportedReasons {
    private static final Set<String> CONSTRAINT_RULES = Set.of("constraint-avoid", "constraint-load");
    /** A {@code reason:} key and its value on one line: quoted, or plain up to a flow separator or a comment. */
    private static final Pattern REASON = Pattern.compile(
            "(\\breason:[ \\t]*)(\"(?:[^\"\\\\]|\\\\.)*\"?|'(?:[^']|'')*'?|[^,}\\]#\\r\\n]*[^,}\\]#\\s])");

    private final boolean keep;

    ReportedReasons(ReportOptions options) {
        this.keep = options.includeReasons();
    }

    /** A finding's message or fix as published. */
    String text(Finding finding, String text) {
        return keep || !CONSTRAINT_RULES.contains(finding.ruleId()) ? text : ConstraintReasons.leaveOut(text);
    }

    /**
     * Source lines as published: every {@code reason:} value left out, a block scalar's lines too. A waiver's reason
     * in a snippet goes as well; the report carries it where it belongs, as the waiver's own field.
     */
    String snippet(String lines) {
        if (keep) {
            return lines;
        }
        List<String> out = new ArrayList<>();
        int blockIndent = -1;
        for (String line : lines.split("\n", -1)) {
            int indent = indent(line);
            if (blockIndent >= 0 && (line.isBlank() || indent > blockIndent)) {
                out.add(line.isBlank() ? line : line.substring(0, indent) + ConstraintReasons.LEFT_OUT);
                continue;
            }
            blockIndent = -1;
            Matcher m = REASON.matcher(line);
            StringBuilder redacted = new StringBuilder();
            while (m.find()) {
                if (m.group(2).startsWith("|") || m.group(2).startsWith(">")) {
                    blockIndent = indent;
                }
                m.appendReplacement(redacted, Matcher.quoteReplacement(m.group(1) + ConstraintReasons.LEFT_OUT));
            }
            m.appendTail(redacted);
            out.add(redacted.toString());
        }
        return String.join("\n", out);
    }

    private static int indent(String line) {
        int i = 0;
        while (i < line.length() && (line.charAt(i) == ' ' || line.charAt(i) == '\t')) {
            i++;
        }
        return i;
    }
}
