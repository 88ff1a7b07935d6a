package dev.mesolint.core.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The pack of the built-in catalogue is the catalogue the YAML text gives, entry by entry (every field, the muscles
 * in their written order, where each entry was written), and is never used for any other text.
 */
class PackedCatalogueTests {
    private static final CatalogueReader READER = new CatalogueReader(new LocatedYamlReader(YamlLimits.DEFAULTS),
            FormatSchema.load(FormatSchema.CATALOGUE));
    private static final byte[] TEXT = CatalogueReader.builtInText();
    private static final List<Exercise> READ = READER.readBuiltIn(TEXT);

    @Test
    void thePackTheBuildMadeHoldsEveryEntryTheTextGives() throws IOException {
        byte[] pack;
        try (InputStream in = getClass().getResourceAsStream(PackedCatalogue.RESOURCE)) {
            assertNotNull(in, "the build packs the built-in catalogue (validator-core's pom, process-classes)");
            pack = in.readAllBytes();
        }
        List<Exercise> unpacked = PackedCatalogue.unpack(pack, PackedCatalogue.checksum(TEXT)).orElseThrow();
        assertSameEntries(READ, unpacked);
        assertTrue(READ.size() > 100, "entries: " + READ.size());
    }

    @Test
    void packingAndUnpackingKeepEveryField() {
        assertSameEntries(READ, PackedCatalogue.unpack(PackedCatalogue.pack(READ, 42), 42).orElseThrow());
    }

    @Test
    void aPackMadeFromOtherTextIsNotUsed() {
        byte[] edited = new String(TEXT, StandardCharsets.UTF_8).replace("name: Barbell back squat",
                "name: Barbell back squat (high bar)").getBytes(StandardCharsets.UTF_8);
        assertTrue(edited.length != TEXT.length, "the edit took");
        assertEquals(Optional.empty(), PackedCatalogue.builtIn(edited));
        byte[] pack = PackedCatalogue.pack(READ, PackedCatalogue.checksum(TEXT));
        assertEquals(Optional.empty(), PackedCatalogue.unpack(pack, PackedCatalogue.checksum(edited)));
        // and the reader then reads the edited text itself
        Exercise squat = READER.readBuiltIn(edited).stream().filter(e -> e.id().equals("barbell-back-squat"))
                .findFirst().orElseThrow();
        assertEquals("Barbell back squat (high bar)", squat.name());
    }

    @Test
    void aDamagedPackIsNotUsed() {
        long checksum = PackedCatalogue.checksum(TEXT);
        byte[] pack = PackedCatalogue.pack(READ, checksum);
        assertEquals(Optional.empty(), PackedCatalogue.unpack(Arrays.copyOf(pack, pack.length - 7), checksum));
        byte[] longer = Arrays.copyOf(pack, pack.length + 1);
        assertEquals(Optional.empty(), PackedCatalogue.unpack(longer, checksum));
        String renamed = new String(pack, StandardCharsets.ISO_8859_1).replace("QUADRICEPS", "QUADRICEPZ");
        assertEquals(Optional.empty(), PackedCatalogue.unpack(renamed.getBytes(StandardCharsets.ISO_8859_1), checksum));
    }

    @Test
    void theBuiltInCatalogueComesFromThePack() {
        assertTrue(PackedCatalogue.builtIn(TEXT).isPresent());
        assertEquals(READ.size(), READER.builtIn().size());
    }

    private static void assertSameEntries(List<Exercise> expected, List<Exercise> actual) {
        assertEquals(expected, actual);
        for (int i = 0; i < expected.size(); i++) {
            // a map's equality ignores order; the first muscle with credit 1 is the prime mover
            assertEquals(List.copyOf(expected.get(i).muscles().keySet()), List.copyOf(actual.get(i).muscles().keySet()),
                    expected.get(i).id());
            assertEquals(expected.get(i).location().pointer(), actual.get(i).location().pointer());
        }
    }
}
