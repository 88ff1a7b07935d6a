package dev.mesolint.core.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.rule.RuleDefinition;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reviews of changes committed to real git repositories built with JGit in a temporary folder. */
class ChangeReviewTests {
    private static final String BLOCK = "programmes/block.yaml";

    @TempDir
    Path folder;

    static List<RuleDefinition> rules() {
        return InstalledRules.builtIn().rules();
    }

    private Review review(GitFixture repo, String base, String head) throws ConfigProblem {
        return ChangeReview.run(new ReviewRequest(RunOptions.at(repo.root()), List.of(), Optional.ofNullable(base),
                Optional.ofNullable(head)), rules());
    }

    private static ProgrammeChange only(Review review) {
        List<ProgrammeChange> changed = review.changed();
        assertEquals(1, changed.size(), () -> "changed programmes: " + changed);
        return changed.get(0);
    }

    private static List<String> rulesOf(List<Finding> findings) {
        return findings.stream().map(Finding::ruleId).sorted().toList();
    }

    @Test
    void setsAddedToOneMuscleChangeItsWeekAndLiftFiguresAndResolveTheFloorFinding() throws Exception {
        try (GitFixture repo = GitFixture.init(folder)) {
            repo.write(BLOCK, ReviewProgrammes.block()).commit("block");
            // Two more bench press sets, in the work tree (the default head).
            repo.write(BLOCK, ReviewProgrammes.block(5, "2min", "70%"));
            Review review = review(repo, "main", null);
            ProgrammeChange change = only(review);
            assertEquals(ProgrammeChange.Status.EDITED, change.status());

            MuscleWeekChange chest = change.figures().muscles().stream().filter(m -> m.muscle().equals("chest"))
                    .findFirst().orElseThrow();
            // A working set counts once for its prime mover; the bench press's is the chest (common practice).
            assertEquals(3, chest.workingSets().before().getAsDouble());
            assertEquals(5, chest.workingSets().after().getAsDouble());
            // Credited hard sets: 1 per prime-mover set at RIR 2 or closer (common practice).
            assertEquals(2.0, chest.hardSets().change(), 1e-9);
            assertTrue(chest.stimulus().change() > 0, "more hard sets, more stimulus");
            // Synergists are credited half a set each (common practice): triceps and front delts +1.
            for (String synergist : List.of("triceps", "front-delts")) {
                MuscleWeekChange m = change.figures().muscles().stream().filter(r -> r.muscle().equals(synergist))
                        .findFirst().orElseThrow();
                assertEquals(0, m.workingSets().change(), 1e-9);
                assertEquals(1.0, m.hardSets().change(), 1e-9);
            }
            assertEquals(List.of("chest", "front-delts", "triceps"), change.figures().muscles().stream()
                    .map(MuscleWeekChange::muscle).toList(), "only the muscles the bench press trains change");

            LiftChange bench = change.figures().lifts().stream().filter(l -> l.exercise().equals("barbell-bench-press"))
                    .findFirst().orElseThrow();
            // Volume load = sets x reps x load (common practice): 2 more sets x 8 reps x 70 kg (70% of 100 kg).
            assertEquals(3 * 8 * 70.0, bench.volumeLoad().before().getAsDouble(), 1e-9);
            assertEquals(1120.0, bench.volumeLoad().change(), 1e-9);
            assertFalse(bench.topSetIntensity().changed(), "the load is the same 70% of 1RM");

            // The day 1 session gets longer; day 3 does not change.
            assertEquals(List.of(1), change.figures().sessions().stream().map(SessionChange::day).toList());
            assertTrue(change.figures().sessions().get(0).minutes().change() > 0);

            // Chest from 3 to 5 hard sets crosses the hypertrophy floor of 4 (the profile's weekly-volume-min).
            assertEquals(1, change.limits().size());
            LimitCrossing crossing = change.limits().get(0);
            assertEquals("chest", crossing.subject());
            assertEquals(LimitCrossing.Kind.BACK_OVER_FLOOR, crossing.kind());
            assertEquals(4, crossing.limit(), 1e-9);

            assertEquals(List.of(), change.findings().introduced());
            assertEquals(List.of("weekly-volume-min"), rulesOf(change.findings().resolved()));
            assertTrue(change.findings().resolved().get(0).message().contains("chest"));
            assertEquals(6, change.findings().unchanged().size(), "the six other muscles stay under the floor");
        }
    }

