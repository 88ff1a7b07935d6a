package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;

/** Where a rule's reference page is published: {@code docs/rules/<id>.md} under {@link Mesolint#INFORMATION_URI}. */
final class RuleDocs {
    private RuleDocs() {
    }

    static String path(String ruleId) {
        return "docs/rules/" + ruleId + ".md";
    }

    static String uri(String ruleId) {
        return Mesolint.INFORMATION_URI + "/" + path(ruleId);
    }
}
