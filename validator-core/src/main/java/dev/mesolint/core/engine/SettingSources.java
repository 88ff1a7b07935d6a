package dev.mesolint.core.engine;

import dev.mesolint.core.config.RepositoryConfig;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;

/**
 * Where each setting of a run came from: the front end's option, the repository configuration file, or the built-in
 * default. One line per setting, for a front end's verbose or debug output.
 */
public final class SettingSources {
    private SettingSources() {
    }

    /**
     * @param option names the front end's option for a setting ({@code failOn} → {@code plugin parameter failOn})
     */
    public static List<String> describe(Workspace workspace, UnaryOperator<String> option) {
        RunOptions given = workspace.options();
        RepositoryConfig config = workspace.config();
        String file = config.file().map(f -> ProgrammeFiles.display(given.root(), f)).orElse(null);
        List<String> lines = new ArrayList<>();
        lines.add("config = " + (given.config().isPresent() ? file + " (" + option.apply("config") + ")"
                : file != null ? file + " (the nearest " + RepositoryConfig.FILE_NAME + " above the checked paths)"
                : "none (no " + RepositoryConfig.FILE_NAME + " between the checked paths and the root " + given.root()
                        + ")"));
        lines.add("profile = " + pick(given.profile(), config.profile().map(p -> p.text()), "profile", file, option,
                "named after each programme's goal")
                + (config.folders().isEmpty() && config.goals().isEmpty() || given.profile().isPresent() ? ""
                        : "; " + config.folders().size() + " folder and " + config.goals().size()
                                + " goal choices from " + file));
        lines.add("failOn = " + pick(given.failOn().map(s -> s.label()), config.failOn().map(s -> s.label()),
                "failOn", file, option, "error"));
        List<String> catalogues = new ArrayList<>();
        config.catalogues().forEach(c -> catalogues.add(shown(given, c) + " (" + file + ")"));
        given.catalogues().forEach(c -> catalogues.add(shown(given, c) + " (" + option.apply("catalogues") + ")"));
        lines.add("catalogues = " + (catalogues.isEmpty() ? "none (built-in default)" : String.join(", ", catalogues)));
        lines.add("baseline = " + pick(given.baseline().map(b -> shown(given, b)),
                config.baseline().map(b -> shown(given, b)), "baseline", file, option, "none"));
        return lines;
    }

    private static String pick(Optional<String> given, Optional<String> configured, String name, String file,
            UnaryOperator<String> option, String builtIn) {
        if (given.isPresent()) {
            return given.get() + " (" + option.apply(name) + ")";
        }
        if (configured.isPresent()) {
            return configured.get() + " (" + file + ")";
        }
        return builtIn + " (built-in default)";
    }

    private static String shown(RunOptions given, Path file) {
        return ProgrammeFiles.display(given.root(), file);
    }
}
