package dev.mesolint.core.profile;

import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.programme.Goal;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

/** The profiles shipped in the rules jar, one per programme goal. */
public final class BuiltInProfiles {
    /** The profile whose values are the rule metadata defaults. */
    public static final String DEFAULT = "hypertrophy";
    /** Built-in profile names, in reference order; each is also a programme goal. */
    public static final List<String> NAMES = Arrays.stream(Goal.values()).map(Goal::yamlName).toList();
    static final String SOURCE = "built-in";

    private BuiltInProfiles() {
    }

    /** The class-path resource of a built-in profile. */
    public static String resource(String name) {
        return "/dev/mesolint/profiles/" + name + ".yaml";
    }

    /** Reads every built-in profile. A broken one is a defect in mesolint, so it fails loudly. */
    static List<Profile> read(ProfileReader reader) {
        return NAMES.stream().map(name -> read(reader, name)).toList();
    }

    private static Profile read(ProfileReader reader, String name) {
        try (InputStream in = BuiltInProfiles.class.getResourceAsStream(resource(name))) {
            if (in == null) {
                throw new IllegalStateException("the built-in profile " + name + " is missing from the rules jar");
            }
            Profile p = reader.read(ConfigDocument.read(in.readAllBytes(), SOURCE + " " + name), Path.of(""));
            if (!p.name().equals(name)) {
                throw new IllegalStateException("the built-in profile file " + name + " names itself " + p.name());
            }
            if (p.parent().map(ref -> ref.isFile() || !NAMES.contains(ref.text())).orElse(false)) {
                throw new IllegalStateException("the built-in profile " + name + " extends a non-built-in profile");
            }
            return new Profile(p.name(), p.parent(), p.description(), p.rules(), p.model(), SOURCE);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (ConfigProblem e) {
            throw new IllegalStateException("the built-in profile is invalid: " + e.describe(), e);
        }
    }
}
