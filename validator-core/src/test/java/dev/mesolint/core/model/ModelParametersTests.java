package dev.mesolint.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class ModelParametersTests {

    @Test
    void theBuilderStartsFromTheDefaults() {
        assertEquals(ModelParameters.defaults(), new ModelParameters.Builder().build());
        assertEquals(ModelParameters.defaults(), ModelParameters.defaults().toBuilder().build());
    }

    @Test
    void oneValueCanBeChangedAndTheRestKept() {
        ModelParameters p = ModelParameters.defaults().toBuilder().hardSetMaxRir(2).build();
        assertEquals(2, p.hardSetMaxRir());
        assertEquals(ModelParameters.defaults().stimulatingRepsCeiling(), p.stimulatingRepsCeiling());
        assertNotEquals(ModelParameters.defaults(), p);
    }

    @Test
    void valuesOutsideTheirBoundsAreRefused() {
        ModelParameters.Builder b = ModelParameters.defaults().toBuilder();
        assertThrows(IllegalArgumentException.class, () -> b.recruitmentFloor(0.9).build());
        assertThrows(IllegalArgumentException.class,
                () -> ModelParameters.defaults().toBuilder().recoveryTimeConstantSeconds(Double.NaN).build());
        assertThrows(IllegalArgumentException.class,
                () -> ModelParameters.defaults().toBuilder().acuteChronicWeeks(0).build());
    }

    @Test
    void aHardSetIsOneWithAtMostThreeRepsInReserveByDefault() {
        // Common practice: sets within about 3 reps of failure count as hard sets.
        assertEquals(3, ModelParameters.defaults().hardSetMaxRir());
    }
}
