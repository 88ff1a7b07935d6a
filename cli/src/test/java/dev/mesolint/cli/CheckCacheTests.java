package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code check --cache}: the same verdict as a fresh run, with unchanged programmes reused. */
class CheckCacheTests {
    /** A 60 s rest after squats: one short-rest-compound warning under hypertrophy (rules.md: 2 min for compounds). */
    private static final String SHORT_REST = """
            # Invented demo programme of the fictional Harbourside Strength Club.
            format: 1
            programme:
              id: harbour-cache-%s
              level: intermediate
              goal: hypertrophy
            weeks:
              - week: 1
                sessions:
                  - day: 1
                    work:
                      - exercise: barbell-back-squat
                        sets: 4
                        reps: 8
                        rir: 2
                        rest: %s
            """;

    @TempDir
    Path root;

    @TempDir
    Path cacheHome;

    private record Run(int exit, String out, String err) {
    }

    private Run check(String... extra) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        String[] args = Stream.concat(Stream.of("check", root.resolve("programmes").toString(), "--color", "never",
                "--cache-location", cacheHome.resolve("cache.json").toString()), Stream.of(extra))
                .toArray(String[]::new);
        int exit = MesolintCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(exit, out.toString(), err.toString());
    }

    private void write(String name, String rest) throws IOException {
        Path file = root.resolve("programmes").resolve(name + ".yaml");
        Files.createDirectories(file.getParent());
        Files.writeString(file, SHORT_REST.formatted(name, rest));
    }

    @Test
    void aSecondRunReusesUnchangedFilesAndGivesTheSameVerdict() throws IOException {
        Files.createDirectories(root.resolve(".git"));
        write("a", "60s");
        write("b", "3min");
        Run fresh = check("--fail-on", "warning");
        Run first = check("--fail-on", "warning", "--cache");
        Run second = check("--fail-on", "warning", "--cache");
        assertEquals(1, fresh.exit(), fresh.out() + fresh.err());
        assertTrue(first.err().contains("cache: 0 unchanged programmes reused, 2 checked"), first.err());
        assertTrue(second.err().contains("cache: 2 unchanged programmes reused, 0 checked"), second.err());
        assertEquals(fresh.exit(), second.exit());
        assertEquals(fresh.out(), second.out(), "a cached run prints what a fresh run prints");
        assertTrue(second.out().contains("short-rest-compound"), second.out());

        write("a", "3min"); // fixed: only this file is checked again, and the warning is gone
        Run third = check("--fail-on", "warning", "--cache");
        assertTrue(third.err().contains("1 unchanged programme reused, 1 checked"), third.err());
        assertEquals(0, third.exit(), third.out());
        assertFalse(third.out().contains("short-rest-compound"), third.out());
    }

    @Test
    void theCacheIsOffByDefaultAndNothingIsWrittenInTheRepository() throws IOException {
        Files.createDirectories(root.resolve(".git"));
        write("a", "60s");
        check();
        assertFalse(Files.exists(cacheHome.resolve("cache.json")), "no --cache: no cache file");
        try (Stream<Path> files = Files.walk(root)) {
            assertEquals(1, files.filter(Files::isRegularFile).count(), "only the programme itself");
        }
    }

    @Test
    void aRunWritingAJsonReportChecksEveryFileAfreshAndSaysWhy() throws IOException {
        Files.createDirectories(root.resolve(".git"));
        write("a", "60s");
        check("--cache");
        Run json = check("--cache", "--format", "json");
        assertTrue(json.err().contains("cache not used: a json report needs the training figures"), json.err());
        assertTrue(json.out().contains("\"metrics\""), "the figures are there");
    }
}
