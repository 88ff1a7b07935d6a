package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Muscle;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Week-over-week figures of each muscle's hard sets: the acute:chronic ratio (this week over the mean of up to
 * {@code acuteChronicWeeks} weeks before, Gabbett 2016) and the change from the week before.
 */
final class TrendCalculator {
    private static final Muscle[] MUSCLES = Muscle.values();

    private final int chronicWeeks;

    TrendCalculator(ModelParameters params) {
        this.chronicWeeks = params.acuteChronicWeeks();
    }

    /** The weeks, in block order, with their trend figures filled in. */
    List<WeekMetrics> withTrends(List<WeekMetrics> weeks) {
        // each week's hard sets by muscle ordinal (0 where not trained), and which muscles it trains
        double[][] hardSets = new double[weeks.size()][];
        long[] trained = new long[weeks.size()];
        for (int w = 0; w < weeks.size(); w++) {
            double[] byOrdinal = new double[MUSCLES.length];
            long muscles = 0;
            for (Map.Entry<Muscle, MuscleWeek> m : weeks.get(w).muscles().entrySet()) {
                byOrdinal[m.getKey().ordinal()] = m.getValue().hardSets();
                muscles |= MuscleValues.bit(m.getKey().ordinal());
            }
            hardSets[w] = byOrdinal;
            trained[w] = muscles;
        }
        List<WeekMetrics> result = new ArrayList<>(weeks.size());
        for (int i = 0; i < weeks.size(); i++) {
            int from = Math.max(0, i - chronicWeeks); // the weeks before: from .. i - 1
            long muscles = 0;
            for (int w = from; w <= i; w++) {
                muscles |= trained[w];
            }
            Map<Muscle, Double> acuteChronic = new EnumMap<>(Muscle.class);
            Map<Muscle, Double> change = new EnumMap<>(Muscle.class);
            for (long left = muscles; left != 0; left &= left - 1) {
                int m = Long.numberOfTrailingZeros(left);
                double acute = hardSets[i][m];
                double chronic = meanHardSets(hardSets, from, i, m);
                if (chronic > 0) {
                    acuteChronic.put(MUSCLES[m], acute / chronic);
                }
                double previous = i == from ? 0 : hardSets[i - 1][m];
                if (previous > 0) {
                    change.put(MUSCLES[m], (acute - previous) / previous);
                }
            }
            result.add(weeks.get(i).withTrends(acuteChronic, change));
        }
        return List.copyOf(result);
    }

    /**
     * The mean hard sets of muscle {@code m} over weeks {@code from} to {@code to} (exclusive); 0 for no weeks. Hard
     * sets are sums of credits 1 and 0.5, exact in binary, so a plain sum gives what a compensated stream sum gives.
     */
    private static double meanHardSets(double[][] hardSets, int from, int to, int m) {
        if (to == from) {
            return 0;
        }
        double sum = 0;
        for (int w = from; w < to; w++) {
            sum += hardSets[w][m];
        }
        return sum / (to - from);
    }
}