    @Test
    void aShortenedRestTakesItsMinutesOffTheSessionAndAddsAFinding() throws Exception {
        try (GitFixture repo = GitFixture.init(folder)) {
            String base = repo.write(BLOCK, ReviewProgrammes.block()).commit("block");
            repo.write(BLOCK, ReviewProgrammes.block(3, "60s", "70%"));
            String head = repo.commit("shorter rows");
            Review review = review(repo, base, head);
            ProgrammeChange change = only(review);
            // The sets stay; the stimulus of the row's muscles drops, since a shorter rest leaves more fatigue
            // (Schoenfeld et al. 2016, J Strength Cond Res 30(7): 3-min rests grew more muscle than 1-min rests).
            assertEquals(List.of("lats", "upper-back", "rear-delts", "biceps"), change.figures().muscles().stream()
                    .map(MuscleWeekChange::muscle).toList());
            for (MuscleWeekChange m : change.figures().muscles()) {
                assertEquals(0, m.workingSets().change(), 1e-9);
                assertEquals(0, m.hardSets().change(), 1e-9);
                assertTrue(m.stimulus().change() < 0, m::toString);
            }
            SessionChange upper = change.figures().sessions().get(0);
            assertEquals(1, change.figures().sessions().size());
            assertEquals("Upper", upper.name());
            // Three rows, each followed by a rest (the row is not the session's last set): 3 x 1 min less.
            assertEquals(-3.0, upper.minutes().change(), 1e-9);
            assertEquals(List.of("short-rest-compound"), rulesOf(change.findings().introduced()));
            assertEquals(List.of(), change.findings().resolved());
            assertEquals(7, change.findings().unchanged().size());
        }
    }

    @Test
    void aHeavierTopSetShowsItsIntensityAndVolumeLoad() throws Exception {
        try (GitFixture repo = GitFixture.init(folder)) {
            String base = repo.write(BLOCK, ReviewProgrammes.block()).commit("block");
            String head = repo.write(BLOCK, ReviewProgrammes.block(3, "2min", "75%")).commit("heavier squats");
            LiftChange squat = only(review(repo, base, head)).figures().lifts().get(0);
            assertEquals("barbell-back-squat", squat.exercise());
            // Intensity as a share of 1RM (common practice): 70% -> 75%.
            assertEquals(70.0, squat.topSetIntensity().before().getAsDouble(), 1e-9);
            assertEquals(5.0, squat.topSetIntensity().change(), 1e-9);
            // 3 sets x 8 reps x (0.75 - 0.70) x 120 kg = 144 kg more (common practice: sets x reps x load).
            assertEquals(144.0, squat.volumeLoad().change(), 1e-9);
        }
    }

    @Test
    void aRenamedProgrammeKeepsItsFindingsAndADeletedOneResolvesThem() throws Exception {
        try (GitFixture repo = GitFixture.init(folder)) {
            repo.write(BLOCK, ReviewProgrammes.block());
            repo.write("programmes/other.yaml", ReviewProgrammes.block().replace("harbour-review-block",
                    "harbour-second-block"));
            String base = repo.commit("two blocks");
            repo.move(BLOCK, "programmes/autumn/block-renamed.yaml").delete("programmes/other.yaml");
            String head = repo.commit("move one, drop the other");
            Review review = review(repo, base, head);
            assertEquals(2, review.changed().size());
            ProgrammeChange moved = review.changed().get(0);
            assertEquals(ProgrammeChange.Status.RENAMED, moved.status());
            assertEquals(Optional.of(BLOCK), moved.before());
            assertEquals(Optional.of("programmes/autumn/block-renamed.yaml"), moved.after());
            assertEquals(FigureChanges.NONE, moved.figures());
            assertEquals(0, moved.findings().introduced().size());
            assertEquals(0, moved.findings().resolved().size());
            assertEquals(7, moved.findings().unchanged().size());

            ProgrammeChange removed = review.changed().get(1);
            assertEquals(ProgrammeChange.Status.REMOVED, removed.status());
            assertEquals(Optional.of("programmes/other.yaml"), removed.before());
            assertEquals(Optional.empty(), removed.after());
            assertEquals(7, removed.findings().resolved().size());
            assertEquals(7, review.resolvedCount());
            assertEquals(0, review.introducedCount());
        }
    }

