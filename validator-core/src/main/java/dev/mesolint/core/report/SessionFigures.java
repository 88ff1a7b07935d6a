package dev.mesolint.core.report;

import java.util.List;

/**
 * One session's figures.
 *
 * @param line    the line of the session in the programme file (its {@code day:} entry), for grouping findings
 * @param minutes the estimated session length
 * @param sets    the working sets in order
 */
public record SessionFigures(int day, String name, int line, double minutes, List<SetFigures> sets) {

    public SessionFigures {
        sets = List.copyOf(sets);
    }

    /** The stimulus of all sets before the fatigue discount. */
    public double rawStimulus() {
        return sets.stream().mapToDouble(SetFigures::stimulus).sum();
    }

    /** The stimulus of all sets after the fatigue discount. */
    public double keptStimulus() {
        return sets.stream().mapToDouble(SetFigures::discountedStimulus).sum();
    }

    /** {@code day 1 (Upper A)}, as findings name sessions. */
    public String label() {
        return name == null || name.isBlank() ? "day " + day : "day " + day + " (" + name + ")";
    }
}
