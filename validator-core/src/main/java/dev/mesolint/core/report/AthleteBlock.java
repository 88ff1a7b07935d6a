package dev.mesolint.core.report;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.AthleteConstraint;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.value.Load;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The athlete a programme is written for: known 1RMs, and each constraint with its reason and the findings it
 * caused. Reasons are health data: a report meant to be shared leaves them out ({@link HtmlOptions#showReasons()}).
 */
final class AthleteBlock {
    static final String REASON_LEFT_OUT = "(reason left out of this report)";
    private static final String LOAD_RULE = "constraint-load";
    private static final String AVOID_RULE = "constraint-avoid";

    private AthleteBlock() {
    }

    static void render(StringBuilder page, Programme programme, SetLoads loads, ShownFindings findings,
            boolean showReasons, String id) {
        Athlete athlete = programme.athlete();
        page.append("<section class=\"athlete\" aria-labelledby=\"").append(id).append("-athlete\">\n<h3 id=\"")
                .append(id).append("-athlete\">Athlete</h3>\n");
        if (athlete.oneRepMax().isEmpty() && athlete.constraints().isEmpty()) {
            page.append("<p class=\"no-figures\">The programme gives no 1RMs and no constraints, so loads written as a "
                    + "share of 1RM are shown as percentages.</p>\n</section>\n");
            return;
        }
        if (!athlete.oneRepMax().isEmpty()) {
            page.append("<table class=\"maxes\"><caption>Known 1RMs</caption><thead><tr><th scope=\"col\">Exercise")
                    .append("</th><th scope=\"col\">1RM</th></tr></thead><tbody>\n");
            athlete.oneRepMax().entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> page
                    .append("<tr><th scope=\"row\">").append(Html.esc(loads.name(e.getKey()))).append("</th><td>")
                    .append(Html.esc(maxes(athlete, e.getKey(), e.getValue()))).append("</td></tr>\n"));
            page.append("</tbody></table>\n");
        }
        if (!athlete.constraints().isEmpty()) {
            page.append("<h4>Constraints</h4>\n<ul class=\"constraints\">\n");
            for (int i = 0; i < athlete.constraints().size(); i++) {
                AthleteConstraint c = athlete.constraints().get(i);
                page.append("<li><strong>").append(Html.esc(what(c, loads))).append("</strong>");
                page.append("<p class=\"reason\"><span class=\"term\">Reason:</span> ")
                        .append(Html.esc(showReasons ? c.reason() : REASON_LEFT_OUT)).append("</p>");
                List<Finding> caused = caused(c, i, findings);
                page.append("<p class=\"caused\"><span class=\"term\">Findings it caused:</span> ");
                if (caused.isEmpty()) {
                    page.append("none, every set keeps to it");
                } else {
                    List<String> marks = new ArrayList<>();
                    caused.forEach(f -> marks.add(findings.mark(f)));
                    page.append(String.join(" ", marks));
                }
                page.append("</p></li>\n");
            }
            page.append("</ul>\n<p class=\"note\">mesolint checks the programme against these limits and never sets or "
                    + "relaxes them: they are for the athlete's clinicians to decide.</p>\n");
        }
        page.append("</section>\n");
    }

    private static String what(AthleteConstraint c, SetLoads loads) {
        List<String> parts = new ArrayList<>();
        if (c.region().isPresent() && c.maxLoad().isPresent()) {
            parts.add("Load cap: at most " + SetLoads.percent(c.maxLoad().get()) + " of 1RM on exercises that load the "
                    + c.region().get().yamlName());
        }
        if (!c.avoid().isEmpty()) {
            parts.add("Avoid: " + String.join(", ", c.avoid().stream().map(loads::name).toList()));
        }
        return String.join("; ", parts);
    }

    /** The findings a constraint caused: its rule's findings that name it (its cap's region, or its index). */
    private static List<Finding> caused(AthleteConstraint c, int index, ShownFindings findings) {
        List<Finding> out = new ArrayList<>();
        if (c.region().isPresent() && c.maxLoad().isPresent()) {
            String cap = SetLoads.percent(c.maxLoad().get()) + " cap for the " + c.region().get().yamlName();
            findings.ofRule(LOAD_RULE).stream().filter(f -> f.message().contains(cap)).forEach(out::add);
        }
        if (!c.avoid().isEmpty()) {
            String named = "athlete.constraints[" + index + "]";
            findings.ofRule(AVOID_RULE).stream().filter(f -> f.message().contains(named)).forEach(out::add);
        }
        return out;
    }

    /** {@code text} with every constraint reason replaced, for a report that leaves reasons out. */
    static String withoutReasons(String text, Programme programme) {
        String out = text;
        for (AthleteConstraint c : programme.athlete().constraints()) {
            if (c.reason() != null && !c.reason().isBlank()) {
                out = out.replace(c.reason(), REASON_LEFT_OUT);
            }
        }
        return out;
    }

    /** {@code 140 kg}, or every value in block order: {@code 140 kg; from week 4: 145 kg; tested week 6 day 1}. */
    private static String maxes(Athlete athlete, String exerciseId, Load.Absolute first) {
        List<dev.mesolint.core.programme.OneRepMaxStep> steps = athlete.steps(exerciseId);
        if (steps.isEmpty()) {
            return weight(first);
        }
        List<String> parts = new ArrayList<>();
        for (var step : steps) {
            String when = step.week() == 1 && step.day() <= 1 && !step.tested() ? "" : "from week " + step.week()
                    + (step.day() > 1 ? " day " + step.day() : "") + ": ";
            parts.add(step.tested() ? "tested (week " + step.week() + "), unknown until restated"
                    : when + step.value().map(AthleteBlock::weight).orElse("unknown"));
        }
        return String.join("; ", parts);
    }

    private static String weight(Load.Absolute max) {
        return Html.weight(max.amount()) + " " + max.unit().symbol();
    }
}
