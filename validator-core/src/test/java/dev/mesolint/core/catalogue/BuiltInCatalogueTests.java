package dev.mesolint.core.catalogue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.format.CatalogueReader;
import dev.mesolint.core.format.FormatSchema;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class BuiltInCatalogueTests {
    private static final Catalogue CATALOGUE = new CatalogueReader(new LocatedYamlReader(YamlLimits.DEFAULTS),
            FormatSchema.load(FormatSchema.CATALOGUE)).builtIn();

    @Test
    void holdsAtLeastAHundredExercises() {
        assertTrue(CATALOGUE.size() >= 100, "size " + CATALOGUE.size());
    }

    @Test
    void everyCreditIsPrimeMoverOrSynergistAndEveryEntryHasAPrimeMover() {
        // Pelland et al. 2024 (SportRxiv; Sports Med 2025): counting indirect sets as 0.5 fit best
        for (Exercise e : CATALOGUE.entries()) {
            assertTrue(e.muscles().values().stream().allMatch(c -> c == 1.0 || c == 0.5), e.id() + " " + e.muscles());
            assertTrue(e.primeMover().isPresent(), e.id() + " has no prime mover");
            assertTrue(!e.regions().isEmpty() || e.pattern() == MovementPattern.CORE, e.id() + " loads no region");
        }
    }

    @Test
    void everyPatternAndSomeUnstableVariantsAreCovered() {
        Set<MovementPattern> patterns = EnumSet.noneOf(MovementPattern.class);
        CATALOGUE.entries().forEach(e -> patterns.add(e.pattern()));
        assertEquals(EnumSet.allOf(MovementPattern.class), patterns);
        assertTrue(CATALOGUE.entries().stream().filter(e -> e.stability() == Stability.UNSTABLE).count() >= 3);
        assertTrue(CATALOGUE.entries().stream().anyMatch(e -> e.skill() == Skill.HIGH));
    }

    @Test
    void theIdsTheFormatDocumentsExist() {
        for (String id : List.of("barbell-bench-press", "barbell-back-squat", "cable-curl",
                "cable-overhead-triceps-extension", "barbell-upright-row")) {
            assertTrue(CATALOGUE.find(id).isPresent(), id);
        }
    }

    @Test
    void classicCompoundCreditsMatchTheTrade() {
        // common practice: the bench press is a chest lift with triceps and front delts assisting
        Exercise bench = CATALOGUE.find("barbell-bench-press").orElseThrow();
        assertEquals(ExerciseKind.COMPOUND, bench.kind());
        assertEquals(1.0, bench.credit(Muscle.CHEST));
        assertEquals(0.5, bench.credit(Muscle.TRICEPS));
        assertEquals(Muscle.CHEST, bench.primeMover().orElseThrow());
        // common practice: the back squat is first a quadriceps lift, with the glutes also prime movers
        assertEquals(Muscle.QUADRICEPS, CATALOGUE.find("barbell-back-squat").orElseThrow().primeMover().orElseThrow());
        // common practice: a curl is a one-joint biceps exercise
        Exercise curl = CATALOGUE.find("cable-curl").orElseThrow();
        assertEquals(ExerciseKind.ISOLATION, curl.kind());
        assertEquals(Muscle.BICEPS, curl.primeMover().orElseThrow());
    }

    @Test
    void olympicLiftsJumpsAndThrowsAreBallisticAndGrindsAreNot() {
        // common practice: in the Olympic lifts and their power variants, jumps and throws a set ends with a missed
        // lift (the bar too slow to catch), not with muscular failure
        for (String id : List.of("power-clean", "hang-power-clean", "barbell-clean", "barbell-snatch", "power-snatch",
                "hang-power-snatch", "barbell-clean-and-jerk", "barbell-split-jerk", "barbell-push-jerk",
                "barbell-push-press", "barbell-jump-squat", "box-jump", "medicine-ball-chest-pass",
                "medicine-ball-slam", "kettlebell-swing")) {
            assertTrue(CATALOGUE.find(id).orElseThrow().ballistic(), id);
        }
        for (String id : List.of("barbell-back-squat", "barbell-deadlift", "barbell-bench-press", "cable-curl")) {
            assertTrue(!CATALOGUE.find(id).orElseThrow().ballistic(), id);
        }
    }

    @Test
    void theCompetitionLiftsAreMainAndMachinesAndIsolationWorkAreAssistance() {
        // common practice: squat, bench press, deadlift, overhead press and the Olympic lifts are the main lifts a
        // strength session is built around; rows, lunges, machines and one-joint work assist them
        for (String id : List.of("barbell-back-squat", "barbell-front-squat", "barbell-deadlift", "sumo-deadlift",
                "barbell-bench-press", "barbell-overhead-press", "power-clean", "barbell-snatch", "trap-bar-deadlift")) {
            assertEquals(Role.MAIN, CATALOGUE.find(id).orElseThrow().defaultRole(), id);
        }
        for (String id : List.of("goblet-squat", "machine-leg-press", "barbell-bent-over-row", "pull-up",
                "dumbbell-walking-lunge", "cable-curl", "machine-leg-extension", "barbell-romanian-deadlift")) {
            assertEquals(Role.ASSISTANCE, CATALOGUE.find(id).orElseThrow().defaultRole(), id);
        }
    }

    @Test
    void suggestionsFindNearMissesAndSharedWords() {
        assertEquals("barbell-bench-press", CATALOGUE.closest("barbel-bench-press", 3).get(0));
        assertEquals("barbell-back-squat", CATALOGUE.closest("barbell-backsquat", 3).get(0));
        List<String> bench = CATALOGUE.closest("bench-press", 5);
        assertTrue(bench.stream().allMatch(id -> id.contains("bench") || id.contains("press")), bench.toString());
        assertEquals(List.of(), CATALOGUE.closest("zzzzzzzzzzzz", 3));
    }
}
