package dev.mesolint.core.review;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.finding.Finding;
import java.io.PrintWriter;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;

/**
 * The review as a pull-request comment in GitHub-flavoured Markdown: a heading and a summary line, per changed
 * programme a table of the changed figures, the limits crossed and the new findings, with resolved and unchanged
 * findings collapsed in {@code <details>}; the caution last. Constraint reasons are left out unless asked.
 */
public final class ReviewMarkdown implements ReviewWriter {
    /** Longer tables are cut: a comment is for reading, the JSON report has every row. */
    static final int MAX_ROWS = 40;
    private static final String ARROW = "→";

    @Override
    public void write(ReviewInput input, Writer target) {
        PrintWriter out = new PrintWriter(target);
        Review review = input.review();
        out.println("### mesolint: changes since " + code(review.base().shown()) + " (" + review.base().shortCommit()
                + ")");
        out.println();
        out.println("**" + escape(ReviewText.summary(review)) + "**. Compared " + escape(review.base().label())
                + " with " + escape(review.headLabel()) + ".");
        for (ProgrammeChange p : review.changed()) {
            out.println();
            out.println("#### " + code(p.path()) + " — " + escape(ReviewText.status(p, ARROW)));
            table(out, p);
            if (!p.limits().isEmpty()) {
                out.println();
                out.println("Limits crossed:");
                out.println();
                p.limits().forEach(l -> out.println("- " + (l.kind().worse() ? "**" + escape(ReviewText.limit(l, ARROW))
                        + "**" : escape(ReviewText.limit(l, ARROW)))));
            }
            if (!p.findings().introduced().isEmpty()) {
                out.println();
                out.println("New findings:");
                out.println();
                p.findings().introduced().forEach(f -> out.println(item(f, input)));
            }
            details(out, p, input);
        }
        out.println();
        out.println("> **Caution.** " + escape(Mesolint.CAUTION));
        out.flush();
    }

    private static void table(PrintWriter out, ProgrammeChange p) {
        List<String[]> rows = new ArrayList<>();
        for (MuscleWeekChange m : p.figures().muscles()) {
            for (ReviewText.Named f : ReviewText.changedFigures(m)) {
                rows.add(row(m.week(), m.muscle() + " " + f.name(), f.delta()));
            }
        }
        for (SessionChange s : p.figures().sessions()) {
            rows.add(row(s.week(), ReviewText.session(s) + " minutes", s.minutes()));
        }
        for (LiftChange l : p.figures().lifts()) {
            for (ReviewText.Named f : ReviewText.changedFigures(l, p.units().orElse(""))) {
                rows.add(row(l.week(), l.exercise() + " " + f.name(), f.delta()));
            }
        }
        if (rows.isEmpty()) {
            return;
        }
        out.println();
        out.println("| week | figure | before | after | change |");
        out.println("|---:|---|---:|---:|---:|");
        rows.stream().limit(MAX_ROWS).forEach(r -> out.println("| " + String.join(" | ", r) + " |"));
        if (rows.size() > MAX_ROWS) {
            out.println();
            out.println("_" + (rows.size() - MAX_ROWS) + " more changed figures: see the JSON output._");
        }
    }

    private static String[] row(int week, String figure, Delta d) {
        return new String[] {String.valueOf(week), escape(figure), ReviewText.side(d.before(), d.step()),
            ReviewText.side(d.after(), d.step()),
            d.before().isPresent() && d.after().isPresent() ? ReviewText.signed(d.change(), d.step()) : ""};
    }

    private static void details(PrintWriter out, ProgrammeChange p, ReviewInput input) {
        List<Finding> resolved = p.findings().resolved();
        List<Finding> unchanged = p.findings().unchanged();
        if (resolved.isEmpty() && unchanged.isEmpty()) {
            return;
        }
        out.println();
        out.println("<details><summary>" + resolved.size() + " resolved, " + unchanged.size()
                + " unchanged findings</summary>");
        out.println();
        if (!resolved.isEmpty()) {
            out.println("Resolved:");
            out.println();
            resolved.forEach(f -> out.println(item(f, input)));
            out.println();
        }
        if (!unchanged.isEmpty()) {
            out.println("Unchanged:");
            out.println();
            unchanged.forEach(f -> out.println(item(f, input)));
            out.println();
        }
        out.println("</details>");
    }

    private static String item(Finding f, ReviewInput input) {
        return "- " + f.severity().label() + " " + code(f.ruleId()) + " at " + code(f.file() + ":" + f.location().line())
                + ": " + escape(input.message(f));
    }

    /** Inline code; ids and paths hold no backticks, but a stray one must not end the span early. */
    static String code(String text) {
        return "`" + text.replace("`", "'") + "`";
    }

    /** Text that Markdown and GitHub's HTML filter read literally, inside table cells too. */
    static String escape(String text) {
        StringBuilder out = new StringBuilder();
        for (char c : text.toCharArray()) {
            switch (c) {
                case '\\', '`', '*', '_', '[', ']', '|', '#', '~' -> out.append('\\').append(c);
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '&' -> out.append("&amp;");
                case '\n', '\r' -> out.append(' ');
                default -> out.append(c);
            }
        }
        return out.toString();
    }
}
