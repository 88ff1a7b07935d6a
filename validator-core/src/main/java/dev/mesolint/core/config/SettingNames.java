package dev.mesolint.core.config;

import java.util.Map;
import java.util.Optional;

/**
 * How a front end names the settings it passes to a run ({@code --config} on the command line, {@code config
 * (mesolint.config)} in the Maven plugin), so that the core's problems and hints use the caller's words and never
 * its own guess at them. A setting the front end does not offer has no name, and hints leave it out.
 */
public final class SettingNames {
    /** The explicit configuration file. */
    public static final String CONFIG = "config";
    /** The profile forced on every programme. */
    public static final String PROFILE = "profile";
    /** The baseline file. */
    public static final String BASELINE = "baseline";
    /** Accepting configured paths outside the repository root. */
    public static final String ALLOW_OUTSIDE_ROOT = "allowOutsideRoot";

    /** Names for a caller that did not say: each setting by its neutral name, "the config setting". */
    public static final SettingNames NEUTRAL = new SettingNames(Map.of(CONFIG, "the config setting", PROFILE,
            "the profile setting", BASELINE, "the baseline setting"));

    private final Map<String, String> names;

    private SettingNames(Map<String, String> names) {
        this.names = Map.copyOf(names);
    }

    /** The front end's word for each setting it offers, by the constants above. */
    public static SettingNames of(Map<String, String> names) {
        return new SettingNames(names);
    }

    /** The caller's word for {@code setting}, empty when the caller offers no such setting. */
    public Optional<String> find(String setting) {
        return Optional.ofNullable(names.get(setting));
    }

    /** The caller's word for a setting it passed (so it must offer it). */
    public String of(String setting) {
        return find(setting).orElse("the " + setting + " setting");
    }
}
