package dev.mesolint.core.review;

import dev.mesolint.core.finding.Finding;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/** The wording every review output shares: figures, changes, limits, the summary line. */
final class ReviewText {
    private ReviewText() {
    }

    /** A figure at its step: {@code 5}, {@code 2.5}, {@code 1.28}. */
    static String number(double value, double step) {
        int decimals = Math.max(0, (int) Math.round(-Math.log10(step)));
        BigDecimal d = BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP).stripTrailingZeros();
        return d.signum() == 0 ? "0" : d.toPlainString();
    }

    /** {@code +2}, {@code -3.5}. */
    static String signed(double value, double step) {
        String text = number(value, step);
        return value > 0 && !text.equals("0") ? "+" + text : text;
    }

    static String side(OptionalDouble value, double step) {
        return value.isPresent() ? number(value.getAsDouble(), step) : "none";
    }

    /** {@code 3 -> 5 (+2)}, {@code none -> 5}, {@code 3 -> none}. */
    static String delta(Delta d, String arrow) {
        String text = side(d.before(), d.step()) + " " + arrow + " " + side(d.after(), d.step());
        return d.before().isPresent() && d.after().isPresent() ? text + " (" + signed(d.change(), d.step()) + ")"
                : text;
    }

    /** The figures of a muscle's week that changed, by name. */
    static List<Named> changedFigures(MuscleWeekChange m) {
        List<Named> figures = new ArrayList<>();
        add(figures, "working sets", m.workingSets());
        add(figures, "hard sets", m.hardSets());
        add(figures, "stimulus", m.stimulus());
        return figures;
    }

    static List<Named> changedFigures(LiftChange lift, String units) {
        List<Named> figures = new ArrayList<>();
        add(figures, "top set % of 1RM", lift.topSetIntensity());
        add(figures, "volume load (" + units + ")", lift.volumeLoad());
        return figures;
    }

    private static void add(List<Named> figures, String name, Delta d) {
        if (d.changed()) {
            figures.add(new Named(name, d));
        }
    }

    /** A figure's name with its change. */
    record Named(String name, Delta delta) {
    }

    static String session(SessionChange s) {
        return "day " + s.day() + " (" + s.name() + ")";
    }

    /** {@code chest weekly hard sets 3 -> 5, back at or above the floor of 4}. */
    static String limit(LimitCrossing l, String arrow) {
        double step = l.measure().equals("session minutes") ? FigureChanges.MINUTES_STEP : FigureChanges.SETS_STEP;
        return "week " + l.week() + " " + l.subject() + ": " + l.measure() + " " + number(l.before(), step) + " "
                + arrow + " " + number(l.after(), step) + ", " + l.kind().words() + " of " + number(l.limit(), step);
    }

    /** What happened to the file, with both paths for a rename. */
    static String status(ProgrammeChange p, String arrow) {
        return switch (p.status()) {
            case RENAMED -> "renamed from " + p.before().orElseThrow();
            case UNCHANGED -> p.profileChanged() ? "file unchanged" : "file unchanged, findings changed";
            default -> p.status().words();
        } + (p.profileChanged() ? ", profile " + p.profileBefore().orElseThrow() + " " + arrow + " "
                + p.profileAfter().orElseThrow() : "")
                + (p.status() != ProgrammeChange.Status.ADDED && !p.loadedBefore() ? ", did not load at the base" : "")
                + (p.status() != ProgrammeChange.Status.REMOVED && !p.loadedAfter() ? ", does not load now" : "");
    }

    static String plural(long n, String one, String many) {
        return n + " " + (n == 1 ? one : many);
    }

    /** {@code 2 programmes changed (1 edited, 1 renamed); findings: 1 new, 2 resolved, 7 unchanged; ...}. */
    static String summary(Review review) {
        List<ProgrammeChange> changed = review.changed();
        List<String> kinds = new ArrayList<>();
        for (ProgrammeChange.Status s : ProgrammeChange.Status.values()) {
            long n = changed.stream().filter(p -> p.status() == s).count();
            if (n > 0) {
                kinds.add(n + " " + (s == ProgrammeChange.Status.UNCHANGED ? "with an unchanged file" : s.words()));
            }
        }
        long crossed = changed.stream().mapToLong(p -> p.limits().size()).sum();
        return plural(changed.size(), "programme", "programmes") + " changed"
                + (kinds.isEmpty() ? "" : " (" + String.join(", ", kinds) + ")")
                + "; findings: " + review.introducedCount() + " new, " + review.resolvedCount() + " resolved, "
                + review.unchangedCount() + " unchanged; " + plural(crossed, "limit", "limits") + " crossed"
                + (crossed > 0 ? " (" + review.limitsBroken() + " out of bounds)" : "");
    }

    /** {@code path:line:column: severity rule: message}. */
    static String finding(Finding f, String message) {
        return f.file() + ":" + f.location().line() + ":" + f.location().column() + ": " + f.severity().label() + " "
                + f.ruleId() + ": " + message;
    }
}
