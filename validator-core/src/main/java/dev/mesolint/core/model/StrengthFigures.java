package dev.mesolint.core.model;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * Per-lift strength figures from the sets the session calculator already resolved: intensity zones per session,
 * top set, mean intensity, volume load and heavy reps per week. Lifts keep the order they first appear in.
 */
final class StrengthFigures {
    /** Rounding slack, so that 0.8 written as 80% of a 1RM in pounds still counts as 80%. */
    private static final double EPSILON = 1e-9;

    private final double[] zoneFrom;
    private final double heavyFrom;

    StrengthFigures(ModelParameters params) {
        this.zoneFrom = new double[] {0, params.intensityZone1From(), params.intensityZone2From(),
                params.intensityZone3From(), params.intensityZone4From()};
        this.heavyFrom = params.heavyRepsFrom();
    }

    List<LiftSession> perSession(List<SetMetrics> sets) {
        Map<String, List<SetMetrics>> byLift = byLift(sets);
        List<LiftSession> lifts = new ArrayList<>(byLift.size());
        byLift.forEach((id, liftSets) -> lifts.add(zones(id, liftSets)));
        return List.copyOf(lifts);
    }

    List<LiftWeek> perWeek(int week, List<SessionMetrics> sessions) {
        Map<String, List<SetMetrics>> byLift = byLift(sessions.stream().flatMap(s -> s.sets().stream()).toList());
        List<LiftWeek> lifts = new ArrayList<>(byLift.size());
        byLift.forEach((id, liftSets) -> lifts.add(week(week, id, liftSets)));
        return List.copyOf(lifts);
    }

    private static Map<String, List<SetMetrics>> byLift(List<SetMetrics> sets) {
        Map<String, List<SetMetrics>> byLift = new LinkedHashMap<>();
        sets.forEach(s -> byLift.computeIfAbsent(s.exerciseId(), k -> new ArrayList<>()).add(s));
        return byLift;
    }

    private LiftSession zones(String id, List<SetMetrics> sets) {
        int[] zoneSets = new int[zoneFrom.length];
        double[] zoneReps = new double[zoneFrom.length];
        double unknown = 0;
        for (SetMetrics set : sets) {
            OptionalDouble fraction = set.effort().loadFraction();
            if (fraction.isEmpty()) {
                unknown += set.reps();
                continue;
            }
            int zone = zoneOf(fraction.getAsDouble());
            zoneSets[zone]++;
            zoneReps[zone] += set.reps();
        }
        List<IntensityZone> zones = new ArrayList<>(zoneFrom.length);
        for (int i = 0; i < zoneFrom.length; i++) {
            OptionalDouble below = i + 1 < zoneFrom.length ? OptionalDouble.of(zoneFrom[i + 1]) : OptionalDouble.empty();
            zones.add(new IntensityZone(i, zoneFrom[i], below, zoneSets[i], zoneReps[i]));
        }
        return new LiftSession(id, zones, unknown);
    }

    private int zoneOf(double fraction) {
        for (int i = zoneFrom.length - 1; i > 0; i--) {
            if (fraction + EPSILON >= zoneFrom[i]) {
                return i;
            }
        }
        return 0;
    }

    private LiftWeek week(int week, String id, List<SetMetrics> sets) {
        double reps = 0;
        double knownReps = 0;
        double weightedIntensity = 0;
        double heavyReps = 0;
        double volume = 0;
        boolean anyVolume = false;
        int unknown = 0;
        OptionalDouble top = OptionalDouble.empty();
        OptionalDouble topLoad = OptionalDouble.empty();
        for (SetMetrics set : sets) {
            reps += set.reps();
            if (set.volumeLoad().isPresent()) {
                volume += set.volumeLoad().getAsDouble();
                anyVolume = true;
            }
            OptionalDouble weight = set.effort().absoluteLoad();
            if (weight.isPresent() && (topLoad.isEmpty() || weight.getAsDouble() > topLoad.getAsDouble())) {
                topLoad = weight;
            }
            OptionalDouble fraction = set.effort().loadFraction();
            if (fraction.isEmpty()) {
                unknown++;
                continue;
            }
            double f = fraction.getAsDouble();
            knownReps += set.reps();
            weightedIntensity += f * set.reps();
            if (f + EPSILON >= heavyFrom) {
                heavyReps += set.reps();
            }
            if (top.isEmpty() || f > top.getAsDouble()) {
                top = fraction;
            }
        }
        OptionalDouble mean = knownReps > 0 ? OptionalDouble.of(weightedIntensity / knownReps) : OptionalDouble.empty();
        return new LiftWeek(week, id, sets.size(), reps, top, topLoad, mean,
                anyVolume ? OptionalDouble.of(volume) : OptionalDouble.empty(), heavyReps, unknown);
    }
}
