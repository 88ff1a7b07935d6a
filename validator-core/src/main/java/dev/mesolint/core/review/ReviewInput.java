package dev.mesolint.core.review;

import dev.mesolint.core.finding.ConstraintReasons;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.rule.RuleDefinition;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/**
 * Everything a review writer reads.
 *
 * @param rules        every registered rule (SARIF lists them)
 * @param root         the folder the paths are relative to
 * @param showReasons  whether the reasons of athlete constraints may appear: they are health data, so outputs
 *                     meant to be shared (the pull-request comment) leave them out unless asked
 */
public record ReviewInput(Review review, List<RuleDefinition> rules, Path root, boolean showReasons) {

    public ReviewInput {
        Objects.requireNonNull(review, "review");
        rules = List.copyOf(rules);
        root = root.toAbsolutePath().normalize();
    }

    /** The finding's message, with any constraint reason left out unless asked. */
    public String message(Finding finding) {
        return showReasons ? finding.message() : ConstraintReasons.leaveOut(finding.message());
    }
}
