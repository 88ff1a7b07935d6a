package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same team repository checked from three working folders gives one verdict: the configuration and the root are
 * found by walking up, not read from the current folder. Each run is a real process started in that folder.
 */
class RepositoryRootTests {
    @TempDir
    Path repo;

    /** A club exercise from the team catalogue, and a 60 s rest on a squat: a warning under hypertrophy. */
    private static final String PROGRAMME = """
            # Invented demo programme of the fictional Harbourside Strength Club.
            format: 1
            programme:
              id: harbour-root
              level: intermediate
              goal: hypertrophy
            weeks:
              - week: 1
                sessions:
                  - day: 1
                    work:
                      - exercise: harbour-sled-push
                        sets: 3
                        reps: 10
                        rir: 2
                        rest: 2min
                      - exercise: barbell-back-squat
                        sets: 4
                        reps: 8
                        rir: 2
                        rest: 60s
            """;

    private record Run(int exit, String out) {
    }

    private Run runIn(Path folder, String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                .toString(), "-cp", System.getProperty("java.class.path"), MesolintCommand.class.getName()));
        command.addAll(List.of(args));
        Process process = new ProcessBuilder(command).directory(folder.toFile()).redirectErrorStream(true).start();
        process.getOutputStream().close();
        String out = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(process.waitFor(60, TimeUnit.SECONDS), "the run did not end");
        return new Run(process.exitValue(), out);
    }

    private void write(String name, String text) throws IOException {
        Path file = repo.resolve(name);
        Files.createDirectories(file.getParent());
        Files.writeString(file, text);
    }

    @Test
    void theSameRepositoryCheckedFromThreeFoldersGivesOneVerdict() throws Exception {
        Files.createDirectories(repo.resolve(".git"));
        write(".mesolint.yaml", "fail-on: warning\ncatalogues: [catalogue/club.yaml]\n");
        write("catalogue/club.yaml", ClubCatalogue.SLED_PUSH);
        write("programmes/strength/block-1.yaml", PROGRAMME);

        Run fromRoot = runIn(repo, "check", "programmes");
        Run fromProgrammes = runIn(repo.resolve("programmes"), "check", "strength/block-1.yaml");
        Run fromStrength = runIn(repo.resolve("programmes/strength"), "check", ".");

        // fail-on: warning from the root's configuration: the short rest fails the run from every folder.
        assertEquals(1, fromRoot.exit(), fromRoot.out());
        String finding = "programmes/strength/block-1.yaml:21:19: warning short-rest-compound: ";
        assertTrue(fromRoot.out().contains(finding), fromRoot.out());
        // The team catalogue is read from every folder: its exercise is never unknown.
        assertTrue(!fromRoot.out().contains("unknown-exercise"), fromRoot.out());
        assertEquals(fromRoot, fromProgrammes);
        assertEquals(fromRoot, fromStrength);
    }

    @Test
    void rootTrueKeepsAProgrammeRepositoryInsideAnotherOneApart() throws Exception {
        Files.createDirectories(repo.resolve(".git"));
        write("clubs/harbourside/.mesolint.yaml", "root: true\ncatalogues: [catalogue/club.yaml]\n");
        write("clubs/harbourside/catalogue/club.yaml", ClubCatalogue.SLED_PUSH);
        write("clubs/harbourside/programmes/block-1.yaml", PROGRAMME);

        Run r = runIn(repo.resolve("clubs/harbourside/programmes"), "check", ".");

        // Default fail level (error): the warning alone does not fail; paths start at the club's folder.
        assertEquals(0, r.exit(), r.out());
        assertTrue(r.out().startsWith("programmes/block-1.yaml:21:19: warning short-rest-compound: "), r.out());
    }
}
