package dev.mesolint.core.review;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.report.ModelFigures;
import dev.mesolint.core.rule.RuleDefinition;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * One side of a review checked: the repository as it was at a revision (or is in the work tree), with that side's
 * own configuration and profiles, no baseline.
 *
 * @param figures the figures with each file's profile limits, for the limit crossings
 */
record SideCheck(RunReport report, CheckRequest request, ModelFigures figures) {

    /**
     * Checks {@code inputs} (paths under {@code options.root()}) as they are under {@code root}: the same options with
     * every path inside the repository moved to {@code root}.
     */
    static SideCheck of(RunOptions options, List<Path> inputs, Path root, List<RuleDefinition> rules, String side)
            throws ConfigProblem {
        RunOptions moved = new RunOptions(root, options.config().map(p -> move(options.root(), p, root)),
                options.profile().map(p -> moveProfile(options.root(), p, root)), options.failOn(),
                options.catalogues().stream().map(p -> move(options.root(), p, root)).toList(), Optional.empty());
        List<Path> paths = new ArrayList<>();
        for (Path input : inputs) {
            paths.add(move(options.root(), input, root));
        }
        Workspace workspace;
        try {
            workspace = Workspace.open(moved, rules);
        } catch (ConfigProblem e) {
            throw new ConfigProblem(side + ": " + e.source(), e.location().orElse(null), e.getMessage(), e.hint());
        }
        CheckRequest request = workspace.request(paths);
        RunReport report = new Checker(request, rules).run();
        return new SideCheck(report, request, ModelFigures.underProfiles(request.configuration(), rules));
    }

    /** {@code path} (relative to the working folder, or absolute) as it is below {@code root}; outside paths stay. */
    static Path move(Path from, Path path, Path root) {
        Path abs = path.toAbsolutePath().normalize();
        return abs.startsWith(from) ? root.resolve(from.relativize(abs).toString()) : abs;
    }

    /** A profile is a built-in name or a file: only a file that exists below the root moves. */
    private static String moveProfile(Path from, String profile, Path root) {
        Path asFile = Path.of(profile).toAbsolutePath().normalize();
        return asFile.startsWith(from) && asFile.toFile().isFile() ? move(from, asFile, root).toString() : profile;
    }
}