    @Test
    void aMoveWithHeavyEditsIsPairedByProgrammeId() throws Exception {
        try (GitFixture repo = GitFixture.init(folder)) {
            String base = repo.write(BLOCK, ReviewProgrammes.block()).commit("block");
            repo.delete(BLOCK).write("elsewhere/new-name.yaml", ReviewProgrammes.block(6, "3min", "80%"));
            Review review = review(repo, base, null);
            ProgrammeChange change = only(review);
            assertEquals(ProgrammeChange.Status.RENAMED, change.status());
            assertEquals(Optional.of("elsewhere/new-name.yaml"), change.after());
            assertTrue(change.figures().changed());
        }
    }

    @Test
    void aProfileChangedInTheConfigurationChangesTheFindingsOfAnUnchangedFile() throws Exception {
        try (GitFixture repo = GitFixture.init(folder)) {
            String base = repo.write(BLOCK, ReviewProgrammes.block()).commit("block");
            // A team profile asking 3 minutes after compound assistance sets: the 2-minute row rests now fall short.
            repo.write(".mesolint/profiles/long-rests.yaml", """
                    profile: harbourside-long-rests
                    extends: hypertrophy
                    rules:
                      short-rest-compound: {min-rest-assistance: 3min}
                    """);
            String head = repo.write(".mesolint.yaml", "profile: .mesolint/profiles/long-rests.yaml\n")
                    .commit("longer rests for the whole club");
            ProgrammeChange change = only(review(repo, base, head));
            assertEquals(ProgrammeChange.Status.UNCHANGED, change.status());
            assertEquals(Optional.of("hypertrophy"), change.profileBefore());
            assertEquals(Optional.of("harbourside-long-rests"), change.profileAfter());
            assertEquals(FigureChanges.NONE, change.figures(), "the same programme has the same figures");
            assertEquals(List.of("short-rest-compound"), rulesOf(change.findings().introduced()));
            assertEquals(List.of(), change.findings().resolved());
            assertEquals(7, change.findings().unchanged().size(), "the floor findings match across profiles");
        }
    }

    @Test
    void theBaseDefaultsToTheMergeBaseWithTheDefaultBranch() throws Exception {
        try (GitFixture repo = GitFixture.init(folder)) {
            String fork = repo.write(BLOCK, ReviewProgrammes.block()).commit("block");
            repo.branch("more-bench");
            repo.write(BLOCK, ReviewProgrammes.block(4, "2min", "70%")).commit("one more set");
            Review review = review(repo, null, null);
            assertEquals(fork, review.base().commit());
            assertEquals("merge base with main", review.base().shown());
            assertEquals(1, only(review).figures().muscles().stream().filter(m -> m.muscle().equals("chest"))
                    .findFirst().orElseThrow().hardSets().change(), 1e-9);
        }
    }

    @Test
    void unknownRevisionsAndFoldersOutsideGitAreLocatedProblems() throws Exception {
        try (GitFixture repo = GitFixture.init(folder.resolve("repo"))) {
            repo.write(BLOCK, ReviewProgrammes.block()).commit("block");
            ConfigProblem unknown = assertThrows(ConfigProblem.class, () -> review(repo, "no-such-branch", null));
            assertEquals("revision 'no-such-branch'", unknown.source());
            assertTrue(unknown.hint().contains("fetch the history"));
        }
        Path plain = folder.resolve("plain");
        java.nio.file.Files.createDirectories(plain);
        ConfigProblem notGit = assertThrows(ConfigProblem.class, () -> ChangeReview.run(new ReviewRequest(
                RunOptions.at(plain), List.of(), Optional.of("main"), Optional.empty()), rules()));
        assertTrue(notGit.getMessage().contains("not inside a git repository"));
    }
}
