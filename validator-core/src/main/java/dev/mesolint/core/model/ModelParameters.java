package dev.mesolint.core.model;

import java.util.Map;
import java.util.Objects;

/**
 * Every tunable figure of the training model, with its default and allowed bounds. docs/model.md explains each one.
 *
 * <p>Immutable; {@link #defaults()} meets the check values the tests hold the model to. Rule profiles override single
 * values through {@link #toBuilder()}; the constructor refuses values outside the bounds.
 *
 * @param oneRepMaxRelation         relation between %1RM and reps to failure; default {@code BRZYCKI}
 * @param effortToleranceReps       reps a load may disagree with the stated effort before it is a conflict; 2 (0..6)
 * @param hardSetMaxRir             most reps in reserve a hard set may leave; 3 (0..5)
 * @param amrapDefaultReps          reps assumed for an AMRAP set without a load: the model's reference set; 8 (1..50)
 * @param stimulatingRepsCeiling    K: the last K reps before failure stimulate growth; 5 (4..6)
 * @param stimulatingRepsTail       L: beyond K - L reps in reserve the stimulating reps fall off as L e^(-(r-K+L)/L)
 *                                  instead of reaching 0; 1.5 (0.5..1.6)
 * @param recruitmentFloor          share of the motor-unit pool with no growth potential left; 0.3 (0..0.6)
 * @param fatiguePerRep             fatigue drive of one rep at failure; 0.03 (0.005..0.1)
 * @param proximityDecay            how fast fatigue drive falls per rep in reserve; 0.3 (0..1)
 * @param highRepThreshold          reps from which each further rep counts extra; 15 (8..30)
 * @param highRepExtraWeight        extra weight of each rep past the threshold; 1.0 (0..3)
 * @param compoundFatigueFactor     fatigue multiplier for compound exercises; 1.3 (1..2)
 * @param lowerBodyRecoveryFactor   how many times slower quadriceps, glutes, hamstrings and adductors recover; 1.25
 *                                  (1..2)
 * @param recoveryTimeConstantSeconds time for residual fatigue to fall to 1/e (37%); 90 s (20..600)
 * @param techniqueFatigueFactor    fatigue multiplier for drop-set and rest-pause mini-sets; 1.5 (1..3)
 * @param dropSets                  drops a drop set makes, each to failure; 2 (1..4)
 * @param dropSetExtraReps          reps of each drop at its lower load; 6 (1..20)
 * @param dropSetLoadDrop           share of the load taken off at each drop; 0.2 (0.05..0.5)
 * @param dropSetPauseSeconds       time to change the load for the drop; 10 s (0..60)
 * @param restPauseMiniSets         mini-sets after the main set of a rest-pause set; 2 (1..5)
 * @param restPauseMiniSetReps      reps of each rest-pause mini-set; 3 (1..10)
 * @param restPausePauseSeconds     pause before each rest-pause mini-set; 20 s (5..60)
 * @param sessionPlateauSets        c: a session's effective sets level off towards c, g(x) = x / (1 + (x/c)^m)^(1/m);
 *                                  8.5 (6..20)
 * @param sessionPlateauSharpness   m: how sharply a session's effective sets level off; 3 (1..8)
 * @param weeklyDoseExponent        p: weekly stimulus = (sum of the sessions' effective sets)^p; ln 2 / ln 6 = 0.387
 *                                  (0.2..0.8): six sets twice one, at any number of sessions
 * @param defaultRestSeconds        rest after a set that states none; 120 s (15..600)
 * @param supersetChangeoverSeconds pause between items of a superset round that states none; 15 s (0..120)
 * @param defaultRepSeconds         time of one rep without a tempo; 4 s (1..10)
 * @param warmUpSetMinutes          minutes per warm-up set, rest included; 1.5 (0..5)
 * @param exerciseChangeoverMinutes minutes to set up each exercise; 1.0 (0..5)
 * @param hardSessionMinSets        credited hard sets that make a session train a muscle hard; 1.0 (0.5..5)
 * @param acuteChronicWeeks         weeks before the current one in the chronic mean; 4 (1..8)
 * @param intensityZone1From        lower bound (share of 1RM) of the first intensity zone; 0.55 (0.3..1.0)
 * @param intensityZone2From        lower bound of the second zone; 0.70 (0.3..1.0), above the first
 * @param intensityZone3From        lower bound of the third zone; 0.80 (0.3..1.0), above the second
 * @param intensityZone4From        lower bound of the fourth, open-ended zone; 0.90 (0.3..1.0), above the third
 * @param heavyRepsFrom             share of 1RM from which a lift's reps count as heavy reps; 0.80 (0.5..1.0)
 */
