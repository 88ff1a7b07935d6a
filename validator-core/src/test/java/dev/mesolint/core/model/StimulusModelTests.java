package dev.mesolint.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class StimulusModelTests {

    private final StimulusModel model = new StimulusModel(ModelParameters.defaults());

    // Common practice (brief check values): the last ~5 reps before failure are the stimulating ones, and a set
    // cannot give more stimulating reps than it has reps: clamp(5 - r, 0, n), held within 0.1 rep for r <= 4.
    @ParameterizedTest(name = "{0} reps at RIR {1} -> {2} stimulating reps")
    @CsvSource({"12, 0, 5", "5, 0, 5", "1, 4, 1", "8, 1, 4", "8, 3, 2", "3, 0, 3", "10, 0.5, 4.5", "12, 4, 1",
            "10, 3.5, 1.5", "2, 2, 2"})
    void stimulatingRepsAreTheLastFiveBeforeFailure(double reps, double rir, double expected) {
        assertEquals(expected, model.stimulatingReps(reps, rir), 0.1);
    }

    @Test
    void setsFiveOrMoreRepsFromFailureGiveASmallFallingNonZeroCount() {
        // Robinson et al. 2024 (meta-regression, Sports Med): growth falls as reps in reserve rise but stays above
        // zero far from failure; the brief: RIR 5+ small, falling, not zero.
        double previous = model.stimulatingReps(20, 4);
        for (double rir = 5; rir <= 12; rir += 0.5) {
            double count = model.stimulatingReps(20, rir);
            assertTrue(count > 0 && count < previous, "RIR " + rir + ": " + count);
            assertTrue(count < 0.6, "RIR " + rir + " is small: " + count);
            previous = count;
        }
    }

    @Test
    void theTailMeetsTheLineWithoutAStep() {
        // The count is smooth where the tail takes over (r = K - L = 3.5): no jump a rule could trip over.
        double bend = 3.5;
        assertEquals(model.stimulatingReps(20, bend - 1e-6), model.stimulatingReps(20, bend + 1e-6), 1e-5);
    }

    @Test
    void aFreshSetWithFiveStimulatingRepsIsOneUnit() {
        // Unit definition of the brief: one fresh hard set (5 stimulating reps, full recruitment) = 1.0.
        assertEquals(1.0, model.stimulus(5, 1.0), 1e-9);
    }

    // Common practice: about the first 30% of the motor-unit pool has no growth potential left; recruitment
    // between 30% and 100% maps linearly onto 0..1.
    @ParameterizedTest(name = "recruitment {0} reaches {1} of the growable pool")
    @CsvSource({"1.0, 1.0", "0.65, 0.5", "0.3, 0.0", "0.1, 0.0"})
    void onlyRecruitmentAboveTheFloorGrows(double recruitment, double share) {
        assertEquals(share, model.growthShare(recruitment), 1e-9);
    }

    @ParameterizedTest
    @ValueSource(doubles = {3.9, 6.1})
    void theCeilingStaysWithinFourToSixReps(double ceiling) {
        // Common practice: estimates of the stimulating reps run from about 4 to 6.
        assertThrows(IllegalArgumentException.class,
                () -> ModelParameters.defaults().toBuilder().stimulatingRepsCeiling(ceiling).build());
    }

    @Test
    void aLowerCeilingCountsFewerStimulatingReps() {
        StimulusModel four = new StimulusModel(ModelParameters.defaults().toBuilder().stimulatingRepsCeiling(4).build());
        // Same rule with K = 4 (common practice lower bound): 12 reps at RIR 1 -> 3.
        assertEquals(3, four.stimulatingReps(12, 1), 1e-9);
    }
}
