package dev.mesolint.core.reference;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.ProfileConfiguration;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.profile.ProfileChoice;
import dev.mesolint.core.profile.ProfileSet;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.yaml.YamlLimits;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Checks many rule examples in one run, each under the profile it names (else its goal's built-in profile). */
public final class ExampleRun {
    private ExampleRun() {
    }

    /**
     * @param root paths in the reports are shown relative to this folder
     * @return the report of each example, by file
     */
    public static Map<Path, FileReport> check(List<RuleExample> examples, Path root,
            List<? extends RuleDefinition> rules) {
        Map<String, String> named = new HashMap<>();
        examples.forEach(e -> e.profile().ifPresent(p -> named.put(ProgrammeFiles.display(root, e.file()), p)));
        ProfileChoice choice = new ProfileChoice(Optional.empty(),
                named.entrySet().stream().map(e -> new ProfileChoice.FolderChoice(e.getKey()::equals, e.getValue()))
                        .toList(),
                Map.of(), Optional.empty());
        CheckRequest request = new CheckRequest(examples.stream().map(RuleExample::file).toList(), root,
                Severity.ERROR, List.of(), new ProfileConfiguration(ProfileSet.builtIn(rules), choice),
                YamlLimits.DEFAULTS);
        Map<Path, FileReport> byFile = new HashMap<>();
        List<FileReport> reports = new Checker(request, List.copyOf(rules)).run().files();
        for (RuleExample e : examples) {
            String shown = ProgrammeFiles.display(root, e.file());
            reports.stream().filter(r -> r.displayPath().equals(shown)).findFirst()
                    .ifPresent(r -> byFile.put(e.file(), r));
        }
        return byFile;
    }
}
