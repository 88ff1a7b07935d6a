package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;

/**
 * A programme's findings as the page shows them (severity {@code off} left out), each with its element id and its
 * place (weeks and session), so that the prescription, the athlete block and the findings list link to one another.
 */
final class ShownFindings {
    private final List<Finding> shown;
    private final Map<Finding, String> ids = new IdentityHashMap<>();
    private final Map<Finding, FindingGroups.Place> places = new IdentityHashMap<>();

    ShownFindings(FileReport file, String programmeId) {
        this.shown = file.findings().stream().filter(f -> f.severity() != Severity.OFF).toList();
        for (int i = 0; i < shown.size(); i++) {
            Finding f = shown.get(i);
            ids.put(f, programmeId + "-f" + (i + 1));
            places.put(f, FindingGroups.place(file.programme(), f));
        }
    }

    List<Finding> all() {
        return shown;
    }

    String id(Finding f) {
        return ids.get(f);
    }

    /** The findings in week {@code week} whose pointer lies inside {@code node} and that {@code also} accepts. */
    List<Finding> inside(String node, int week, Predicate<Finding> also) {
        List<Finding> out = new ArrayList<>();
        for (Finding f : shown) {
            if (FindingGroups.contains(node, f.location().pointer()) && places.get(f).weeks().contains(week)
                    && also.test(f)) {
                out.add(f);
            }
        }
        return out;
    }

    /** The findings of one rule, in page order. */
    List<Finding> ofRule(String ruleId) {
        return shown.stream().filter(f -> f.ruleId().equals(ruleId)).toList();
    }

    /** A compact link to a finding: its severity mark and rule id, for tables. */
    String mark(Finding f) {
        String severity = f.waived() ? "waived" : f.severity().label();
        return "<a class=\"mark " + severity + "\" href=\"#" + id(f) + "\">" + HtmlMarks.glyph(f) + " "
                + Html.esc(f.ruleId()) + "</a>";
    }
}
