package dev.mesolint.core.ruleset;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * What each rule-set version changed, read from the text shipped in the jar ({@value #RESOURCE}). The same text is
 * the "Rule-set versions" part of CHANGELOG.md (a test keeps the two equal), so a notice quotes the changelog.
 *
 * <p>The text is Markdown: a {@code ### Rule set VERSION} heading per version, newest first, then its entries as
 * {@code - } bullets (continued on lines indented by two spaces); other lines are for the reader.
 */
public final class RuleSetChanges {
    /** Where the text lives in the core jar. */
    public static final String RESOURCE = "/dev/mesolint/core/ruleset/rule-set-changes.md";
    private static final String HEADING = "### Rule set ";

    /** One version and its changelog entries, each as one line of text. */
    public record Release(RuleSetVersion version, List<String> entries) {
        public Release {
            entries = List.copyOf(entries);
        }
    }

    private final List<Release> releases;

    private RuleSetChanges(List<Release> releases) {
        this.releases = releases.stream().sorted(Comparator.comparing(Release::version)).toList();
    }

    /** The changes shipped with this build. */
    public static RuleSetChanges shipped() {
        return parse(text());
    }

    /** The shipped text itself. */
    public static String text() {
        try (InputStream in = RuleSetChanges.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("the rule-set changes " + RESOURCE + " are missing from the core jar");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Reads text in the form described above; a heading that names no version is a mistake in the build. */
    public static RuleSetChanges parse(String text) {
        List<Release> releases = new ArrayList<>();
        RuleSetVersion version = null;
        List<String> entries = new ArrayList<>();
        StringBuilder entry = null;
        for (String line : text.split("\\R")) {
            if (line.startsWith(HEADING)) {
                close(entry, entries);
                entry = null;
                if (version != null) {
                    releases.add(new Release(version, entries));
                }
                String named = line.substring(HEADING.length()).strip();
                version = RuleSetVersion.parse(named).orElseThrow(() -> new IllegalStateException(
                        "'" + line + "' names no rule-set version"));
                entries = new ArrayList<>();
            } else if (version != null && line.startsWith("- ")) {
                close(entry, entries);
                entry = new StringBuilder(line.substring(2).strip());
            } else if (entry != null && line.startsWith("  ") && !line.isBlank()) {
                entry.append(' ').append(line.strip());
            } else {
                close(entry, entries);
                entry = null;
            }
        }
        close(entry, entries);
        if (version != null) {
            releases.add(new Release(version, entries));
        }
        return new RuleSetChanges(releases);
    }

    private static void close(StringBuilder entry, List<String> entries) {
        if (entry != null) {
            entries.add(entry.toString());
        }
    }

    /** Every version, oldest first. */
    public List<Release> releases() {
        return releases;
    }

    /** The versions after {@code from} up to and including {@code to}, oldest first. */
    public List<Release> between(RuleSetVersion from, RuleSetVersion to) {
        return releases.stream().filter(r -> r.version().isAfter(from) && !r.version().isAfter(to)).toList();
    }
}
