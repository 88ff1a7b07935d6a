package dev.mesolint.core.model;

import java.util.ArrayList;
import java.util.HashMap;
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
    /** Each zone's upper bound (exclusive); empty for the open-ended top zone. */
    private final OptionalDouble[] zoneBelow;
    /** The zones of a lift none of whose sets has a known share of 1RM. */
    private final List<IntensityZone> emptyZones;

    StrengthFigures(ModelParameters params) {
        this.zoneFrom = new double[] {0, params.intensityZone1From(), params.intensityZone2From(),
                params.intensityZone3From(), params.intensityZone4From()};
        this.heavyFrom = params.heavyRepsFrom();
        this.zoneBelow = new OptionalDouble[zoneFrom.length];
        for (int i = 0; i < zoneFrom.length; i++) {
            zoneBelow[i] = i + 1 < zoneFrom.length ? OptionalDouble.of(zoneFrom[i + 1]) : OptionalDouble.empty();
        }
        IntensityZone[] empty = new IntensityZone[zoneFrom.length];
        for (int i = 0; i < zoneFrom.length; i++) {
            empty[i] = new IntensityZone(i, zoneFrom[i], zoneBelow[i], 0, 0);
        }
        this.emptyZones = List.of(empty);
    }

    List<LiftSession> perSession(List<SetMetrics> sets) {
        Lifts<SessionLift> lifts = new Lifts<>();
        for (SetMetrics set : sets) {
            SessionLift lift = lifts.find(set.exerciseId());
            if (lift == null) {
                lift = lifts.add(new SessionLift(set.exerciseId(), zoneFrom.length));
            }
            OptionalDouble fraction = set.effort().loadFraction();
            if (fraction.isEmpty()) {
                lift.unknown += set.reps();
                continue;
            }
            int zone = zoneOf(fraction.getAsDouble());
            lift.anyKnown = true;
            lift.zoneSets[zone]++;
            lift.zoneReps[zone] += set.reps();
        }
        LiftSession[] out = new LiftSession[lifts.inOrder.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = zones(lifts.inOrder.get(i));
        }
        return List.of(out);
    }

    List<LiftWeek> perWeek(int week, List<SessionMetrics> sessions) {
        Lifts<WeekLift> lifts = new Lifts<>();
        for (SessionMetrics session : sessions) {
            for (SetMetrics set : session.sets()) {
                WeekLift lift = lifts.find(set.exerciseId());
                if (lift == null) {
                    lift = lifts.add(new WeekLift(set.exerciseId()));
                }
                lift.add(set, heavyFrom);
            }
        }
        LiftWeek[] out = new LiftWeek[lifts.inOrder.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = lifts.inOrder.get(i).toWeek(week);
        }
        return List.of(out);
    }

    private LiftSession zones(SessionLift lift) {
        if (!lift.anyKnown) { // every zone empty: the shared list
            return new LiftSession(lift.id, emptyZones, lift.unknown);
        }
        IntensityZone[] zones = new IntensityZone[zoneFrom.length];
        for (int i = 0; i < zoneFrom.length; i++) {
            zones[i] = new IntensityZone(i, zoneFrom[i], zoneBelow[i], lift.zoneSets[i], lift.zoneReps[i]);
        }
        return new LiftSession(lift.id, List.of(zones), lift.unknown);
    }

    private int zoneOf(double fraction) {
        for (int i = zoneFrom.length - 1; i > 0; i--) {
            if (fraction + EPSILON >= zoneFrom[i]) {
                return i;
            }
        }
        return 0;
    }

    /** Lifts in the order each first appears, found by id; the lift of the set before is tried first. */
    private static final class Lifts<L extends Lift> {
        final List<L> inOrder = new ArrayList<>();
        private final Map<String, L> byId = new HashMap<>();
        private L last;

        /** The lift with this id; null when none yet. */
        L find(String id) {
            if (last == null || !last.id.equals(id)) {
                last = byId.get(id);
            }
            return last;
        }

        L add(L lift) {
            inOrder.add(lift);
            byId.put(lift.id, lift);
            last = lift;
            return lift;
        }
    }

    /** A lift's running totals, in the order its sets are done. */
    private abstract static class Lift {
        final String id;

        Lift(String id) {
            this.id = id;
        }
    }

    private static final class SessionLift extends Lift {
        final int[] zoneSets;
        final double[] zoneReps;
        double unknown;
        /** Whether some set's share of 1RM is known, so that some zone holds it. */
        boolean anyKnown;

        SessionLift(String id, int zones) {
            super(id);
            zoneSets = new int[zones];
            zoneReps = new double[zones];
        }
    }

    private static final class WeekLift extends Lift {
        int sets;
        double reps;
        double knownReps;
        double weightedIntensity;
        double heavyReps;
        double volume;
        boolean anyVolume;
        int unknown;
        OptionalDouble top = OptionalDouble.empty();
        OptionalDouble topLoad = OptionalDouble.empty();

        WeekLift(String id) {
            super(id);
        }

        void add(SetMetrics set, double heavyFrom) {
            sets++;
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
                return;
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

        LiftWeek toWeek(int week) {
            OptionalDouble mean = knownReps > 0 ? OptionalDouble.of(weightedIntensity / knownReps)
                    : OptionalDouble.empty();
            return new LiftWeek(week, id, sets, reps, top, topLoad, mean,
                    anyVolume ? OptionalDouble.of(volume) : OptionalDouble.empty(), heavyReps, unknown);
        }
    }
}
