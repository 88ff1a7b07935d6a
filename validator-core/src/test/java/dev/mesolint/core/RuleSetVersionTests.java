package dev.mesolint.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import dev.mesolint.core.rules.BuiltInRules;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Guards the rule-set version: a default threshold, severity, rule or model figure cannot change without
 * {@link Mesolint#RULE_SET_VERSION} changing too, so teams see that findings may move when they upgrade.
 */
class RuleSetVersionTests {

    /** Digest of what the rule set decides, recorded for {@link Mesolint#RULE_SET_VERSION}. */
    private static final String RECORDED_VERSION = "2026.12.6";
    private static final String RECORDED_DIGEST = "e2108d7fa3b2f904c6ccea7e9ac4c6ff43ffe4448a78103d5046c2010d21cb88";

    private static final List<String> BUILT_IN_PROFILES = List.of("hypertrophy", "strength", "general-fitness");

    @Test
    void theRuleSetVersionChangesWheneverWhatTheRulesDecideChanges() throws Exception {
        String digest = digest();
        String hint = "the built-in rule set changed (profiles, rule metadata or model defaults): bump "
                + "Mesolint.RULE_SET_VERSION, add its '### Rule set' section to core/ruleset/rule-set-changes.md "
                + "and to CHANGELOG.md, and record version and digest here ("
                + digest + ")";
        assertEquals(RECORDED_DIGEST, digest, hint);
        assertEquals(RECORDED_VERSION, Mesolint.RULE_SET_VERSION, hint);
    }

    private static String digest() throws IOException, NoSuchAlgorithmException {
        MessageDigest sha = MessageDigest.getInstance("SHA-256");
        for (String profile : BUILT_IN_PROFILES) {
            try (InputStream in = RuleSetVersionTests.class
                    .getResourceAsStream("/dev/mesolint/profiles/" + profile + ".yaml")) {
                assertNotNull(in, "built-in profile " + profile);
                sha.update(in.readAllBytes());
            }
        }
        List<RuleMetadata> rules = BuiltInRules.all().stream().map(RuleDefinition::metadata)
                .sorted(Comparator.comparing(RuleMetadata::id)).toList();
        for (RuleMetadata rule : rules) {
            StringBuilder line = new StringBuilder(rule.id()).append('|').append(rule.defaultSeverity());
            for (RuleParameter parameter : rule.parameters()) {
                line.append('|').append(parameter.name()).append('=').append(parameter.defaultValue())
                        .append('[').append(parameter.min()).append(',').append(parameter.max()).append(']');
            }
            sha.update((line + "\n").getBytes(StandardCharsets.UTF_8));
        }
        sha.update(ModelParameters.defaults().toString().getBytes(StandardCharsets.UTF_8));
        return HexFormat.of().formatHex(sha.digest());
    }
}
