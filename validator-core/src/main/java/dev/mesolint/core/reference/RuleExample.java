package dev.mesolint.core.reference;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A fixture programme for a rule: {@code fixtures/<rule-id>/failing*.yaml} or {@code passing*.yaml}. The tests check
 * it and the rule reference shows it.
 *
 * <p>Markers are YAML comments. The first line may name the profile: {@code # profile: strength}. A finding is
 * expected on every line that ends in {@code # expect: ITEM, ITEM...}, where an item is a rule id, optionally
 * followed by {@code xN} (N findings on that line) and {@code waived} (accepted by a waiver). Any other finding is
 * unexpected.
 */
public record RuleExample(Path file, String text, Optional<String> profile, List<Expectation> expected) {

    private static final Pattern PROFILE = Pattern.compile("^#\\s*profile:\\s*(\\S+)\\s*$");
    private static final Pattern EXPECT = Pattern.compile("#\\s*expect:\\s*(.+)$");
    private static final Pattern ITEM = Pattern.compile("([a-z][a-z0-9]*(?:-[a-z0-9]+)*)(?:\\s+x(\\d+))?(\\s+waived)?");

    /** {@code count} findings of {@code ruleId} on {@code line}, waived or active. */
    public record Expectation(int line, String ruleId, int count, boolean waived) {
    }

    public RuleExample {
        expected = List.copyOf(expected);
    }

    /** Reads a fixture; a malformed marker is refused with the file and line. */
    public static RuleExample read(Path file) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        String[] lines = text.split("\r?\n", -1);
        Optional<String> profile = Optional.empty();
        if (lines.length > 0) {
            Matcher m = PROFILE.matcher(lines[0].trim());
            if (m.matches()) {
                profile = Optional.of(m.group(1));
            }
        }
        List<Expectation> expected = new ArrayList<>();
        for (int i = 0; i < lines.length; i++) {
            Matcher m = EXPECT.matcher(lines[i]);
            if (!m.find()) {
                continue;
            }
            for (String item : m.group(1).split(",")) {
                Matcher im = ITEM.matcher(item.trim());
                if (!im.matches()) {
                    throw new IllegalArgumentException(file + ":" + (i + 1) + ": malformed expect marker '"
                            + item.trim() + "' (write # expect: rule-id, rule-id x2, rule-id waived)");
                }
                expected.add(new Expectation(i + 1, im.group(1), im.group(2) == null ? 1 : Integer.parseInt(
                        im.group(2)), im.group(3) != null));
            }
        }
        return new RuleExample(file, text, profile, expected);
    }

    /** The rule the fixture belongs to: the name of its folder. */
    public String ruleId() {
        return file.getParent().getFileName().toString();
    }

    public boolean failing() {
        return file.getFileName().toString().startsWith("failing");
    }

    /** Every fixture below {@code folder}, sorted by path. */
    public static List<Path> find(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        try (var walk = Files.walk(folder)) {
            return walk.filter(Files::isRegularFile).filter(p -> {
                String name = p.getFileName().toString();
                return (name.startsWith("failing") || name.startsWith("passing")) && name.endsWith(".yaml");
            }).sorted().toList();
        }
    }
}
