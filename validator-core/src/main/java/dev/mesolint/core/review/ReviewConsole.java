package dev.mesolint.core.review;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.finding.Finding;
import java.io.PrintWriter;
import java.io.Writer;
import java.util.List;

/**
 * The review for a terminal: changes only, one line per changed figure group, limit or finding, then the summary
 * and the caution. Unchanged findings are counted, not listed.
 */
public final class ReviewConsole implements ReviewWriter {
    private static final String ARROW = "->";

    @Override
    public void write(ReviewInput input, Writer target) {
        PrintWriter out = new PrintWriter(target);
        Review review = input.review();
        out.println("mesolint diff: " + review.base().label() + " " + ARROW + " " + review.headLabel());
        for (ProgrammeChange p : review.changed()) {
            out.println(p.path() + ": " + ReviewText.status(p, ARROW));
            for (MuscleWeekChange m : p.figures().muscles()) {
                out.println("  week " + m.week() + " " + m.muscle() + ": " + join(ReviewText.changedFigures(m)));
            }
            for (SessionChange s : p.figures().sessions()) {
                out.println("  week " + s.week() + " " + ReviewText.session(s) + ": minutes "
                        + ReviewText.delta(s.minutes(), ARROW));
            }
            String units = p.units().orElse("");
            for (LiftChange l : p.figures().lifts()) {
                out.println("  week " + l.week() + " " + l.exercise() + ": "
                        + join(ReviewText.changedFigures(l, units)));
            }
            for (LimitCrossing l : p.limits()) {
                out.println("  limit " + ReviewText.limit(l, ARROW));
            }
            findings(out, "new", p.findings().introduced(), input);
            findings(out, "resolved", p.findings().resolved(), input);
        }
        out.println(ReviewText.summary(review));
        out.println("Note: " + Mesolint.CAUTION);
        out.flush();
    }

    private static String join(List<ReviewText.Named> figures) {
        return String.join(", ", figures.stream().map(f -> f.name() + " " + ReviewText.delta(f.delta(), ARROW))
                .toList());
    }

    private static void findings(PrintWriter out, String state, List<Finding> findings, ReviewInput input) {
        for (Finding f : findings) {
            out.println("  " + state + " " + ReviewText.finding(f, input.message(f)));
        }
    }
}