public record ModelParameters(
        OneRepMaxRelation oneRepMaxRelation,
        double effortToleranceReps,
        double hardSetMaxRir,
        double amrapDefaultReps,
        double stimulatingRepsCeiling,
        double stimulatingRepsTail,
        double recruitmentFloor,
        double fatiguePerRep,
        double proximityDecay,
        double highRepThreshold,
        double highRepExtraWeight,
        double compoundFatigueFactor,
        double lowerBodyRecoveryFactor,
        double recoveryTimeConstantSeconds,
        double techniqueFatigueFactor,
        int dropSets,
        double dropSetExtraReps,
        double dropSetLoadDrop,
        double dropSetPauseSeconds,
        int restPauseMiniSets,
        double restPauseMiniSetReps,
        double restPausePauseSeconds,
        double sessionPlateauSets,
        double sessionPlateauSharpness,
        double weeklyDoseExponent,
        double defaultRestSeconds,
        double supersetChangeoverSeconds,
        double defaultRepSeconds,
        double warmUpSetMinutes,
        double exerciseChangeoverMinutes,
        double hardSessionMinSets,
        int acuteChronicWeeks,
        double intensityZone1From,
        double intensityZone2From,
        double intensityZone3From,
        double intensityZone4From,
        double heavyRepsFrom) {

    /**
     * The allowed range of every numeric parameter, by its name: the one place the bounds live, read by the
     * constructor and by anything (rule profiles) that sets parameters by name.
     */
    public static final Map<String, ParameterBound> BOUNDS = Map.ofEntries(
            Map.entry("effortToleranceReps", new ParameterBound(0, 6)),
            Map.entry("hardSetMaxRir", new ParameterBound(0, 5)),
            Map.entry("amrapDefaultReps", new ParameterBound(1, 50)),
            Map.entry("stimulatingRepsCeiling", new ParameterBound(4, 6)),
            Map.entry("stimulatingRepsTail", new ParameterBound(0.5, 1.6)),
            Map.entry("recruitmentFloor", new ParameterBound(0, 0.6)),
            Map.entry("fatiguePerRep", new ParameterBound(0.005, 0.1)),
            Map.entry("proximityDecay", new ParameterBound(0, 1)),
            Map.entry("highRepThreshold", new ParameterBound(8, 30)),
            Map.entry("highRepExtraWeight", new ParameterBound(0, 3)),
            Map.entry("compoundFatigueFactor", new ParameterBound(1, 2)),
            Map.entry("lowerBodyRecoveryFactor", new ParameterBound(1, 2)),
            Map.entry("recoveryTimeConstantSeconds", new ParameterBound(20, 600)),
            Map.entry("techniqueFatigueFactor", new ParameterBound(1, 3)),
            Map.entry("dropSets", new ParameterBound(1, 4)),
            Map.entry("dropSetExtraReps", new ParameterBound(1, 20)),
            Map.entry("dropSetLoadDrop", new ParameterBound(0.05, 0.5)),
            Map.entry("dropSetPauseSeconds", new ParameterBound(0, 60)),
            Map.entry("restPauseMiniSets", new ParameterBound(1, 5)),
            Map.entry("restPauseMiniSetReps", new ParameterBound(1, 10)),
            Map.entry("restPausePauseSeconds", new ParameterBound(5, 60)),
            Map.entry("sessionPlateauSets", new ParameterBound(6, 20)),
            Map.entry("sessionPlateauSharpness", new ParameterBound(1, 8)),
            Map.entry("weeklyDoseExponent", new ParameterBound(0.2, 0.8)),
            Map.entry("defaultRestSeconds", new ParameterBound(15, 600)),
            Map.entry("supersetChangeoverSeconds", new ParameterBound(0, 120)),
            Map.entry("defaultRepSeconds", new ParameterBound(1, 10)),
            Map.entry("warmUpSetMinutes", new ParameterBound(0, 5)),
            Map.entry("exerciseChangeoverMinutes", new ParameterBound(0, 5)),
            Map.entry("hardSessionMinSets", new ParameterBound(0.5, 5)),
            Map.entry("acuteChronicWeeks", new ParameterBound(1, 8)),
            Map.entry("intensityZone1From", new ParameterBound(0.3, 1.0)),
            Map.entry("intensityZone2From", new ParameterBound(0.3, 1.0)),
            Map.entry("intensityZone3From", new ParameterBound(0.3, 1.0)),
            Map.entry("intensityZone4From", new ParameterBound(0.3, 1.0)),
            Map.entry("heavyRepsFrom", new ParameterBound(0.5, 1.0)));

    private static final ModelParameters DEFAULTS = new Builder().build();

    public ModelParameters {
        Objects.requireNonNull(oneRepMaxRelation, "oneRepMaxRelation");
        within("effortToleranceReps", effortToleranceReps);
        within("hardSetMaxRir", hardSetMaxRir);
        within("amrapDefaultReps", amrapDefaultReps);
        within("stimulatingRepsCeiling", stimulatingRepsCeiling);
        within("stimulatingRepsTail", stimulatingRepsTail);
        within("recruitmentFloor", recruitmentFloor);
        within("fatiguePerRep", fatiguePerRep);
        within("proximityDecay", proximityDecay);
        within("highRepThreshold", highRepThreshold);
        within("highRepExtraWeight", highRepExtraWeight);
        within("compoundFatigueFactor", compoundFatigueFactor);
        within("lowerBodyRecoveryFactor", lowerBodyRecoveryFactor);
        within("recoveryTimeConstantSeconds", recoveryTimeConstantSeconds);
        within("techniqueFatigueFactor", techniqueFatigueFactor);
        within("dropSets", dropSets);
        within("dropSetExtraReps", dropSetExtraReps);
        within("dropSetLoadDrop", dropSetLoadDrop);
        within("dropSetPauseSeconds", dropSetPauseSeconds);
        within("restPauseMiniSets", restPauseMiniSets);
        within("restPauseMiniSetReps", restPauseMiniSetReps);
        within("restPausePauseSeconds", restPausePauseSeconds);
        within("sessionPlateauSets", sessionPlateauSets);
        within("sessionPlateauSharpness", sessionPlateauSharpness);
        within("weeklyDoseExponent", weeklyDoseExponent);
        within("defaultRestSeconds", defaultRestSeconds);
        within("supersetChangeoverSeconds", supersetChangeoverSeconds);
        within("defaultRepSeconds", defaultRepSeconds);
        within("warmUpSetMinutes", warmUpSetMinutes);
        within("exerciseChangeoverMinutes", exerciseChangeoverMinutes);
        within("hardSessionMinSets", hardSessionMinSets);
        within("acuteChronicWeeks", acuteChronicWeeks);
        within("intensityZone1From", intensityZone1From);
        within("intensityZone2From", intensityZone2From);
        within("intensityZone3From", intensityZone3From);
        within("intensityZone4From", intensityZone4From);
        if (!(intensityZone1From < intensityZone2From && intensityZone2From < intensityZone3From
                && intensityZone3From < intensityZone4From)) {
            throw new IllegalArgumentException("intensity zone bounds must rise, were " + intensityZone1From + ", "
                    + intensityZone2From + ", " + intensityZone3From + ", " + intensityZone4From);
        }
        within("heavyRepsFrom", heavyRepsFrom);
    }

    /** The documented defaults. */
    public static ModelParameters defaults() {
        return DEFAULTS;
    }

    /** A builder holding these values, to change a few of them. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    private static void within(String name, double value) {
        ParameterBound bound = BOUNDS.get(name);
        if (!bound.contains(value)) {
            throw new IllegalArgumentException(name + " must lie in [" + bound.min() + ", " + bound.max() + "], was "
                    + value);
        }
    }

    /** Builds parameters from the defaults; each setter replaces one value. */
    public static final class Builder {
        private OneRepMaxRelation oneRepMaxRelation = OneRepMaxRelation.BRZYCKI;
        private double effortToleranceReps = 2;
        private double hardSetMaxRir = 3;
        private double amrapDefaultReps = 8;
        private double stimulatingRepsCeiling = 5;
        private double stimulatingRepsTail = 1.5;
        private double recruitmentFloor = 0.3;
        private double fatiguePerRep = 0.03;
        private double proximityDecay = 0.3;
        private double highRepThreshold = 15;
        private double highRepExtraWeight = 1.0;
        private double compoundFatigueFactor = 1.3;
        private double lowerBodyRecoveryFactor = 1.25;
        private double recoveryTimeConstantSeconds = 90;
        private double techniqueFatigueFactor = 1.5;
        private int dropSets = 2;
        private double dropSetExtraReps = 6;
        private double dropSetLoadDrop = 0.2;
        private double dropSetPauseSeconds = 10;
        private int restPauseMiniSets = 2;
        private double restPauseMiniSetReps = 3;
        private double restPausePauseSeconds = 20;
        private double sessionPlateauSets = 8.5;
        private double sessionPlateauSharpness = 3;
        /** ln 2 / ln 6: six sets give twice the stimulus of one. */
        private double weeklyDoseExponent = Math.log(2) / Math.log(6);
        private double defaultRestSeconds = 120;
        private double supersetChangeoverSeconds = 15;
        private double defaultRepSeconds = 4;
        private double warmUpSetMinutes = 1.5;
        private double exerciseChangeoverMinutes = 1.0;
        private double hardSessionMinSets = 1.0;
        private int acuteChronicWeeks = 4;
        private double intensityZone1From = 0.55;
        private double intensityZone2From = 0.70;
        private double intensityZone3From = 0.80;
        private double intensityZone4From = 0.90;
        private double heavyRepsFrom = 0.80;

        public Builder() {
        }

        private Builder(ModelParameters p) {
            oneRepMaxRelation = p.oneRepMaxRelation;
            effortToleranceReps = p.effortToleranceReps;
            hardSetMaxRir = p.hardSetMaxRir;
            amrapDefaultReps = p.amrapDefaultReps;
            stimulatingRepsCeiling = p.stimulatingRepsCeiling;
            stimulatingRepsTail = p.stimulatingRepsTail;
            recruitmentFloor = p.recruitmentFloor;
            fatiguePerRep = p.fatiguePerRep;
            proximityDecay = p.proximityDecay;
            highRepThreshold = p.highRepThreshold;
            highRepExtraWeight = p.highRepExtraWeight;
            compoundFatigueFactor = p.compoundFatigueFactor;
            lowerBodyRecoveryFactor = p.lowerBodyRecoveryFactor;
            recoveryTimeConstantSeconds = p.recoveryTimeConstantSeconds;
            techniqueFatigueFactor = p.techniqueFatigueFactor;
            dropSets = p.dropSets;
            dropSetExtraReps = p.dropSetExtraReps;
            dropSetLoadDrop = p.dropSetLoadDrop;
            dropSetPauseSeconds = p.dropSetPauseSeconds;
            restPauseMiniSets = p.restPauseMiniSets;
            restPauseMiniSetReps = p.restPauseMiniSetReps;
            restPausePauseSeconds = p.restPausePauseSeconds;
            sessionPlateauSets = p.sessionPlateauSets;
            sessionPlateauSharpness = p.sessionPlateauSharpness;
            weeklyDoseExponent = p.weeklyDoseExponent;
            defaultRestSeconds = p.defaultRestSeconds;
            supersetChangeoverSeconds = p.supersetChangeoverSeconds;
            defaultRepSeconds = p.defaultRepSeconds;
            warmUpSetMinutes = p.warmUpSetMinutes;
            exerciseChangeoverMinutes = p.exerciseChangeoverMinutes;
            hardSessionMinSets = p.hardSessionMinSets;
            acuteChronicWeeks = p.acuteChronicWeeks;
            intensityZone1From = p.intensityZone1From;
            intensityZone2From = p.intensityZone2From;
            intensityZone3From = p.intensityZone3From;
            intensityZone4From = p.intensityZone4From;
            heavyRepsFrom = p.heavyRepsFrom;
        }

        public Builder oneRepMaxRelation(OneRepMaxRelation v) {
            oneRepMaxRelation = v;
            return this;
        }

        public Builder effortToleranceReps(double v) {
            effortToleranceReps = v;
            return this;
        }

        public Builder hardSetMaxRir(double v) {
            hardSetMaxRir = v;
            return this;
        }

        public Builder amrapDefaultReps(double v) {
            amrapDefaultReps = v;
            return this;
        }

        public Builder stimulatingRepsCeiling(double v) {
            stimulatingRepsCeiling = v;
            return this;
        }

        public Builder stimulatingRepsTail(double v) {
            stimulatingRepsTail = v;
            return this;
        }

        public Builder recruitmentFloor(double v) {
            recruitmentFloor = v;
            return this;
        }

        public Builder fatiguePerRep(double v) {
            fatiguePerRep = v;
            return this;
        }

        public Builder proximityDecay(double v) {
            proximityDecay = v;
            return this;
        }

        public Builder highRepThreshold(double v) {
            highRepThreshold = v;
            return this;
        }

        public Builder highRepExtraWeight(double v) {
            highRepExtraWeight = v;
            return this;
        }

        public Builder compoundFatigueFactor(double v) {
            compoundFatigueFactor = v;
            return this;
        }

        public Builder lowerBodyRecoveryFactor(double v) {
            lowerBodyRecoveryFactor = v;
            return this;
        }

        public Builder recoveryTimeConstantSeconds(double v) {
            recoveryTimeConstantSeconds = v;
            return this;
        }

        public Builder techniqueFatigueFactor(double v) {
            techniqueFatigueFactor = v;
            return this;
        }

        public Builder dropSets(int v) {
            dropSets = v;
            return this;
        }

        public Builder dropSetExtraReps(double v) {
            dropSetExtraReps = v;
            return this;
        }

        public Builder dropSetLoadDrop(double v) {
            dropSetLoadDrop = v;
            return this;
        }

        public Builder dropSetPauseSeconds(double v) {
            dropSetPauseSeconds = v;
            return this;
        }

        public Builder restPauseMiniSets(int v) {
            restPauseMiniSets = v;
            return this;
        }

        public Builder restPauseMiniSetReps(double v) {
            restPauseMiniSetReps = v;
            return this;
        }

        public Builder restPausePauseSeconds(double v) {
            restPausePauseSeconds = v;
            return this;
        }

        public Builder sessionPlateauSets(double v) {
            sessionPlateauSets = v;
            return this;
        }

        public Builder sessionPlateauSharpness(double v) {
            sessionPlateauSharpness = v;
            return this;
        }

        public Builder weeklyDoseExponent(double v) {
            weeklyDoseExponent = v;
            return this;
        }

        public Builder defaultRestSeconds(double v) {
            defaultRestSeconds = v;
            return this;
        }

        public Builder supersetChangeoverSeconds(double v) {
            supersetChangeoverSeconds = v;
            return this;
        }

        public Builder defaultRepSeconds(double v) {
            defaultRepSeconds = v;
            return this;
        }

        public Builder warmUpSetMinutes(double v) {
            warmUpSetMinutes = v;
            return this;
        }

        public Builder exerciseChangeoverMinutes(double v) {
            exerciseChangeoverMinutes = v;
            return this;
        }

        public Builder hardSessionMinSets(double v) {
            hardSessionMinSets = v;
            return this;
        }

        public Builder acuteChronicWeeks(int v) {
            acuteChronicWeeks = v;
            return this;
        }

        public Builder intensityZone1From(double v) {
            intensityZone1From = v;
            return this;
        }

        public Builder intensityZone2From(double v) {
            intensityZone2From = v;
            return this;
        }

        public Builder intensityZone3From(double v) {
            intensityZone3From = v;
            return this;
        }

        public Builder intensityZone4From(double v) {
            intensityZone4From = v;
            return this;
        }

        public Builder heavyRepsFrom(double v) {
            heavyRepsFrom = v;
            return this;
        }

        public ModelParameters build() {
            return new ModelParameters(oneRepMaxRelation, effortToleranceReps, hardSetMaxRir, amrapDefaultReps,
                    stimulatingRepsCeiling, stimulatingRepsTail, recruitmentFloor, fatiguePerRep, proximityDecay,
                    highRepThreshold, highRepExtraWeight, compoundFatigueFactor, lowerBodyRecoveryFactor,
                    recoveryTimeConstantSeconds, techniqueFatigueFactor, dropSets, dropSetExtraReps, dropSetLoadDrop,
                    dropSetPauseSeconds, restPauseMiniSets, restPauseMiniSetReps, restPausePauseSeconds,
                    sessionPlateauSets, sessionPlateauSharpness, weeklyDoseExponent, defaultRestSeconds,
                    supersetChangeoverSeconds, defaultRepSeconds, warmUpSetMinutes, exerciseChangeoverMinutes,
                    hardSessionMinSets, acuteChronicWeeks, intensityZone1From, intensityZone2From,
                    intensityZone3From, intensityZone4From, heavyRepsFrom);
        }
    }
}
