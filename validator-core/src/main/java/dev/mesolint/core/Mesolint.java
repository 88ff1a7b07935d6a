package dev.mesolint.core;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;

/** Facts about this build of mesolint shared by every front end and report. */
public final class Mesolint {
    /** The caution every front end and report carries. */
    public static final String CAUTION = "mesolint applies general, population-level training guidance; it is not a "
            + "medical assessment. Screen athletes before training (PAR-Q+ or a physician), and defer to the athlete's "
            + "physician, physiotherapist and local licensed practice, above all where an injury or constraint is "
            + "involved.";

    /**
     * Version of the built-in rule set: the profiles' thresholds and severities, the rules' metadata and the model's
     * default figures. Bump it (and add a CHANGELOG.md section) whenever any of them changes; RuleSetVersionTests
     * fails until you do.
     */
    public static final String RULE_SET_VERSION = "2026.12.6";

    private static final String VERSION = readVersion();

    private Mesolint() {
    }

    public static String version() {
        return VERSION;
    }

    private static String readVersion() {
        try (InputStream in = Mesolint.class.getResourceAsStream("/dev/mesolint/core/mesolint.properties")) {
            Properties p = new Properties();
            if (in != null) {
                p.load(in);
            }
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
