package dev.mesolint.core.ruleset;

import dev.mesolint.core.Mesolint;
import java.util.Comparator;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A rule-set version, {@code YEAR.MONTH.RELEASE} ({@code 2026.12.1}): the year and month it was made and its release
 * within that month. Ordered by those three numbers, so {@code 2026.12.10} comes after {@code 2026.12.9}.
 */
public record RuleSetVersion(int year, int month, int release) implements Comparable<RuleSetVersion> {
    /** The written form; the configuration schema carries the same pattern. */
    public static final Pattern FORM = Pattern.compile("(\\d{4})\\.(0[1-9]|1[0-2])\\.(\\d{1,3})");

    private static final Comparator<RuleSetVersion> ORDER = Comparator.comparingInt(RuleSetVersion::year)
            .thenComparingInt(RuleSetVersion::month).thenComparingInt(RuleSetVersion::release);

    /** The version of the rule set this build of mesolint applies. */
    public static RuleSetVersion current() {
        return parse(Mesolint.RULE_SET_VERSION).orElseThrow(() -> new IllegalStateException(
                "Mesolint.RULE_SET_VERSION is not in the form YEAR.MONTH.RELEASE"));
    }

    /** {@code text} read as a version, empty when it is not in the form {@code YEAR.MONTH.RELEASE}. */
    public static Optional<RuleSetVersion> parse(String text) {
        Matcher m = FORM.matcher(text.strip());
        if (!m.matches()) {
            return Optional.empty();
        }
        return Optional.of(new RuleSetVersion(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)),
                Integer.parseInt(m.group(3))));
    }

    @Override
    public int compareTo(RuleSetVersion other) {
        return ORDER.compare(this, other);
    }

    public boolean isAfter(RuleSetVersion other) {
        return compareTo(other) > 0;
    }

    @Override
    public String toString() {
        return String.format("%04d.%02d.%d", year, month, release);
    }
}
