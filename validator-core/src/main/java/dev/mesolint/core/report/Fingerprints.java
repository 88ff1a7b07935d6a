package dev.mesolint.core.report;

import dev.mesolint.core.finding.Finding;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** A finding's fingerprint as reports publish it: the SHA-256 of {@link Finding#fingerprint()}, in hex. */
public final class Fingerprints {
    private Fingerprints() {
    }

    public static String hash(Finding finding) {
        try {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            return HexFormat.of().formatHex(digest.digest(finding.fingerprint().getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
