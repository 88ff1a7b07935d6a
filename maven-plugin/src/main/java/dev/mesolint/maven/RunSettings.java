package dev.mesolint.maven;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.config.ProfileRef;
import dev.mesolint.core.config.RepositoryLayout;
import dev.mesolint.core.config.SettingNames;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.run.RunRequest;
import java.io.File;
import java.nio.file.FileSystems;
import java.nio.file.Path;
import java.nio.file.PathMatcher;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apache.maven.plugin.MojoExecutionException;

/**
 * The Mojo parameters that decide what is checked and how, as the core's run request (the core reads the repository
 * configuration and lets the parameters win). Values that are {@code null} were not set.
 */
record RunSettings(Path projectDir, File programmes, File config, String profile, String failOn, List<File> catalogues,
        File baseline, List<String> includes, List<String> excludes) {

    /** The parameters' names, for the core's problems and hints (the plugin offers no allowOutsideRoot). */
    private static final SettingNames PARAMETERS = SettingNames.of(Map.of(SettingNames.CONFIG,
            "config (mesolint.config)", SettingNames.PROFILE, "profile (mesolint.profile)", SettingNames.BASELINE,
            "baseline (mesolint.baseline)"));

    /** The run to ask the core for (before the goal adds its cache and baseline choices), and the rules. */
    record Prepared(RunRequest request, List<RuleDefinition> rules) {
    }

    Prepared prepare() throws MojoExecutionException {
        if (!programmes.exists()) {
            throw error("programmes", "no such folder or file: " + programmes
                    + "; set it to the folder that holds the programme files");
        }
        if (config != null && !config.isFile()) {
            throw error("config", "no configuration file at " + config + "; check the path, or leave the "
                    + "parameter out to use the nearest .mesolint.yaml above the programmes");
        }
        if (baseline != null && !baseline.isFile()) {
            throw error("baseline", "no baseline file at " + baseline + "; write one with 'mesolint baseline "
                    + "PATH... --output " + baseline + "', or leave the parameter out");
        }
        List<Path> extra = new ArrayList<>();
        for (File c : catalogues) {
            if (!c.isFile()) {
                throw error("catalogues", "no such file: " + c);
            }
            extra.add(c.toPath());
        }
        Optional<Severity> level = Optional.empty();
        if (failOn != null) {
            level = Optional.of(Severity.parseFailLevel(failOn).orElseThrow(() -> error("failOn",
                    "must be error, warning, info or none, not '" + failOn + "'")));
        }
        // A profile file named by the parameter is relative to the project folder, like every path in a POM.
        Optional<String> forced = Optional.ofNullable(profile).map(p -> ProfileRef.of(p, projectDir, "profile", null)
                .file().map(Path::toString).orElse(p));
        // The repository root and configuration are found by walking up from the programmes, as on the command line.
        RepositoryLayout layout = RepositoryLayout.discover(List.of(programmes.toPath()), Optional.empty(), projectDir);
        RunOptions options = new RunOptions(layout, Optional.ofNullable(config).map(File::toPath), forced, level, extra,
                Optional.ofNullable(baseline).map(File::toPath)).namedAs(PARAMETERS);
        try {
            List<RuleDefinition> rules = InstalledRules.discover(RunSettings.class.getClassLoader()).rules();
            return new Prepared(RunRequest.of(options, selected()), rules);
        } catch (ConfigProblem e) {
            throw problem(e);
        }
    }

    /**
     * What to check: the programmes folder, or, with includes or excludes, the files below it that the globs
     * (relative to the folder) let through.
     */
    private List<Path> selected() throws MojoExecutionException {
        if (includes.isEmpty() && excludes.isEmpty() || !programmes.isDirectory()) {
            return List.of(programmes.toPath());
        }
        List<PathMatcher> in = matchers("includes", includes);
        List<PathMatcher> out = matchers("excludes", excludes);
        Path folder = programmes.toPath().toAbsolutePath().normalize();
        List<Path> files = new ArrayList<>();
        for (Path file : ProgrammeFiles.discover(List.of(folder), new ArrayList<>())) {
            Path relative = folder.relativize(file);
            if ((in.isEmpty() || in.stream().anyMatch(m -> m.matches(relative)))
                    && out.stream().noneMatch(m -> m.matches(relative))) {
                files.add(file);
            }
        }
        return files;
    }

    private static List<PathMatcher> matchers(String parameter, List<String> globs) throws MojoExecutionException {
        List<PathMatcher> matchers = new ArrayList<>();
        for (String glob : globs) {
            try {
                matchers.add(FileSystems.getDefault().getPathMatcher("glob:" + glob.trim()));
            } catch (IllegalArgumentException e) {
                throw error(parameter, "'" + glob + "' is not a valid glob; write e.g. strength/** or drafts/*.yaml");
            }
        }
        return matchers;
    }

    /** A configuration problem as a build error: {@code mesolint: file:line:column: message (fix: ...)}. */
    static MojoExecutionException problem(ConfigProblem e) {
        return new MojoExecutionException("mesolint: " + e.describe(), e);
    }

    private static MojoExecutionException error(String parameter, String message) {
        return new MojoExecutionException("mesolint: " + parameter + " (mesolint." + parameter + "): " + message);
    }
}
