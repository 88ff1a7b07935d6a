package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.rules.BuiltInRules;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

class ModelFiguresTests {
    private static final Path SAMPLE = Path.of("..", "sample-programs", "programmes", "upper-lower-hypertrophy.yaml");

    private static FileReport checked() {
        return new Checker(CheckRequest.of(List.of(SAMPLE), SAMPLE.getParent()), BuiltInRules.all()).run().files()
                .get(0);
    }

    @Test
    void figuresFollowTheModelWeekBySessionAndSet() {
        FileReport file = checked();
        ProgrammeFigures figures = new ModelFigures((p, m) -> VolumeBounds.DEFAULTS).of(file).orElseThrow();
        var metrics = file.metrics().orElseThrow();
        assertEquals(metrics.weeks().size(), figures.weeks().size());
        WeekFigures w1 = figures.weeks().get(0);
        assertEquals(metrics.weeks().get(0).hardSets(dev.mesolint.core.catalogue.Muscle.CHEST),
                w1.muscles().get("chest").hardSets(), 1e-9);
        SessionFigures first = w1.sessions().get(0);
        assertEquals(metrics.weeks().get(0).sessions().get(0).minutes(), first.minutes(), 1e-9);
        // later sets in a session lose part of their stimulus to the fatigue the earlier ones left
        assertTrue(first.sets().stream().anyMatch(s -> s.discountedStimulus() < s.stimulus() - 1e-6));
        assertTrue(first.sets().stream().allMatch(s -> s.discountedStimulus() <= s.stimulus() + 1e-9));
        assertEquals(75.0, figures.sessionBudgetMinutes().orElseThrow());
    }

    @Test
    void theFloorAppliesOnlyToMusclesTrainedDirectly() {
        ProgrammeFigures figures = new ModelFigures((p, m) -> VolumeBounds.DEFAULTS).of(checked()).orElseThrow();
        assertEquals(4.0, figures.weeklySetBounds("chest").floor(), "chest is a prime mover of the bench press");
        assertEquals(4.0, figures.weeklySetBounds("glutes").floor(), "credit 1 in the squat, though listed second");
        assertEquals(0.0, figures.weeklySetBounds("forearms").floor(), "forearms are only credited as synergists");
        assertEquals(20.0, figures.weeklySetBounds("forearms").cap());
    }

    @Test
    void underAProfileTheLinesAreTheRulesLimits() throws Exception {
        var options = new dev.mesolint.core.engine.RunOptions(SAMPLE.getParent(), java.util.Optional.empty(),
                java.util.Optional.of("strength"), java.util.Optional.empty(), List.of(), java.util.Optional.empty());
        var workspace = dev.mesolint.core.engine.Workspace.open(options, BuiltInRules.all());
        FileReport file = new Checker(workspace.request(List.of(SAMPLE)), BuiltInRules.all()).run().files().get(0);
        ProgrammeFigures figures = ModelFigures.underProfiles(workspace.configuration(), BuiltInRules.all()).of(file)
                .orElseThrow();
        // the strength profile allows 25 weekly sets for the competition lifts' prime movers, 20 for the rest
        assertEquals(25.0, figures.weeklySetBounds("quadriceps").cap());
        assertEquals(20.0, figures.weeklySetBounds("lats").cap());
        // weekly-volume-min is off under strength (a growth floor; Androulakis-Korakakis et al. 2020): no floor line
        assertEquals(0.0, figures.weeklySetBounds("lats").floor());
    }
}
