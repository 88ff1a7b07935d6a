package dev.mesolint.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class UnchangedBuildTests {
    private static final String REPLAYED = "(nothing changed since the last build)";

    @TempDir
    Path dir;

    private MojoFixture repository() throws IOException {
        return new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME)
                .programme("rehab/misspelt.yaml", MojoFixture.PROGRAMME.replace("barbell-bench", "barbel-bench")
                        .replace("id: harbour-test", "id: harbour-rehab"));
    }

    private Path stampFile() {
        return dir.resolve("target/mesolint").resolve(UnchangedBuild.FILE);
    }

    private Path cacheFile() {
        return dir.resolve("target/mesolint/cache.json");
    }

    /** The findings and verdict lines of a build, without the lines that describe how it was made. */
    private static List<String> outcome(RecordingLog log) {
        return log.lines.stream().filter(l -> !l.contains("Note: ") && !l.contains("results reused from cache")
                && !l.startsWith("[DEBUG]")).toList();
    }

    @Test
    void anUnchangedBuildReplaysTheLastOutcomeLineForLineWithoutCheckingAgain() throws Exception {
        MojoFixture first = repository();
        MojoFailureException failed = assertThrows(MojoFailureException.class, () -> first.check().execute());
        assertTrue(Files.isRegularFile(stampFile()));
        Files.delete(cacheFile()); // a real run would write it again

        MojoFixture second = new MojoFixture(dir);
        MojoFailureException replayed = assertThrows(MojoFailureException.class, () -> second.check().execute());

        assertEquals(failed.getMessage(), replayed.getMessage());
        assertEquals(outcome(first.log), outcome(second.log));
        assertTrue(second.log.lines.contains("[INFO] mesolint: 2 programmes unchanged, results reused from cache "
                + REPLAYED), second.log.text());
        assertTrue(outcome(second.log).stream().anyMatch(l -> l.startsWith(
                "[ERROR] programmes/rehab/misspelt.yaml:15:23: error unknown-exercise")), second.log.text());
        assertFalse(Files.exists(cacheFile()), "nothing was checked: the per-file cache was not even opened");
    }

    @Test
    void aPassingBuildIsReplayedAsAPass() throws Exception {
        MojoFixture first = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME);
        first.check().execute();
        MojoFixture second = new MojoFixture(dir);
        second.check().execute();
        assertTrue(second.log.text().contains(REPLAYED), second.log.text());
        assertEquals(outcome(first.log), outcome(second.log));
    }

    @Test
    void anEditedProgrammeIsCheckedAgain() throws Exception {
        MojoFixture first = repository();
        assertThrows(MojoFailureException.class, () -> first.check().execute());
        first.programme("rehab/misspelt.yaml", MojoFixture.PROGRAMME.replace("id: harbour-test", "id: harbour-rehab"));

        MojoFixture second = new MojoFixture(dir);
        second.check().execute(); // the typo is fixed: the build passes

        assertFalse(second.log.text().contains(REPLAYED), second.log.text());
    }

    @Test
    void aNewProgrammeFileIsCheckedAgain() throws Exception {
        MojoFixture first = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME);
        first.check().execute();
        first.programme("new/misspelt.yaml", MojoFixture.PROGRAMME.replace("barbell-bench", "barbel-bench")
                .replace("id: harbour-test", "id: harbour-new"));

        MojoFixture second = new MojoFixture(dir);
        assertThrows(MojoFailureException.class, () -> second.check().execute());
        assertFalse(second.log.text().contains(REPLAYED), second.log.text());
    }

    @Test
    void aNewConfigurationFileAboveTheProgrammesIsReadAgain() throws Exception {
        MojoFixture first = new MojoFixture(dir).programme("light.yaml",
                MojoFixture.PROGRAMME.replace("sets: 4", "sets: 3"));
        first.check().execute();
        Files.writeString(dir.resolve(".mesolint.yaml"), "fail-on: info\n");

        MojoFixture second = new MojoFixture(dir);
        MojoFailureException failure = assertThrows(MojoFailureException.class, () -> second.check().execute());
        assertTrue(failure.getMessage().contains("fail level 'info'"), failure.getMessage());
    }

    @Test
    void anEditedConfigurationFileIsReadAgain() throws Exception {
        Files.writeString(dir.resolve(".mesolint.yaml"), "fail-on: error\n");
        MojoFixture first = new MojoFixture(dir).programme("light.yaml",
                MojoFixture.PROGRAMME.replace("sets: 4", "sets: 3"));
        first.check().execute();
        Files.writeString(dir.resolve(".mesolint.yaml"), "fail-on: info\n");

        MojoFixture second = new MojoFixture(dir);
        assertThrows(MojoFailureException.class, () -> second.check().execute());
        assertFalse(second.log.text().contains(REPLAYED), second.log.text());
    }

    @Test
    void aChangedParameterIsARealRun() throws Exception {
        MojoFixture first = new MojoFixture(dir).programme("light.yaml",
                MojoFixture.PROGRAMME.replace("sets: 4", "sets: 3"));
        first.check().execute();

        MojoFixture second = new MojoFixture(dir);
        CheckMojo mojo = second.check();
        mojo.failOn = "info";
        assertThrows(MojoFailureException.class, mojo::execute);
        assertFalse(second.log.text().contains(REPLAYED), second.log.text());
    }

    @Test
    void aHandEditedOrDamagedRecordIsNeverTrusted() throws Exception {
        MojoFixture first = repository();
        assertThrows(MojoFailureException.class, () -> first.check().execute());
        String record = Files.readString(stampFile(), StandardCharsets.UTF_8);
        assertTrue(record.contains("\nfailed mesolint: 1 error"), record);

        // Turning the failure into a pass by hand, without the checksum, does not pass the build.
        Files.writeString(stampFile(), record.replaceFirst("\nfailed [^\n]*\n", "\npassed\n"));
        MojoFixture edited = new MojoFixture(dir);
        assertThrows(MojoFailureException.class, () -> edited.check().execute());
        assertFalse(edited.log.text().contains(REPLAYED), edited.log.text());

        // Every single-byte change of a saved record is noticed: the build is made in full and fails as it should.
        byte[] bytes = Files.readAllBytes(stampFile());
        for (int i = 0; i < bytes.length; i += Math.max(1, bytes.length / 40)) {
            byte[] damaged = bytes.clone();
            damaged[i] ^= 0x01;
            Files.write(stampFile(), damaged);
            MojoFixture next = new MojoFixture(dir);
            assertThrows(MojoFailureException.class, () -> next.check().execute(), "byte " + i);
            assertFalse(next.log.text().contains(REPLAYED), "byte " + i + " changed and was trusted");
        }
    }

    @Test
    void aBrokenBuildIsNeverReplayed() throws Exception {
        MojoFixture first = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME);
        first.check().execute();
        assertTrue(Files.exists(stampFile()));
        Files.writeString(dir.resolve(".mesolint.yaml"), "fail-on: fatal\n");

        assertThrows(MojoExecutionException.class, () -> new MojoFixture(dir).check().execute());
        assertFalse(Files.exists(stampFile()), "the record of the last good build is gone");
    }

    @Test
    void withoutTheCacheEveryBuildIsReal() throws Exception {
        MojoFixture first = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME);
        first.check().execute();
        MojoFixture second = new MojoFixture(dir);
        CheckMojo mojo = second.check();
        mojo.cache = false;
        mojo.execute();
        assertFalse(second.log.text().contains(REPLAYED), second.log.text());
    }
}
