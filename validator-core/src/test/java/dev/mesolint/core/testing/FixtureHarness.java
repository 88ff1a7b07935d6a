package dev.mesolint.core.testing;

import static org.junit.jupiter.api.Assertions.fail;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.reference.ExampleRun;
import dev.mesolint.core.reference.FixtureVerdict;
import dev.mesolint.core.reference.RuleExample;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Runs fixture programmes ({@code src/test/resources/fixtures/<rule-id>/{failing,passing}*.yaml}) and compares
 * what the checker found with the {@code # expect:} markers: every finding of every rule must be marked, and every
 * marked finding must be found. See {@link RuleExample} for the marker syntax.
 */
public final class FixtureHarness {
    /** The fixture folder, relative to the module (Surefire runs tests there). */
    public static final Path FIXTURES = Path.of("src/test/resources/fixtures").toAbsolutePath();

    private FixtureHarness() {
    }

    public static List<RuleExample> all() {
        try {
            List<RuleExample> out = new ArrayList<>();
            for (Path p : RuleExample.find(FIXTURES)) {
                out.add(RuleExample.read(p));
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Checks the fixtures with {@code rules}, each under the profile its first line names. */
    public static Map<Path, FileReport> check(List<RuleExample> examples, List<? extends RuleDefinition> rules) {
        return ExampleRun.check(examples, FIXTURES, rules);
    }

    /** Fails unless the findings in {@code report} are exactly the marked ones (line, rule, waived, count). */
    public static void verify(RuleExample example, FileReport report) {
        FixtureVerdict verdict = FixtureVerdict.of(example, report);
        if (!verdict.holds()) {
            fail(verdict.explain());
        }
    }
}
