package dev.mesolint.core.yaml;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;
import java.util.stream.StreamSupport;
import org.junit.jupiter.api.Test;

class KeyNamesTests {
    private final LocatedYamlReader reader = new LocatedYamlReader(YamlLimits.DEFAULTS);

    @Test
    void keysOfEveryDocumentAreTheStringConstantsOwnInstance() throws YamlProblem {
        String first = reader.read("sets: 3\nreps: 8\n").root().propertyNames().iterator().next();
        String second = reader.read("sets: 4\n").root().propertyNames().iterator().next();
        assertSame("sets", first, "the constant's instance, so lookups match by reference");
        assertSame(first, second);
    }

    @Test
    void aLongKeyIsKeptAsWrittenWithoutBeingShared() throws YamlProblem {
        String key = "k".repeat(80);
        List<String> names = StreamSupport.stream(reader.read(key + ": 1\n").root().propertyNames().spliterator(),
                false).toList();
        assertEquals(List.of(key), names);
    }
}
