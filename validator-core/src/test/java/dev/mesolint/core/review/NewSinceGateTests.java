package dev.mesolint.core.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check --new-since}: in a repository whose other programmes have findings, a change counts only what it
 * adds, with the baseline's safety policy. The programmes are the Harbourside samples.
 */
class NewSinceGateTests {
    private static final Path SAMPLES = Path.of("../sample-programs").toAbsolutePath().normalize();
    private static final String CLEAN = "programmes/minimal-30-minutes.yaml";

    @TempDir
    Path folder;

    private static String sample(String path) throws Exception {
        return Files.readString(SAMPLES.resolve(path), StandardCharsets.UTF_8);
    }

    /** The repository: one clean programme, one with an error of a non-safety rule, committed on main. */
    private GitFixture repository() throws Exception {
        GitFixture repo = GitFixture.init(folder);
        repo.write(CLEAN, sample(CLEAN));
        repo.write("programmes/effort-conflict.yaml", sample("broken/effort-conflict.yaml"));
        repo.commit("club programmes");
        return repo;
    }

    private static RunReport gated(GitFixture repo) throws Exception {
        Review review = ChangeReview.run(new ReviewRequest(RunOptions.at(repo.root()), List.of(), Optional.of("main"),
                Optional.empty()), ChangeReviewTests.rules());
        return new NewSinceGate(ChangeReviewTests.rules()).apply(review.after(), review);
    }

    private static List<String> counted(RunReport run) {
        return run.active().stream().filter(f -> f.severity().atLeast(Severity.WARNING)).map(Finding::ruleId)
                .sorted().toList();
    }

    @Test
    void aChangeToACleanProgrammePassesBesideAnotherProgrammesFindings() throws Exception {
        try (GitFixture repo = repository()) {
            repo.write(CLEAN, sample(CLEAN).replace("title: Harbourside thirty-minute full body",
                    "title: Harbourside thirty-minute full body (winter)"));
            RunReport run = gated(repo);
            assertFalse(run.failed(), () -> "counted: " + counted(run));
            assertTrue(run.files().stream().flatMap(f -> f.baselined().stream())
                    .anyMatch(f -> f.ruleId().equals("effort-conflict") && f.severity() == Severity.ERROR),
                    "the other programme's error is still shown, as held");
        }
    }

    @Test
    void aChangeThatAddsAFindingFails() throws Exception {
        try (GitFixture repo = repository()) {
            // 45 s after goblet squats: under the 2 min the hypertrophy profile asks after compound sets
            // (ACSM 2009 position stand: 2-3 min for core lifts; common practice).
            repo.write(CLEAN, sample(CLEAN).replaceFirst("rest: 2min", "rest: 45s"));
            RunReport run = gated(repo);
            assertEquals(List.of("short-rest-compound"), counted(run));
            assertEquals(1, run.active().stream().filter(f -> f.ruleId().equals("short-rest-compound")).count());
            assertEquals(0, run.active().stream().filter(f -> f.ruleId().equals("effort-conflict")).count());
        }
    }

    @Test
    void safetyErrorsAndFilesThatDidNotLoadAlwaysCount() throws Exception {
        try (GitFixture repo = repository()) {
            repo.write("programmes/constraint-load.yaml", sample("broken/constraint-load.yaml"));
            repo.write("programmes/schema.yaml", sample("broken/schema.yaml"));
            repo.commit("two more");
            // Nothing changed since main in those two files, yet their findings count.
            RunReport run = gated(repo);
            assertTrue(run.failed());
            List<String> counted = counted(run);
            assertTrue(counted.contains("constraint-load"), counted::toString);
            assertTrue(counted.contains("schema"), counted::toString);
            assertFalse(counted.contains("effort-conflict"), counted::toString);
        }
    }
}
