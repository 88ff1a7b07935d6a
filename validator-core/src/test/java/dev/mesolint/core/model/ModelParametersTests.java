package dev.mesolint.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.reflect.RecordComponent;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;
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
    void everyNumericParameterHasABoundItsDefaultLiesIn() throws ReflectiveOperationException {
        Set<String> numeric = new TreeSet<>();
        for (RecordComponent c : ModelParameters.class.getRecordComponents()) {
            Object value = c.getAccessor().invoke(ModelParameters.defaults());
            if (value instanceof Number n) {
                numeric.add(c.getName());
                ParameterBound bound = ModelParameters.BOUNDS.get(c.getName());
                assertNotNull(bound, c.getName() + " has no bound");
                assertTrue(bound.contains(n.doubleValue()), c.getName() + " default " + n + " outside " + bound);
            }
        }
        assertEquals(numeric, new TreeSet<>(ModelParameters.BOUNDS.keySet()), "bounds for parameters that exist");
    }

    @Test
    void everyParameterIsInTheModelDocumentsTable() throws IOException {
        String doc = Files.readString(Path.of("../docs/model.md").toAbsolutePath().normalize(), StandardCharsets.UTF_8);
        for (RecordComponent c : ModelParameters.class.getRecordComponents()) {
            assertTrue(doc.contains("| `" + c.getName() + "`"), c.getName() + " is missing from docs/model.md");
        }
    }

    @Test
    void aHardSetIsOneWithAtMostThreeRepsInReserveByDefault() {
        // Common practice: sets within about 3 reps of failure count as hard sets.
        assertEquals(3, ModelParameters.defaults().hardSetMaxRir());
    }
}
