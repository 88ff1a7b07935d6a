package dev.mesolint.core.rules;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.RuleConfiguration;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Checks a programme text through the whole checker, with metadata defaults except the severities and parameters a
 * test sets, and returns one rule's active findings in line order.
 */
final class RuleRun implements RuleConfiguration {
    private final Map<String, Severity> severities = new HashMap<>();
    private final Map<String, Map<String, Double>> values = new HashMap<>();
    private String profile = "hypertrophy";

    static RuleRun defaults() {
        return new RuleRun();
    }

    RuleRun severity(String rule, Severity severity) {
        severities.put(rule, severity);
        return this;
    }

    RuleRun param(String rule, String name, double value) {
        values.computeIfAbsent(rule, r -> new HashMap<>()).put(name, value);
        return this;
    }

    RuleRun profile(String name) {
        profile = name;
        return this;
    }

    @Override
    public String profileFor(String displayPath, Programme programme) {
        return profile;
    }

    @Override
    public RuleSettings settingsFor(String profileName, RuleDefinition rule) {
        RuleSettings settings = RuleSettings.defaults(rule.metadata());
        if (severities.containsKey(rule.id())) {
            settings = settings.with(severities.get(rule.id()));
        }
        for (Map.Entry<String, Double> e : values.getOrDefault(rule.id(), Map.of()).entrySet()) {
            settings = settings.with(e.getKey(), e.getValue());
        }
        return settings;
    }

    /** Every active finding of the programme {@code yaml}. */
    List<Finding> all(Path dir, String yaml) {
        try {
            Path file = dir.resolve("programme.yaml");
            Files.writeString(file, yaml);
            CheckRequest request = new CheckRequest(List.of(file), dir, Severity.ERROR, List.of(), this,
                    YamlLimits.DEFAULTS);
            return new Checker(request, BuiltInRules.all()).run().files().get(0).active();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The active findings of {@code rule}. */
    List<Finding> findings(Path dir, String yaml, String rule) {
        return all(dir, yaml).stream().filter(f -> f.ruleId().equals(rule)).toList();
    }

    /** A programme header; append {@code weeks:}. */
    static String header(String level, String goal, String sessionMinutes) {
        return "format: 1\nprogramme:\n  id: harbour-rule-test\n  title: Harbourside rule test\n  level: " + level
                + "\n  goal: " + goal + "\n" + (sessionMinutes == null ? "" : "  session-minutes: " + sessionMinutes
                + "\n") + "  units: kg\n";
    }

    static String header() {
        return header("intermediate", "hypertrophy", "90");
    }

    /** An exercise entry of a session's work list, indented for {@link #week}. */
    static String exercise(String id, String body) {
        StringBuilder out = new StringBuilder("          - exercise: " + id + "\n");
        for (String line : body.split("\n")) {
            out.append("            ").append(line.strip()).append('\n');
        }
        return out.toString();
    }

    /** A session with its work entries. */
    static String session(int day, String... exercises) {
        return "      - day: " + day + "\n        work:\n" + String.join("", exercises);
    }

    /** A week of sessions; {@code deload} marks it. */
    static String week(int number, boolean deload, String... sessions) {
        return "  - week: " + number + "\n" + (deload ? "    deload: true\n" : "") + "    sessions:\n"
                + String.join("", sessions);
    }

    static String weeks(String... weeks) {
        return "weeks:\n" + String.join("", weeks);
    }
}
