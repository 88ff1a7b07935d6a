package dev.mesolint.core.report;

import dev.mesolint.core.finding.Finding;
import java.util.Set;

/**
 * Findings accepted before this run (a team's baseline), matched by {@link Finding#fingerprint()}. Reports mark them
 * as unchanged rather than new (SARIF {@code baselineState}, JSON {@code baselined}).
 */
@FunctionalInterface
public interface Baseline {
    /** Only what the run itself marked: findings held by the baseline applied in the check ({@code --baseline}). */
    Baseline NONE = Finding::baselined;

    boolean contains(Finding finding);

    /** A baseline of the given fingerprints, as {@link Finding#fingerprint()} returns them. */
    static Baseline of(Set<String> fingerprints) {
        Set<String> copy = Set.copyOf(fingerprints);
        return finding -> finding.baselined() || copy.contains(finding.fingerprint());
    }
}
