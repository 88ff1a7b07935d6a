package dev.mesolint.core.model;

import static dev.mesolint.core.testing.SetBuilder.reps;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.testing.SetBuilder;
import dev.mesolint.core.testing.TestProgrammes;
import dev.mesolint.core.value.LoadUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class EffortResolverTests {

    private static final String BENCH = "barbell-bench-press";
    private final EffortResolver resolver = new EffortResolver(ModelParameters.defaults());

    private Effort resolve(SetBuilder set) {
        return resolve(set, Athlete.NONE);
    }

    private Effort resolve(SetBuilder set, Athlete athlete) {
        SetPrescription prescription = set.build(1);
        return resolver.resolve(prescription, BENCH, athlete, LoadUnit.KG);
    }

    // Zourdos et al. 2016, JSCR 30(1):267-275, RIR-based RPE scale: 10 = no rep left, 9 = 1, 8 = 2, 7 = 3;
    // 9.5 reads "no further rep, but the load could rise": half a rep by project convention.
    @ParameterizedTest(name = "RPE {0} leaves {1} reps in reserve")
    @CsvSource({"10, 0", "9.5, 0.5", "9, 1", "8, 2", "7, 3"})
    void rpeReadsOnTheRirBasedScale(String rpe, double rir) {
        Effort effort = resolve(reps("8").rpe(rpe));
        assertEquals(EffortSource.RPE, effort.source());
        assertEquals(rir, effort.rir().getAsDouble(), 1e-9);
    }

    @Test
    void aStatedRirRangeCountsAtItsMidpoint() {
        // Project convention (docs/model.md): a lifter told "1-3 in reserve" averages the middle.
        Effort effort = resolve(reps("8-12").rir("1-3"));
        assertEquals(EffortSource.RIR, effort.source());
        assertEquals(2, effort.rir().getAsDouble(), 1e-9);
        assertEquals(10, effort.reps(), 1e-9);
        assertEquals(12, effort.repsUpper(), 1e-9);
    }

    @Test
    void aShareOfOneRepMaxGivesTheReserveLeftByTheTable() {
        // NSCA Essentials 4th ed., Table 17.7: 75% of 1RM allows 10 reps; 8 done leaves 2.
        Effort effort = resolve(reps("8").load("75%"));
        assertEquals(EffortSource.LOAD, effort.source());
        assertEquals(2, effort.rir().getAsDouble(), 0.5);
    }

    @Test
    void aWeightIsReadAgainstTheAthletesOneRepMaxInAnyUnit() {
        // NSCA Essentials 4th ed., Table 17.7: 80% of 1RM allows 8 reps. 176.37 lb = 80 kg (1 lb = 0.45359237 kg).
        Athlete athlete = TestProgrammes.athleteWithOneRepMax(BENCH, 100, LoadUnit.KG);
        Effort effort = resolve(reps("6").load("176.37lb"), athlete);
        assertEquals(0.80, effort.loadFraction().getAsDouble(), 1e-4);
        assertEquals(80, effort.absoluteLoad().getAsDouble(), 1e-2);
        assertEquals(8 - 6, effort.rir().getAsDouble(), 0.5);
    }

    @Test
    void aWeightWithoutAKnownOneRepMaxLeavesTheEffortUnknownButTheVolumeKnown() {
        Effort effort = resolve(reps("8").load("80kg"));
        assertEquals(EffortSource.UNKNOWN, effort.source());
        assertFalse(effort.known());
        assertEquals(80, effort.absoluteLoad().getAsDouble(), 1e-9);
    }

    @Test
    void aShareOfAnUnknownOneRepMaxGivesEffortButNoWeight() {
        Effort effort = resolve(reps("8").load("75%"));
        assertTrue(effort.absoluteLoad().isEmpty());
    }

    @Test
    void amrapWithALoadRunsToFailureAtTheTableReps() {
        // NSCA Essentials 4th ed., Table 17.7: 75% of 1RM allows 10 reps.
        Effort effort = resolve(SetBuilder.reps("amrap").load("75%"));
        assertEquals(EffortSource.AMRAP, effort.source());
        assertEquals(0, effort.rir().getAsDouble());
        assertEquals(10, effort.reps(), 1.0);
    }

    @Test
    void amrapWithoutALoadUsesTheDocumentedDefaultReps() {
        Effort effort = resolve(SetBuilder.reps("amrap"));
        assertEquals(0, effort.rir().getAsDouble());
        assertEquals(ModelParameters.defaults().amrapDefaultReps(), effort.reps());
    }

    @Test
    void nothingStatedLeavesTheEffortUnknown() {
        Effort effort = resolve(reps("10"));
        assertEquals(EffortSource.UNKNOWN, effort.source());
        assertTrue(effort.rir().isEmpty());
        assertEquals(AgreementStatus.NOT_CHECKED, effort.agreement().status());
    }

    @Test
    void statedRirWinsOverTheLoad() {
        // The lifter adjusts the load to the stated reserve (common practice of autoregulated training).
        Effort effort = resolve(reps("8").rir("1").load("70%"));
        assertEquals(EffortSource.RIR, effort.source());
        assertEquals(1, effort.rir().getAsDouble());
    }

    // Loads read against NSCA Essentials 4th ed., Table 17.7 (reps to failure): 90% -> 4, 85% -> 6, 75% -> 10,
    // 65% -> 15 (so 60% allows at least 15); tolerance 2 reps.
    @ParameterizedTest(name = "{0} x {1} @ RIR {2} -> {3}")
    @CsvSource({
            "90%, 8, 1, INFEASIBLE",          // 8 reps where about 4 are possible
            "85%, 6, 3, HARDER_THAN_STATED",  // 6 reps fit (about 6 possible), but not with 3 in reserve
            "60%, 8, 1, MISLABELLED",         // at least 15 possible: 8 done leaves 7 or more, not 1
            "75%, 8, 2, AGREE",               // 10 possible, 8 done, 2 left: as stated
            "80%, 6-8, 1-2, AGREE"})          // 8 possible: the top of the range at RIR 1 is 1 rep over, within 2
    void theLoadIsComparedWithRepsAndStatedReserve(String load, String reps, String rir, AgreementStatus expected) {
        Effort effort = resolve(SetBuilder.reps(reps).rir(rir).load(load));
        assertEquals(expected, effort.agreement().status());
    }

    @Test
    void aLoadTooHeavyForTheRepsIsInfeasibleEvenWithoutStatedEffort() {
        // NSCA Essentials 4th ed., Table 17.7: 90% allows about 4 reps, not 10.
        Effort effort = resolve(reps("10").load("90%"));
        assertEquals(AgreementStatus.INFEASIBLE, effort.agreement().status());
        assertEquals(0, effort.rir().getAsDouble(), "a set the load cannot carry ends at failure");
    }

    @Test
    void theAgreementCarriesTheNumbersAFindingQuotes() {
        // NSCA Essentials 4th ed., Table 17.7: 75% -> 10 reps; 8 prescribed leaves 2; stated RPE 9 = RIR 1
        // (Zourdos et al. 2016).
        Effort effort = resolve(reps("8").rpe("9").load("75%"));
        EffortAgreement agreement = effort.agreement();
        assertAll(
                () -> assertEquals(10, agreement.repsToFailure().getAsDouble(), 0.5),
                () -> assertEquals(2, agreement.impliedRir().getAsDouble(), 0.5),
                () -> assertEquals(1, agreement.statedRir().getAsDouble(), 1e-9),
                () -> assertEquals(2, agreement.tolerance()));
    }

    @Test
    void rirAndRpeThatDisagreeAreReported() {
        // Zourdos et al. 2016: RPE 6 is 4 or more reps in reserve, far from the stated 0.
        Effort effort = resolve(reps("8").rir("0").rpe("6"));
        assertEquals(AgreementStatus.RIR_RPE_DIFFER, effort.agreement().status());
        Effort consistent = resolve(reps("8").rir("1").rpe("9"));
        assertEquals(AgreementStatus.AGREE, consistent.agreement().status());
    }

    @Test
    void theToleranceIsAParameter() {
        EffortResolver strict = new EffortResolver(ModelParameters.defaults().toBuilder().effortToleranceReps(0).build());
        // NSCA Essentials 4th ed., Table 17.7: 80% -> 8 reps; 8 reps at RIR 2 needs 10.
        Effort effort = strict.resolve(reps("8").rir("2").load("80%").build(1), BENCH, Athlete.NONE, LoadUnit.KG);
        assertEquals(AgreementStatus.HARDER_THAN_STATED, effort.agreement().status());
    }
}
