package dev.mesolint.core.review;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.report.Fingerprints;
import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The review as one JSON document, described by {@code docs/schema/diff.schema.json}: both revisions, the summary,
 * and every changed programme with its changed figures, limits crossed and findings by state. Constraint reasons are
 * left out unless the input asks for them, as in every review output.
 */
public final class ReviewJson implements ReviewWriter {
    /** Changes when the document's shape changes incompatibly. */
    static final int FORMAT = 1;
    private static final JsonMapper MAPPER = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();

    @Override
    public void write(ReviewInput input, Writer out) throws IOException {
        Review review = input.review();
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.putObject("tool").put("name", "mesolint").put("version", Mesolint.version())
                .put("rulesVersion", Mesolint.RULE_SET_VERSION);
        root.put("caution", Mesolint.CAUTION);
        ObjectNode base = root.putObject("base");
        base.put("revision", review.base().shown());
        base.put("commit", review.base().commit());
        ObjectNode head = root.putObject("head");
        head.put("revision", review.head().map(r -> r.shown()).orElse("work tree"));
        if (review.head().isPresent()) {
            head.put("commit", review.head().get().commit());
        } else {
            head.putNull("commit");
        }
        summary(root.putObject("summary"), review);
        ArrayNode programmes = root.putArray("programmes");
        review.changed().forEach(p -> programme(programmes.addObject(), p, input));
        MAPPER.writeValue(out, root);
        out.write("\n");
    }

    private static void summary(ObjectNode node, Review review) {
        List<ProgrammeChange> changed = review.changed();
        node.put("programmesChanged", changed.size());
        for (ProgrammeChange.Status s : ProgrammeChange.Status.values()) {
            if (s != ProgrammeChange.Status.UNCHANGED) {
                node.put(s.words(), review.count(s));
            }
        }
        node.put("findingsNew", review.introducedCount());
        node.put("findingsResolved", review.resolvedCount());
        node.put("findingsUnchanged", review.unchangedCount());
        node.put("limitsCrossed", changed.stream().mapToLong(p -> p.limits().size()).sum());
        node.put("limitsOutOfBounds", review.limitsBroken());
    }

    private static void programme(ObjectNode node, ProgrammeChange p, ReviewInput input) {
        node.put("status", p.status().words());
        text(node, "before", p.before().orElse(null));
        text(node, "after", p.after().orElse(null));
        text(node, "programmeId", p.programmeId().orElse(null));
        text(node, "profileBefore", p.profileBefore().orElse(null));
        text(node, "profileAfter", p.profileAfter().orElse(null));
        node.put("loadedBefore", p.loadedBefore());
        node.put("loadedAfter", p.loadedAfter());
        text(node, "units", p.units().orElse(null));
        ArrayNode muscles = node.putArray("muscles");
        for (MuscleWeekChange m : p.figures().muscles()) {
            ObjectNode row = muscles.addObject().put("week", m.week()).put("muscle", m.muscle());
            delta(row.putObject("workingSets"), m.workingSets());
            delta(row.putObject("hardSets"), m.hardSets());
            delta(row.putObject("stimulus"), m.stimulus());
        }
        ArrayNode sessions = node.putArray("sessions");
        for (SessionChange s : p.figures().sessions()) {
            ObjectNode row = sessions.addObject().put("week", s.week()).put("day", s.day()).put("name", s.name());
            delta(row.putObject("minutes"), s.minutes());
        }
        ArrayNode lifts = node.putArray("lifts");
        for (LiftChange l : p.figures().lifts()) {
            ObjectNode row = lifts.addObject().put("week", l.week()).put("exercise", l.exercise());
            delta(row.putObject("topSetPercentOf1RM"), l.topSetIntensity());
            delta(row.putObject("volumeLoad"), l.volumeLoad());
        }
        ArrayNode limits = node.putArray("limitsCrossed");
        for (LimitCrossing l : p.limits()) {
            limits.addObject().put("week", l.week()).put("subject", l.subject()).put("measure", l.measure())
                    .put("before", round(l.before(), 0.01)).put("after", round(l.after(), 0.01))
                    .put("limit", round(l.limit(), 0.01))
                    .put("kind", l.kind().name().toLowerCase(Locale.ROOT).replace('_', '-'))
                    .put("outOfBounds", l.kind().worse());
        }
        ObjectNode findings = node.putObject("findings");
        findings(findings.putArray("new"), p.findings().introduced(), input);
        findings(findings.putArray("resolved"), p.findings().resolved(), input);
        findings(findings.putArray("unchanged"), p.findings().unchanged(), input);
    }

    private static void text(ObjectNode node, String key, String value) {
        if (value == null) {
            node.putNull(key);
        } else {
            node.put(key, value);
        }
    }

    private static void delta(ObjectNode node, Delta d) {
        number(node, "before", d.before(), d.step());
        number(node, "after", d.after(), d.step());
        if (d.before().isPresent() && d.after().isPresent()) {
            node.put("change", round(d.change(), d.step()));
        } else {
            node.putNull("change");
        }
    }

    private static void number(ObjectNode node, String key, OptionalDouble value, double step) {
        if (value.isPresent()) {
            node.put(key, round(value.getAsDouble(), step));
        } else {
            node.putNull(key);
        }
    }

    private static double round(double value, double step) {
        int decimals = Math.max(0, (int) Math.round(-Math.log10(step)));
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP).doubleValue();
    }

    private static void findings(ArrayNode list, List<Finding> findings, ReviewInput input) {
        for (Finding f : findings) {
            ObjectNode node = list.addObject();
            node.put("rule", f.ruleId());
            node.put("severity", f.severity().label());
            node.put("file", f.file());
            node.put("line", f.location().line());
            node.put("column", f.location().column());
            node.put("pointer", f.location().pointer());
            node.put("message", input.message(f));
            node.put("fix", f.fix());
            node.put("fingerprint", Fingerprints.hash(f));
        }
    }
}
