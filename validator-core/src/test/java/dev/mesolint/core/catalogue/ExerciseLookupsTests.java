package dev.mesolint.core.catalogue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

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

    @Test
    void keptUnderItsOwnIdStringTheValueIsStillMadeOnceAndFoundByEverySpelling() {
        // What is made is keyed by the catalogue's id string (the one every set's figures carry), whichever equal
        // string asked first; an id of another text would be a wrong key, so then the asked string is kept.
        String catalogueId = new String("known-squat");
        List<String> asked = new ArrayList<>();
        ExerciseLookups<String[]> lookups = new ExerciseLookups<>(id -> {
            asked.add(id);
            return new String[] {catalogueId};
        }, made -> made[0]);
        String[] made = lookups.get(new String("known-squat"));
        assertSame(catalogueId, made[0]);
        assertSame(made, lookups.get(catalogueId));
        assertSame(made, lookups.get(new String("known-squat")));
        assertEquals(1, asked.size());
        ExerciseLookups<String[]> misspelt = new ExerciseLookups<>(id -> new String[] {"other"}, m -> m[0]);
        String[] kept = misspelt.get("known-squat");
        assertSame(kept, misspelt.get(new String("known-squat")));
    }
}
