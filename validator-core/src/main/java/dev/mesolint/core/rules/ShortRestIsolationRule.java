package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.rule.RuleParameter;
import java.util.List;

/** Isolation sets that more work follows get at least a minute of rest. */
public final class ShortRestIsolationRule implements Rule {
    public static final String ID = "short-rest-isolation";
    static final String MIN_REST = "min-rest";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "Rest after an isolation set that more work in the session follows is at least {min-rest}.",
            Severity.INFO, RuleMetadata.Category.REST,
            List.of(RuleParameter.seconds(MIN_REST, 60, 15, 300,
                    "Shortest rest after an isolation set that more work follows.")),
            "Isolation sets tire one muscle and little else, so they recover faster than compound sets; still, under "
                    + "a minute of rest costs reps on the next set, and the pooled studies show a small benefit for "
                    + "rests above 60 s. The rest is judged as for compound sets: after each straight set that more "
                    + "work follows, and for a superset the rest after each round plus the changeovers (15 s for one "
                    + "not written). A set or superset without a written rest is not judged.",
            "Singer et al. 2024 (Front Sports Act Living 6:1429789): a small benefit for rests longer than 60 s, "
                    + "none clear beyond 90 s");

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        RestCheck.check(context, (work, e) -> e.isCompound() ? null : new RestCheck.Limit(MIN_REST, "isolation sets"));
    }
}
