package dev.mesolint.core.engine;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.config.FolderRule;
import dev.mesolint.core.config.ProfileRef;
import dev.mesolint.core.config.RepositoryConfig;
import dev.mesolint.core.config.RepositoryConfigReader;
import dev.mesolint.core.config.SettingNames;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.profile.BuiltInProfiles;
import dev.mesolint.core.profile.ProfileChoice;
import dev.mesolint.core.profile.ProfileSet;
import dev.mesolint.core.programme.Goal;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.ruleset.RuleSetChanges;
import dev.mesolint.core.ruleset.RuleSetVersion;
import dev.mesolint.core.ruleset.UpgradeNotice;
import dev.mesolint.core.yaml.YamlLimits;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A programme repository as configured for one run: the repository configuration merged with the front end's
 * options (options win), the profiles loaded and resolved. Built once, before any file is checked, so that a broken
 * configuration stops the run with one located message.
 */
public final class Workspace {
    private final RunOptions options;
    private final RepositoryConfig config;
    private final ProfileConfiguration configuration;
    private final String defaultProfile;

    private Workspace(RunOptions options, RepositoryConfig config, ProfileConfiguration configuration,
            String defaultProfile) {
        this.options = options;
        this.config = config;
        this.configuration = configuration;
        this.defaultProfile = defaultProfile;
    }

    public static Workspace open(RunOptions options, List<? extends RuleDefinition> rules) throws ConfigProblem {
        RepositoryConfig config = readConfig(options);
        Optional<ProfileRef> forced = options.profile()
                .map(p -> ProfileRef.of(p, Path.of("").toAbsolutePath(), options.names().of(SettingNames.PROFILE),
                        null));
        List<ProfileRef> refs = new ArrayList<>();
        forced.ifPresent(refs::add);
        config.profile().ifPresent(refs::add);
        refs.addAll(config.goals().values());
        config.folders().forEach(f -> refs.add(f.profile()));
        ProfileSet profiles = ProfileSet.load(refs, rules);

        Optional<String> forcedName = forced.isPresent() ? Optional.of(profiles.nameOf(forced.get()))
                : Optional.empty();
        Optional<String> fallback = config.profile().isPresent()
                ? Optional.of(profiles.nameOf(config.profile().get())) : Optional.empty();
        Map<Goal, String> goals = new EnumMap<>(Goal.class);
        for (Map.Entry<Goal, ProfileRef> e : config.goals().entrySet()) {
            goals.put(e.getKey(), profiles.nameOf(e.getValue()));
        }
        List<ProfileChoice.FolderChoice> folders = new ArrayList<>();
        for (FolderRule f : config.folders()) {
            folders.add(new ProfileChoice.FolderChoice(shown -> f.matches(fromConfigFolder(options, config, shown)),
                    profiles.nameOf(f.profile())));
        }
        ProfileChoice choice = new ProfileChoice(forcedName, folders, goals, fallback);
        return new Workspace(options, config, new ProfileConfiguration(profiles, choice),
                forcedName.or(() -> fallback).orElse(BuiltInProfiles.DEFAULT));
    }

    /**
     * A file's shown path (relative to the root) made relative to the folder that holds the configuration file, which
     * is what folder rules are written against; the same when the configuration sits in the root.
     */
    private static String fromConfigFolder(RunOptions options, RepositoryConfig config, String shown) {
        Optional<Path> folder = config.file().map(Path::getParent);
        if (folder.isEmpty() || folder.get().equals(options.root())) {
            return shown;
        }
        return ProgrammeFiles.display(folder.get(), options.root().resolve(shown));
    }

    private static RepositoryConfig readConfig(RunOptions options) throws ConfigProblem {
        if (options.config().isPresent()) {
            Path file = options.config().get();
            if (!Files.isRegularFile(file)) {
                String setting = options.names().of(SettingNames.CONFIG);
                throw new ConfigProblem(setting, null, "no configuration file at " + file,
                        "check the path, or leave " + setting + " out to use the nearest " + RepositoryConfig.FILE_NAME
                                + " above the checked paths");
            }
            return RepositoryConfigReader.read(file, ProgrammeFiles.display(options.root(), file), options.root(),
                    options.allowOutsideRoot(), options.names());
        }
        Optional<Path> found = options.foundConfig().filter(Files::isRegularFile);
        return found.isPresent()
                ? RepositoryConfigReader.read(found.get(), ProgrammeFiles.display(options.root(), found.get()),
                        options.root(), options.allowOutsideRoot(), options.names())
                : RepositoryConfig.NONE;
    }

    /** The request to check {@code inputs} in this workspace. */
    public CheckRequest request(List<Path> inputs) {
        List<Path> catalogues = new ArrayList<>(config.catalogues());
        catalogues.addAll(options.catalogues());
        return new CheckRequest(inputs, options.root(), failOn(), catalogues, configuration, YamlLimits.DEFAULTS);
    }

    public Severity failOn() {
        return options.failOn().or(config::failOn).orElse(Severity.ERROR);
    }

    /** The baseline file to compare with: the option, else the configuration's. */
    public Optional<Path> baselineFile() {
        return options.baseline().or(config::baseline);
    }

    /**
     * What to tell the user when the configuration records another rule-set version than this mesolint applies
     * (the versions between and their changelog entries); empty when it records none or the same.
     */
    public Optional<List<String>> upgradeNotice() {
        if (config.rulesVersion().isEmpty() || config.file().isEmpty()) {
            return Optional.empty();
        }
        return UpgradeNotice.lines(config.rulesVersion().get(), RuleSetVersion.current(),
                ProgrammeFiles.display(options.root(), config.file().get()), RuleSetChanges.shipped());
    }

    public RepositoryConfig config() {
        return config;
    }

    /** What the front end was told. */
    public RunOptions options() {
        return options;
    }

    public ProfileConfiguration configuration() {
        return configuration;
    }

    public ProfileSet profiles() {
        return configuration.profiles();
    }

    /** The profile that applies when no programme says otherwise: forced, else configured, else hypertrophy. */
    public String defaultProfile() {
        return defaultProfile;
    }

    public Path root() {
        return options.root();
    }
}
