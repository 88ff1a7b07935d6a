package dev.mesolint.core.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.baseline.Baseline;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.config.SettingNames;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.TempFiles;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The one run call every front end makes: what it checks, and what it applies in which order. */
class CheckRunTests {
    private final List<RuleDefinition> rules = BuiltInRules.all();

    @TempDir
    Path root;

    /** Squats with 60 s rest: short of the hypertrophy profile's 2 min after compound sets (ACSM 2009). */
    private static final String PROGRAMME = """
            format: 1
            programme:
              id: harbour-run
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
                        rest: 60s
            """;

    private List<String> rules(RunResult result) {
        return result.report().active().stream().map(Finding::ruleId).toList();
    }

    @Test
    void aRunChecksTheInputsAndComparesWithTheConfiguredBaselineUnlessToldNot() throws Exception {
        Path file = TempFiles.write(root, "programmes/block.yaml", PROGRAMME);
        RunRequest request = RunRequest.of(RunOptions.at(root), List.of(file));
        RunResult first = CheckRun.run(request, rules);
        assertTrue(rules(first).contains("short-rest-compound"), rules(first).toString());
        assertFalse(first.baselineInForce());

        Baseline.of(first.report()).write(root.resolve("baseline.json"));
        TempFiles.write(root, ".mesolint.yaml", "baseline: baseline.json\n");
        RunResult compared = CheckRun.run(RunRequest.of(RunOptions.at(root), List.of(file)), rules);
        assertEquals(List.of(), rules(compared), "the baseline holds them");
        assertTrue(compared.baselineInForce());
        RunResult plain = CheckRun.run(RunRequest.of(RunOptions.at(root), List.of(file)).withoutBaseline(), rules);
        assertEquals(rules(first), rules(plain), "without the baseline every finding counts");
    }

    @Test
    void aCacheIsFilledThenReusedAndProgressIsToldOfEveryFile() throws Exception {
        Path file = TempFiles.write(root, "programmes/block.yaml", PROGRAMME);
        Path cache = root.resolve("cache/results.json");
        AtomicInteger told = new AtomicInteger();
        RunRequest request = RunRequest.of(RunOptions.at(root), List.of(file)).withCache(cache)
                .withProgress((done, total, findings) -> told.incrementAndGet());
        RunResult first = CheckRun.run(request, rules);
        assertEquals(new RunResult.CacheUse(true, 0, 1, first.cache().discarded(), 0, Optional.empty()), first.cache());
        RunResult second = CheckRun.run(request, rules);
        assertEquals(1, second.cache().reused());
        assertEquals(rules(first), rules(second), "reused findings are the same findings");
        assertEquals(2, told.get());
        assertFalse(CheckRun.run(RunRequest.of(RunOptions.at(root), List.of(file)), rules).cache().used());
    }

    @Test
    void aPipedProgrammeIsCheckedAsTheFileItStandsFor() throws Exception {
        Path standsFor = root.resolve("programmes/draft.yaml");
        RunResult result = CheckRun.run(RunRequest.of(RunOptions.at(root), List.of()).withPiped(
                new RunRequest.Piped(standsFor, PROGRAMME.getBytes(StandardCharsets.UTF_8))), rules);
        assertEquals(List.of("programmes/draft.yaml"), result.report().files().stream()
                .map(f -> f.displayPath()).filter(p -> p.endsWith(".yaml")).toList());
        assertTrue(rules(result).contains("short-rest-compound"));
    }

    @Test
    void aBrokenConfigurationStopsTheRunNamingTheSettingInTheCallersWords() {
        RunOptions options = new RunOptions(root, Optional.of(root.resolve("none.yaml")), Optional.empty(),
                Optional.empty(), List.of(), Optional.empty()).namedAs(SettingNames.of(Map.of(SettingNames.CONFIG,
                        "config (mesolint.config)")));
        ConfigProblem p = assertThrows(ConfigProblem.class, () -> CheckRun.run(RunRequest.of(options,
                new ArrayList<>()), rules));
        assertTrue(p.describe().startsWith("config (mesolint.config): no configuration file at"), p.describe());
    }
}
