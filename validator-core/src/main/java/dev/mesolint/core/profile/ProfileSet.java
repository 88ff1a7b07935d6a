package dev.mesolint.core.profile;

import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.config.ProfileRef;
import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The built-in profiles and the team profiles a run refers to, each resolved along its {@code extends} chain.
 * Immutable once loaded, and shared by every file of a run.
 */
public final class ProfileSet {
    private final Map<String, ResolvedProfile> byName;
    private final Map<Path, String> nameByFile;

    private ProfileSet(Map<String, ResolvedProfile> byName, Map<Path, String> nameByFile) {
        this.byName = Map.copyOf(byName);
        this.nameByFile = Map.copyOf(nameByFile);
    }

    /** The built-in profiles only. */
    public static ProfileSet builtIn(List<? extends RuleDefinition> rules) {
        try {
            return load(List.of(), rules);
        } catch (ConfigProblem e) {
            throw new IllegalStateException("the built-in profiles do not resolve: " + e.describe(), e);
        }
    }

    /**
     * Loads the built-in profiles, every team profile file among {@code refs} and the files they extend, and
     * resolves them all. Names in {@code refs} are not checked here: see {@link #nameOf}.
     */
    public static ProfileSet load(Collection<ProfileRef> refs, List<? extends RuleDefinition> rules)
            throws ConfigProblem {
        ProfileReader reader = new ProfileReader(rules);
        Map<String, Profile> profiles = new LinkedHashMap<>();
        BuiltInProfiles.read(reader).forEach(p -> profiles.put(p.name(), p));
        Map<Path, String> files = new HashMap<>();
        Deque<ProfileRef> pending = new ArrayDeque<>(refs);
        while (!pending.isEmpty()) {
            ProfileRef ref = pending.pop();
            if (ref.file().isEmpty() || files.containsKey(ref.file().get())) {
                continue;
            }
            Path file = ref.file().get();
            Profile p = readFile(reader, ref, file);
            Profile earlier = profiles.get(p.name());
            if (earlier != null) {
                throw new ConfigProblem(p.source(), null, "the profile name '" + p.name() + "' is already taken by "
                        + (earlier.source().equals(BuiltInProfiles.SOURCE) ? "a built-in profile" : earlier.source()),
                        "give this profile its own name, e.g. profile: club-" + p.name());
            }
            profiles.put(p.name(), p);
            files.put(file, p.name());
            p.parent().ifPresent(pending::push);
        }
        Map<String, ResolvedProfile> resolved = new LinkedHashMap<>();
        for (Profile p : profiles.values()) {
            resolved.put(p.name(), resolve(p, profiles, files, rules));
        }
        return new ProfileSet(resolved, files);
    }

    private static Profile readFile(ProfileReader reader, ProfileRef ref, Path file) throws ConfigProblem {
        try {
            return reader.read(ConfigDocument.read(file, display(file)), file.getParent());
        } catch (ConfigProblem e) {
            if (e.location().isEmpty() && e.getMessage().equals("no such file")) {
                throw ref.problem("no profile file at " + ref.text(), "check the path: it is read from the folder "
                        + "of " + ref.source() + "; or name a built-in profile (" + String.join(", ",
                                BuiltInProfiles.NAMES) + ")");
            }
            throw e;
        }
    }

    private static String display(Path file) {
        Path cwd = Path.of("").toAbsolutePath();
        return (file.startsWith(cwd) ? cwd.relativize(file) : file).toString().replace('\\', '/');
    }

    private static ResolvedProfile resolve(Profile profile, Map<String, Profile> profiles, Map<Path, String> files,
            List<? extends RuleDefinition> rules) throws ConfigProblem {
        List<Profile> chain = new ArrayList<>();
        Set<String> seen = new LinkedHashSet<>();
        Profile current = profile;
        while (current != null) {
            if (!seen.add(current.name())) {
                ProfileRef ref = chain.get(chain.size() - 1).parent().orElseThrow();
                throw ref.problem("profiles extend each other in a circle: " + String.join(" -> ", seen) + " -> "
                        + current.name(), "let one of them extend a built-in profile instead");
            }
            chain.add(current);
            Optional<ProfileRef> parent = current.parent();
            current = parent.isEmpty() ? null : profiles.get(nameOf(parent.get(), profiles.keySet(), files));
        }
        Map<String, RuleSettings> settings = new LinkedHashMap<>();
        for (RuleDefinition rule : rules) {
            RuleSettings s = RuleSettings.defaults(rule.metadata());
            for (int i = chain.size() - 1; i >= 0; i--) {
                RuleOverride o = chain.get(i).rules().get(rule.id());
                if (o != null) {
                    s = o.applyTo(s);
                }
            }
            settings.put(rule.id(), s);
        }
        return new ResolvedProfile(profile.name(), profile.description(), profile.source(),
                chain.stream().map(Profile::name).toList(), settings, model(chain));
    }

    /** The defaults with each profile's {@code model:} values applied, from the root of the chain down. */
    private static ModelParameters model(List<Profile> chain) throws ConfigProblem {
        ModelParameters model = ModelParameters.defaults();
        for (int i = chain.size() - 1; i >= 0; i--) {
            Profile p = chain.get(i);
            try {
                model = p.model().applyTo(model);
            } catch (IllegalArgumentException e) {
                // Each value is within its bounds (the reader checked); only a combination can fail here.
                throw new ConfigProblem(p.source(), p.model().at().orElse(null), "the model parameters of profile '"
                        + p.name() + "' do not fit together: " + e.getMessage(), "keep the intensity zone bounds "
                        + "rising (intensityZone1From < intensityZone2From < intensityZone3From < "
                        + "intensityZone4From), counting the values the profile inherits");
            }
        }
        return model;
    }

    private static String nameOf(ProfileRef ref, Collection<String> names, Map<Path, String> files)
            throws ConfigProblem {
        if (ref.file().isPresent()) {
            String name = files.get(ref.file().get());
            if (name == null) {
                throw ref.problem("the profile file " + ref.text() + " was not loaded", "check the path");
            }
            return name;
        }
        if (!names.contains(ref.text())) {
            throw ref.problem("no profile named '" + ref.text() + "'", ConfigDocument.closest(ref.text(), names)
                    .map(n -> "did you mean '" + n + "'? ").orElse("") + "known profiles: " + String.join(", ", names)
                    + "; a team profile is named by the path of its file");
        }
        return ref.text();
    }

    /** The name of the profile {@code ref} refers to; a located problem when there is none. */
    public String nameOf(ProfileRef ref) throws ConfigProblem {
        return nameOf(ref, names(), nameByFile);
    }

    public Optional<ResolvedProfile> find(String name) {
        return Optional.ofNullable(byName.get(name));
    }

    public ResolvedProfile get(String name) {
        ResolvedProfile p = byName.get(name);
        if (p == null) {
            throw new IllegalArgumentException("no profile " + name);
        }
        return p;
    }

    /** The team profile files loaded (those named and those they extend), as absolute paths. */
    public Set<Path> files() {
        return nameByFile.keySet();
    }

    /** Every profile name: the built-in ones first. */
    public List<String> names() {
        List<String> names = new ArrayList<>(BuiltInProfiles.NAMES);
        byName.keySet().stream().filter(n -> !names.contains(n)).sorted().forEach(names::add);
        return names;
    }
}
