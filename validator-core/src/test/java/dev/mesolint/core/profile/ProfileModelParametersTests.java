package dev.mesolint.core.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.model.NamedModelParameters;
import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.model.ParameterBound;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.TempFiles;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** A profile's {@code model:} block sets training-model parameters, bounded and located like rule parameters. */
class ProfileModelParametersTests {
    private final List<RuleDefinition> rules = BuiltInRules.all();

    @TempDir
    Path root;

    /** Four bench sets at RIR 4: one rep more in reserve than the model's hard sets allow by default. */
    private static final String PROGRAMME = """
            format: 1
            programme:
              id: harbour-model
              level: intermediate
              goal: hypertrophy
            weeks:
              - week: 1
                sessions:
                  - day: 1
                    work:
                      - exercise: barbell-bench-press
                        sets: 4
                        reps: 8
                        rir: 4
                        rest: 3min
            """;

    private ProgrammeMetrics metricsUnder(Optional<String> profile) throws ConfigProblem {
        Path file = TempFiles.write(root, "block.yaml", PROGRAMME);
        Workspace ws = Workspace.open(new RunOptions(root, Optional.empty(), profile, Optional.empty(), List.of(),
                Optional.empty()), rules);
        return new Checker(ws.request(List.of(file)), rules).run().files().get(0).metrics().orElseThrow();
    }

    @Test
    void aProfileThatChangesOneParameterChangesTheComputedFigure() throws ConfigProblem {
        // A hard set leaves at most 3 reps in reserve by default: common practice (docs/model.md, "Hard sets").
        // The bench press credits the chest 1 per set as its prime mover (the built-in catalogue).
        ProgrammeMetrics byDefault = metricsUnder(Optional.empty());
        assertEquals(0, byDefault.weeks().get(0).hardSets(Muscle.CHEST), 1e-9, "RIR 4 is no hard set at 3");
        assertEquals(ModelParameters.defaults(), byDefault.parameters());

        TempFiles.write(root, "club.yaml", "profile: club\nextends: hypertrophy\nmodel:\n  hardSetMaxRir: 4\n");
        ProgrammeMetrics club = metricsUnder(Optional.of(root.resolve("club.yaml").toString()));
        assertEquals(4, club.weeks().get(0).hardSets(Muscle.CHEST), 1e-9, "4 sets at RIR 4 count when 4 is allowed");
        assertEquals(4, club.parameters().hardSetMaxRir());
        assertEquals(ModelParameters.defaults().recoveryTimeConstantSeconds(),
                club.parameters().recoveryTimeConstantSeconds(), "every other parameter keeps its default");
    }

    @Test
    void aProfileInheritsTheModelValuesOfTheProfileItExtendsAndMayChangeThem() throws ConfigProblem {
        TempFiles.write(root, "base.yaml", "profile: club-base\nextends: strength\nmodel:\n"
                + "  recoveryTimeConstantSeconds: 120\n  oneRepMaxRelation: epley\n");
        TempFiles.write(root, "squad.yaml", "profile: club-squad\nextends: base.yaml\nmodel:\n  dropSets: 3\n"
                + "  oneRepMaxRelation: MEAN\n");
        ProfileSet set = ProfileSet.load(List.of(dev.mesolint.core.config.ProfileRef.of("squad.yaml", root, "test",
                null)), rules);
        ModelParameters squad = set.get("club-squad").model();
        assertEquals(120, squad.recoveryTimeConstantSeconds());
        assertEquals(3, squad.dropSets());
        assertEquals(OneRepMaxRelation.MEAN, squad.oneRepMaxRelation());
        assertEquals(OneRepMaxRelation.EPLEY, set.get("club-base").model().oneRepMaxRelation());
        assertEquals(ModelParameters.defaults(), set.get("strength").model(), "built-in profiles keep the defaults");
    }

    private ConfigProblem problem(String model) {
        TempFiles.write(root, "bad.yaml", "profile: club-bad\nextends: hypertrophy\nmodel:\n" + model);
        ConfigProblem p = assertThrows(ConfigProblem.class, () -> ProfileSet.load(List.of(
                dev.mesolint.core.config.ProfileRef.of("bad.yaml", root, "test", null)), rules));
        // Shown from the file's name on: the temporary folder is no part of the message under test.
        return new ConfigProblem(p.source().substring(p.source().lastIndexOf('/') + 1), p.location().orElse(null),
                p.getMessage(), p.hint());
    }

    @Test
    void aBadParameterIsALocatedErrorWithAFix() {
        assertEquals("bad.yaml:4:3: unknown model parameter 'recoveryTimeConstant' (fix: did you mean "
                + "'recoveryTimeConstantSeconds'? docs/model.md, section 6, lists them with their bounds)",
                problem("  recoveryTimeConstant: 120\n").describe());
        assertEquals("bad.yaml:5:18: model hardSetMaxRir 9 is outside 0..5 (fix: choose a value from 0 to 5 "
                + "(docs/model.md, section 6, lists them with their bounds))",
                problem("  dropSets: 2\n  hardSetMaxRir: 9\n").describe());
        assertTrue(problem("  dropSets: 2.5\n").describe().startsWith("bad.yaml:4:13: model dropSets 2.5 is not a "
                + "whole number"), "counts are whole numbers");
        assertTrue(problem("  fatiguePerRep: lots\n").describe().startsWith("bad.yaml:4:18: model fatiguePerRep "
                + "'lots' is not a number"));
        assertTrue(problem("  oneRepMaxRelation: lander\n").describe().contains("one of: epley, brzycki, mean"));
        assertTrue(problem("  - hardSetMaxRir\n").describe().startsWith("bad.yaml:4:3: model must be a mapping"));
        // Each value is in bounds, but the zones no longer rise: located at the block.
        ConfigProblem zones = problem("  intensityZone2From: 0.5\n");
        assertTrue(zones.describe().startsWith("bad.yaml:3:1: the model parameters of profile 'club-bad' do not fit "
                + "together: intensity zone bounds must rise"), zones.describe());
    }

    @Test
    void theProfileSchemaListsEveryModelParameterWithItsBounds() throws IOException {
        JsonNode model;
        try (InputStream in = getClass().getResourceAsStream("/dev/mesolint/schema/profile.schema.json")) {
            model = JsonMapper.builder().build().readTree(in.readAllBytes()).at("/properties/model/properties");
        }
        assertEquals(NamedModelParameters.names(), new ArrayList<>(model.propertyNames()));
        for (String name : NamedModelParameters.names()) {
            ParameterBound bound = ModelParameters.BOUNDS.get(name);
            if (bound != null) {
                assertEquals(bound.min(), model.get(name).get("minimum").asDouble(), name);
                assertEquals(bound.max(), model.get(name).get("maximum").asDouble(), name);
                assertEquals(NamedModelParameters.kind(name).orElseThrow() == NamedModelParameters.Kind.WHOLE_NUMBER
                        ? "integer" : "number", model.get(name).get("type").asString(), name);
            }
        }
    }
}
