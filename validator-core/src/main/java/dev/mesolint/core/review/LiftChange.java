package dev.mesolint.core.review;

/**
 * One exercise's figures in one week before and after.
 *
 * @param topSetIntensity the heaviest working set as a percentage of 1RM; empty where no set's share of 1RM is known
 * @param volumeLoad      reps x weight over the sets whose weight is known, in the programme's unit
 */
public record LiftChange(int week, String exercise, Delta topSetIntensity, Delta volumeLoad) {

    public boolean changed() {
        return topSetIntensity.changed() || volumeLoad.changed();
    }
}
