package dev.mesolint.core.ruleset;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * What a run says when the repository records another rule-set version than the one this mesolint applies: the
 * versions in between and their changelog entries, so a team knows which findings may have moved and why. A notice
 * only: it never fails a run, and a baseline keeps matching across versions (its entries name no limit or wording).
 */
public final class UpgradeNotice {
    private UpgradeNotice() {
    }

    /**
     * The notice for a repository whose configuration ({@code where}, as shown to the user) records {@code recorded},
     * checked with rule set {@code applied}; empty when they are the same.
     */
    public static Optional<List<String>> lines(RuleSetVersion recorded, RuleSetVersion applied, String where,
            RuleSetChanges changes) {
        if (recorded.equals(applied)) {
            return Optional.empty();
        }
        List<String> lines = new ArrayList<>();
        if (recorded.isAfter(applied)) {
            lines.add(where + " records rules-version " + recorded + ", newer than rule set " + applied + " of this "
                    + "mesolint: findings that later rule sets changed may read as they did before (see CHANGELOG.md, "
                    + "\"Rule-set versions\"). Upgrade mesolint, or write rules-version: " + applied + " to keep it.");
            return Optional.of(lines);
        }
        lines.add(where + " records rules-version " + recorded + "; this mesolint applies rule set " + applied
                + ", so some findings may differ from the last check. What changed (CHANGELOG.md, \"Rule-set "
                + "versions\"):");
        for (RuleSetChanges.Release release : changes.between(recorded, applied)) {
            for (String entry : release.entries()) {
                // Backticks mark rule ids in the changelog; a terminal shows them plainly.
                lines.add("  " + release.version() + ": " + entry.replace("`", ""));
            }
        }
        lines.add("The baseline keeps matching across rule sets. Once the findings are reviewed, write "
                + "rules-version: " + applied + " in " + where + ".");
        return Optional.of(lines);
    }
}
