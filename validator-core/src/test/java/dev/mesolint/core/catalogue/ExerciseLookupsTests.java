package dev.mesolint.core.catalogue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class ExerciseLookupsTests {
    @Test
    void eachIdIsMadeOnceWhicheverStringSpellsItAndAMissIsRememberedToo() {
        List<String> asked = new ArrayList<>();
        ExerciseLookups<String> lookups = new ExerciseLookups<>(id -> {
            asked.add(id);
            return id.startsWith("known") ? id.toUpperCase(java.util.Locale.ROOT) : null;
        });
        String first = new String("known-squat");
        String sameText = new String("known-squat");
        assertEquals("KNOWN-SQUAT", lookups.get(first));
        assertEquals("KNOWN-SQUAT", lookups.get(sameText));
        assertEquals("KNOWN-SQUAT", lookups.get(first));
        assertNull(lookups.get("made-up"));
        assertNull(lookups.get(new String("made-up")));
        assertEquals(List.of("known-squat", "made-up"), asked);
    }
}
