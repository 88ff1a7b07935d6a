package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Week-over-week figures of each muscle's hard sets: the acute:chronic ratio (this week over the mean of up to
 * {@code acuteChronicWeeks} weeks before, Gabbett 2016) and the change from the week before.
 */
final class TrendCalculator {
    private final int chronicWeeks;

    TrendCalculator(ModelParameters params) {
        this.chronicWeeks = params.acuteChronicWeeks();
    }

    /** The weeks, in block order, with their trend figures filled in. */
    List<WeekMetrics> withTrends(List<WeekMetrics> weeks) {
        List<WeekMetrics> result = new ArrayList<>(weeks.size());
        for (int i = 0; i < weeks.size(); i++) {
            WeekMetrics current = weeks.get(i);
            List<WeekMetrics> before = weeks.subList(Math.max(0, i - chronicWeeks), i);
            Map<Muscle, Double> acuteChronic = new EnumMap<>(Muscle.class);
            Map<Muscle, Double> change = new EnumMap<>(Muscle.class);
            for (Muscle muscle : musclesIn(current, before)) {
                double acute = current.hardSets(muscle);
                double chronic = meanHardSets(before, muscle);
                if (chronic > 0) {
                    acuteChronic.put(muscle, acute / chronic);
                }
                double previous = before.isEmpty() ? 0 : before.get(before.size() - 1).hardSets(muscle);
                if (previous > 0) {
                    change.put(muscle, (acute - previous) / previous);
                }
            }
            result.add(current.withTrends(acuteChronic, change));
        }
        return List.copyOf(result);
    }

    /**
     * The mean of the weeks' hard sets; 0 for no weeks. Hard sets are sums of credits 1 and 0.5, exact in binary,
     * so a plain sum gives what a compensated stream sum gives, without a stream per week and muscle.
     */
    private static double meanHardSets(List<WeekMetrics> weeks, Muscle muscle) {
        if (weeks.isEmpty()) {
            return 0;
        }
        double sum = 0;
        for (WeekMetrics week : weeks) {
            sum += week.hardSets(muscle);
        }
        return sum / weeks.size();
    }

    private static Set<Muscle> musclesIn(WeekMetrics current, List<WeekMetrics> before) {
        Set<Muscle> muscles = EnumSet.noneOf(Muscle.class);
        muscles.addAll(current.muscles().keySet());
        before.forEach(w -> muscles.addAll(w.muscles().keySet()));
        return muscles;
    }
}
