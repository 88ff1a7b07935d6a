package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A team keeps its profile and catalogue beside the programmes: those in effect are read as what they are and not
 * reported among the programmes; a stray one is checked as what it is, and the run says it is not in effect.
 */
class OwnFilesInProgrammeFoldersTests {
    @TempDir
    Path repo;

    @Test
    void profileInEffectIsReadAsAProfileAndAStrayCatalogueIsNamed() throws Exception {
        Files.createDirectories(repo.resolve(".git"));
        Files.writeString(repo.resolve(".mesolint.yaml"), "profile: programmes/club-profile.yaml\n");
        Path programmes = Files.createDirectories(repo.resolve("programmes"));
        Files.writeString(programmes.resolve("club-profile.yaml"), "profile: club-hypertrophy\nextends: hypertrophy\n");
        Files.writeString(programmes.resolve("spare-exercises.yaml"), ClubCatalogue.SLED_PUSH);
        Files.writeString(programmes.resolve("squat.yaml"), SquatDay.resting("harbour-own-files", "3min"));

        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(new String[] {"check", "--root", repo.toString(), programmes.toString()},
                new PrintWriter(out), new PrintWriter(err));

        assertEquals(0, exit, out + "\n" + err);
        assertFalse(out.toString().contains("club-profile.yaml"), "the profile in effect is no file to report: " + out);
        assertTrue(out.toString().contains("2 files checked"), out.toString());
        assertTrue(err.toString().contains("mesolint: programmes/spare-exercises.yaml was checked as an exercise "
                + "catalogue, not as a programme; it is not in effect in this run"), err.toString());
        assertFalse(err.toString().contains("club-profile.yaml"), err.toString());
    }
}
