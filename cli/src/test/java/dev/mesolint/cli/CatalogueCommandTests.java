package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CatalogueCommandTests {
    @TempDir
    Path root;

    private record Run(int exit, String out, String err) {
        List<String> ids() {
            return out.lines().skip(1).takeWhile(l -> !l.isBlank()).map(l -> l.split("\\s+")[0]).toList();
        }
    }

    private Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(exit, out.toString(), err.toString());
    }

    @Test
    void searchFindsEveryWordInIdsAndNames() {
        Run r = run("catalogue", "search", "bench", "press");

        assertEquals(0, r.exit(), r.err());
        assertTrue(r.ids().contains("barbell-bench-press"), r.out());
        assertTrue(r.ids().contains("dumbbell-bench-press"), r.out());
        assertTrue(r.ids().stream().allMatch(id -> id.contains("bench") && id.contains("press")), r.out());
        assertTrue(r.out().contains(Mesolint.CAUTION));
    }

    @Test
    void theRepositorysCatalogueIsListedWithWhereItComesFrom() throws IOException {
        Files.writeString(root.resolve(".mesolint.yaml"), "root: true\ncatalogues: [catalogue/club.yaml]\n");
        Files.createDirectories(root.resolve("catalogue"));
        Files.writeString(root.resolve("catalogue/club.yaml"), ClubCatalogue.SLED_PUSH);

        Run r = run("catalogue", "search", "sled", "--root", root.toString());

        assertEquals(0, r.exit(), r.err());
        String line = r.out().lines().filter(l -> l.startsWith("harbour-sled-push ")).findFirst().orElseThrow();
        assertTrue(line.contains("catalogue/club.yaml"), line);
        assertTrue(line.contains("knee,hip,ankle") || line.contains("hip,knee,ankle"), line);
    }

    @Test
    void regionFiltersByTheLoadedJoint() {
        Run r = run("catalogue", "--region", "lower-back", "--pattern", "hinge");

        assertEquals(0, r.exit(), r.err());
        assertFalse(r.ids().isEmpty(), r.out());
        // A deadlift loads the lower back (common practice); every listed hinge says so in its regions column.
        assertTrue(r.out().lines().skip(1).takeWhile(l -> !l.isBlank()).allMatch(l -> l.contains("lower-back")),
                r.out());
    }

    @Test
    void unknownNamesSuggestTheNearestOne() {
        Run muscle = run("catalogue", "--muscle", "quads");
        assertEquals(2, muscle.exit());
        assertTrue(muscle.err().contains("--muscle: unknown value 'quads'; did you mean 'quadriceps'?"), muscle.err());

        Run region = run("catalogue", "--region", "knees");
        assertEquals(2, region.exit());
        assertTrue(region.err().contains("did you mean 'knee'?"), region.err());
    }

    @Test
    void aCatalogueFileThatDoesNotLoadIsALocatedErrorAndTheRunSaysWhatItSkipped() throws IOException {
        Files.writeString(root.resolve(".mesolint.yaml"), "root: true\ncatalogues: [catalogue/club.yaml]\n");
        Files.createDirectories(root.resolve("catalogue"));
        Files.writeString(root.resolve("catalogue/club.yaml"), ClubCatalogue.SLED_PUSH.replace("kind: compound", "kind: compund"));

        Run r = run("catalogue", "--root", root.toString());

        assertEquals(2, r.exit());
        assertTrue(r.err().startsWith("catalogue/club.yaml:5:11: error schema: "), r.err());
        assertTrue(r.err().contains("mesolint: catalogue catalogue/club.yaml did not load: its exercises are not "
                + "listed"), r.err());
        assertFalse(r.ids().contains("harbour-sled-push"));
    }
}
