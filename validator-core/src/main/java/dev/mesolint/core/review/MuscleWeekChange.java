package dev.mesolint.core.review;

/**
 * One muscle's weekly figures before and after.
 *
 * @param workingSets working sets whose prime mover is this muscle (uncredited count)
 * @param hardSets    credited hard sets (1 per prime-mover set, 0.5 per synergist set)
 * @param stimulus    the week's stimulus after diminishing returns, in fresh-hard-set units
 */
public record MuscleWeekChange(int week, String muscle, Delta workingSets, Delta hardSets, Delta stimulus) {

    public boolean changed() {
        return workingSets.changed() || hardSets.changed() || stimulus.changed();
    }
}
