package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Plate rounding against hand-worked examples. The rule itself (nearest step, down under a cap or at near-maximal
 * loads) is common practice in coaching; the arithmetic below is worked by hand.
 */
class PlateRoundingTests {
    private static final PlateRounding KG = new PlateRounding(2.5, LoadUnit.KG);

    @Test
    void roundsToTheNearestStepAwayFromCapsAndMaxima() {
        // Hand-worked: 75% of 142.5 kg = 106.875 kg; 106.875 / 2.5 = 42.75 steps -> 43 steps = 107.5 kg.
        PlateRounding.Rounded r = KG.round(0.75 * 142.5, 0.75, false);
        assertEquals(107.5, r.weight(), 1e-9);
        assertEquals(PlateRounding.Direction.NEAREST, r.direction());
        // Hand-worked: 80% of 140 kg = 112 kg; 44.8 steps -> 45 steps = 112.5 kg (up, the nearer step).
        assertEquals(112.5, KG.round(0.8 * 140, 0.8, false).weight(), 1e-9);
        // Hand-worked: 80% of 95 kg = 76 kg; 30.4 steps -> 30 steps = 75 kg (down, the nearer step).
        assertEquals(75, KG.round(0.8 * 95, 0.8, false).weight(), 1e-9);
        // Hand-worked: a weight already on a step stays: 97.5 kg = 39 steps exactly (no floating-point slip).
        assertEquals(97.5, KG.nearest(97.5), 1e-9);
        assertEquals(97.5, KG.down(97.5), 1e-9);
    }

    @Test
    void roundsDownUnderAnAthletesCap() {
        // Hand-worked: 70% of 142.5 kg = 99.75 kg; nearest would be 100 kg = 70.2% of 1RM, over a 70% cap;
        // down gives 39 steps = 97.5 kg = 68.4% (common practice: never round past a clinician's cap).
        PlateRounding.Rounded r = KG.round(0.70 * 142.5, 0.70, true);
        assertEquals(97.5, r.weight(), 1e-9);
        assertEquals(PlateRounding.Direction.DOWN_UNDER_CAP, r.direction());
        assertTrue(r.weight() / 142.5 <= 0.70);
        assertEquals(100, KG.round(0.70 * 142.5, 0.70, false).weight(), 1e-9, "without the cap it goes to the nearest");
    }

    @Test
    void roundsDownAtNearMaximalLoads() {
        // Hand-worked: 92.5% of 142.5 kg = 131.8125 kg; 52.725 steps -> down to 52 steps = 130 kg
        // (nearest would be 132.5 kg = 93.0%, heavier than written).
        PlateRounding.Rounded r = KG.round(0.925 * 142.5, 0.925, false);
        assertEquals(130, r.weight(), 1e-9);
        assertEquals(PlateRounding.Direction.DOWN_NEAR_MAXIMAL, r.direction());
        // Hand-worked: 90% of 170 kg = 153 kg; 61.2 steps -> 61 steps = 152.5 kg; at 90% the rule already applies.
        assertEquals(PlateRounding.Direction.DOWN_NEAR_MAXIMAL, KG.round(0.9 * 170, 0.9, false).direction());
        // Hand-worked: 87.5% of 140 kg = 122.5 kg: below 90%, so nearest (already a step).
        assertEquals(PlateRounding.Direction.NEAREST, KG.round(0.875 * 140, 0.875, false).direction());
    }

    @Test
    void otherStepsAndUnits() {
        // Hand-worked: 1.25 kg steps (fractional plates): 75% of 142.5 kg = 106.875 kg = 85.5 steps -> 86 = 107.5 kg;
        // under a cap 85 steps = 106.25 kg.
        PlateRounding fine = new PlateRounding(1.25, LoadUnit.KG);
        assertEquals(107.5, fine.round(106.875, 0.75, false).weight(), 1e-9);
        assertEquals(106.25, fine.round(106.875, 0.75, true).weight(), 1e-9);
        // Hand-worked: 5 lb steps: 75% of 315 lb = 236.25 lb = 47.25 steps -> 47 steps = 235 lb.
        assertEquals(235, PlateRounding.defaultFor(LoadUnit.LB).round(236.25, 0.75, false).weight(), 1e-9);
        // A weight below one step is left as it is rather than rounded to nothing or over a cap.
        assertEquals(2, KG.down(2), 1e-9);
    }

    @Test
    void theProgrammeStepWinsOverTheRepositoryStepWhichWinsOverTheDefault() {
        Optional<Load.Absolute> programme = Optional.of(new Load.Absolute(1, LoadUnit.KG));
        Optional<Load.Absolute> repository = Optional.of(new Load.Absolute(2, LoadUnit.KG));
        assertEquals(1, PlateRounding.of(programme, repository, LoadUnit.KG).step(), 1e-9);
        assertEquals(2, PlateRounding.of(Optional.empty(), repository, LoadUnit.KG).step(), 1e-9);
        assertEquals(2.5, PlateRounding.of(Optional.empty(), Optional.empty(), LoadUnit.KG).step(), 1e-9);
        assertEquals(5, PlateRounding.of(Optional.empty(), Optional.empty(), LoadUnit.LB).step(), 1e-9);
        // 5 lb in a kg programme: 5 x 0.45359237 = 2.26796 kg (the pound's legal definition).
        assertEquals(2.26796, PlateRounding.of(Optional.of(new Load.Absolute(5, LoadUnit.LB)), Optional.empty(),
                LoadUnit.KG).step(), 1e-5);
        assertEquals("2.5 kg", KG.label());
        assertThrows(IllegalArgumentException.class, () -> new PlateRounding(0, LoadUnit.KG));
    }
}
