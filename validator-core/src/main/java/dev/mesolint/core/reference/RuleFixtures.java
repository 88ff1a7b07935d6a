package dev.mesolint.core.reference;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The fixture harness for rule authors, built-in or in a team's pack: check every fixture programme below a folder
 * ({@code <folder>/<rule-id>/failing*.yaml} and {@code passing*.yaml}, markers as {@link RuleExample} describes) with
 * the given rules, and say for each whether it holds. A pack's test passes the built-in rules plus its own, so that
 * its fixtures also show what the built-in rules find in them.
 */
public final class RuleFixtures {
    private RuleFixtures() {
    }

    /**
     * @param folder the fixture folder; a missing folder is an error, so that a moved folder cannot pass unseen
     * @return one verdict per fixture, sorted by path
     */
    public static List<FixtureVerdict> check(Path folder, List<? extends RuleDefinition> rules) throws IOException {
        List<Path> files = RuleExample.find(folder);
        if (files.isEmpty()) {
            throw new IOException("no fixture (failing*.yaml, passing*.yaml in a folder named after its rule) below "
                    + folder);
        }
        List<RuleExample> examples = new ArrayList<>();
        for (Path file : files) {
            examples.add(RuleExample.read(file));
        }
        Map<Path, FileReport> reports = ExampleRun.check(examples, folder, rules);
        List<FixtureVerdict> verdicts = new ArrayList<>();
        for (RuleExample example : examples) {
            FileReport report = reports.get(example.file());
            if (report == null) {
                throw new IOException("the check gave no report for " + example.file());
            }
            verdicts.add(FixtureVerdict.of(example, report));
        }
        return verdicts;
    }
}
