package dev.mesolint.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.ValueSource;

class OneRepMaxRelationTests {

    private static final OneRepMaxRelation DEFAULT = ModelParameters.defaults().oneRepMaxRelation();

    // NSCA Essentials 4th ed. (Haff & Triplett 2016), Table 17.7: %1RM and the reps it allows.
    // The 12 -> 67% row is from memory (medium confidence).
    @ParameterizedTest(name = "{1}% of 1RM allows about {0} reps")
    @CsvSource({"1, 100", "2, 95", "3, 93", "4, 90", "5, 87", "6, 85", "7, 83", "8, 80", "9, 77", "10, 75",
            "11, 70", "12, 67", "15, 65"})
    void defaultRelationStaysWithinTwoRepsOfTheNscaTable(int tableReps, int percent) {
        double reps = DEFAULT.repsToFailure(percent / 100.0);
        assertTrue(Math.abs(reps - tableReps) <= 2,
                () -> percent + "% gives " + reps + " reps; NSCA Table 17.7 gives " + tableReps);
    }

    @Test
    void epleyWouldMissTheNscaRowAtSixtySevenPercentByMoreThanTwoReps() {
        // NSCA Essentials 4th ed., Table 17.7: 67% -> 12 reps (from memory). Why Epley is not the default.
        double reps = OneRepMaxRelation.EPLEY.repsToFailure(0.67);
        assertTrue(reps - 12 > 2, "Epley gives " + reps);
    }

    // Epley 1985: 1RM = w(1 + r/30); Brzycki 1993: 1RM = 36w/(37 - r); values worked by hand to 0.01.
    @ParameterizedTest(name = "{0}: {1} x {2} -> {3}")
    @CsvSource({
            "EPLEY, 100, 10, 133.33", "BRZYCKI, 100, 10, 133.33",
            "EPLEY, 100, 5, 116.67", "BRZYCKI, 100, 5, 112.50",
            "EPLEY, 60, 3, 66.00", "BRZYCKI, 60, 3, 63.53"})
    void publishedFormulasGiveTheWorkedValues(OneRepMaxRelation relation, double weight, int reps, double expected) {
        assertEquals(expected, relation.oneRepMax(weight, reps), 0.01);
    }

    @ParameterizedTest
    @EnumSource(OneRepMaxRelation.class)
    void nscaWorkedExampleTenRepMaxOfThreeHundredPounds(OneRepMaxRelation relation) {
        // NSCA Essentials 4th ed., ch. 17 worked example: a 10RM of 300 lb estimates a 1RM of 400 lb (from memory).
        assertEquals(400, relation.oneRepMax(300, 10), 0.01);
    }

    @ParameterizedTest
    @ValueSource(ints = {2, 3, 5, 8, 9})
    void epleyEstimatesHigherThanBrzyckiBelowTenReps(int reps) {
        // Epley 1985 and Brzycki 1993: the curves cross at 10 reps (both 4/3 w); Epley is the steeper below.
        assertTrue(OneRepMaxRelation.EPLEY.oneRepMax(100, reps) > OneRepMaxRelation.BRZYCKI.oneRepMax(100, reps));
    }

    @ParameterizedTest
    @ValueSource(ints = {11, 12, 15, 20, 30, 36})
    void epleyEstimatesLowerThanBrzyckiAboveTenReps(int reps) {
        // Epley 1985 and Brzycki 1993: Brzycki's 36/(37 - r) grows without bound towards 37 reps.
        assertTrue(OneRepMaxRelation.EPLEY.oneRepMax(100, reps) < OneRepMaxRelation.BRZYCKI.oneRepMax(100, reps));
    }

    @ParameterizedTest
    @ValueSource(ints = {37, 40, 100})
    void brzyckiIsRefusedFromThirtySevenReps(int reps) {
        // Brzycki 1993: 36/(37 - r) is undefined at 37 and negative beyond.
        assertThrows(IllegalArgumentException.class, () -> OneRepMaxRelation.BRZYCKI.oneRepMax(100, reps));
        assertThrows(IllegalArgumentException.class, () -> OneRepMaxRelation.MEAN.oneRepMax(100, reps));
    }

    @ParameterizedTest
    @EnumSource(OneRepMaxRelation.class)
    void fullOneRepMaxAllowsExactlyOneRep(OneRepMaxRelation relation) {
        // Definition of the 1RM (common practice); for Epley a project convention (see docs/model.md).
        assertEquals(1.0, relation.repsToFailure(1.0), 1e-9);
        assertEquals(100, relation.oneRepMax(100, 1), 1e-9);
    }

    @ParameterizedTest
    @EnumSource(OneRepMaxRelation.class)
    void aLoadAboveOneRepMaxAllowsNoRep(OneRepMaxRelation relation) {
        // Definition of the 1RM (common practice).
        assertEquals(0, relation.repsToFailure(1.05));
    }

    @ParameterizedTest
    @CsvSource({"EPLEY, 0.9", "EPLEY, 0.75", "EPLEY, 0.6", "BRZYCKI, 0.9", "BRZYCKI, 0.75", "BRZYCKI, 0.5",
            "MEAN, 0.95", "MEAN, 0.8", "MEAN, 0.6"})
    void repsToFailureInvertsTheOneRepMaxEstimate(OneRepMaxRelation relation, double fraction) {
        // Lifting f of the 1RM for R(f) reps must estimate the same 1RM back: w / f.
        double reps = relation.repsToFailure(fraction);
        assertEquals(100 / fraction, relation.oneRepMax(100, reps), 1e-6);
    }

    @Test
    void meanLiesBetweenTheTwoPublishedRelations() {
        // Definition of the mean of Epley 1985 and Brzycki 1993.
        for (double f = 0.5; f < 0.97; f += 0.01) {
            double epley = OneRepMaxRelation.EPLEY.repsToFailure(f);
            double brzycki = OneRepMaxRelation.BRZYCKI.repsToFailure(f);
            double mean = OneRepMaxRelation.MEAN.repsToFailure(f);
            assertTrue(mean >= Math.min(epley, brzycki) - 1e-6 && mean <= Math.max(epley, brzycki) + 1e-6,
                    "at " + f + ": " + mean);
        }
    }
}
