package dev.mesolint.core.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Optional;

/** The rule reference pages that ship in the core jar (generated into docs/rules), read for inline help. */
public final class RulePages {
    /** Where the build puts the pages of docs/rules in the core jar. */
    public static final String FOLDER = "/dev/mesolint/reference/rules/";

    private RulePages() {
    }

    /** The Markdown page of a built-in rule; empty for a rule pack's rule, which has no shipped page. */
    public static Optional<String> page(String ruleId) {
        try (InputStream in = RulePages.class.getResourceAsStream(FOLDER + ruleId + ".md")) {
            return in == null ? Optional.empty() : Optional.of(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
