package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.finding.Subject;
import java.io.IOException;
import java.io.Writer;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * One JSON document per run: the tool, the caution, a summary, each file's findings and, when the training model
 * supplied them, each programme's figures under {@code metrics}. Athlete-constraint reasons are left out unless
 * {@link ReportOptions#includeReasons()}. The shape is published as
 * {@code docs/schema/report.schema.json}.
 */
public final class JsonReport implements ReportWriter {
    /** The schema's {@code $id}; documents name it in {@code $schema}. */
    public static final String SCHEMA_ID = "urn:mesolint:schema:report:1";
    /** Raised when the document's shape changes incompatibly. */
    public static final int FORMAT_VERSION = 1;

    @Override
    public void write(ReportInput input, Writer out) throws IOException {
        RunReport run = input.run();
        ObjectNode doc = JsonText.object();
        doc.put("$schema", SCHEMA_ID);
        doc.put("formatVersion", FORMAT_VERSION);
        doc.putObject("tool").put("name", "mesolint").put("version", Mesolint.version())
                .put("rulesVersion", Mesolint.RULE_SET_VERSION);
        doc.put("caution", Mesolint.CAUTION);
        doc.put("failOn", run.failOn().label());
        doc.put("failed", run.failed());
        ObjectNode summary = doc.putObject("summary");
        summary.put("files", run.files().size());
        summary.put("errors", run.count(Severity.ERROR));
        summary.put("warnings", run.count(Severity.WARNING));
        summary.put("info", run.count(Severity.INFO));
        summary.put("waived", run.waivedCount());
        summary.put("baselined", run.files().stream().flatMap(f -> f.findings().stream())
                .filter(f -> !f.waived()).filter(Finding::baselined).count());
        ArrayNode missing = doc.putArray("missing");
        run.missing().forEach(missing::add);
        // Both lists are streamed: each entry is made, written and dropped, so a large run never holds them all.
        doc.putArray("files");
        Map<String, java.util.Iterator<ObjectNode>> streamed = new java.util.LinkedHashMap<>();
        JsonFigures figures = JsonFigures.of(input.figures());
        streamed.put("files", run.files().stream().map(file -> file(input, figures, file)).iterator());
        if (run.files().stream().anyMatch(figures::hasMetrics)) {
            doc.putArray("metrics");
            streamed.put("metrics", run.files().stream().map(figures::metrics).flatMap(Optional::stream).iterator());
        }
        JsonText.write(doc, doc, streamed, out);
    }

    /** The {@code programme} object of a file entry: the programme's id and title. */
    static ObjectNode programme(dev.mesolint.core.programme.Programme p) {
        ObjectNode programme = JsonText.object();
        programme.put("id", p.info().id());
        Optional.ofNullable(p.info().title()).ifPresent(t -> programme.put("title", t));
        return programme;
    }

    private static ObjectNode file(ReportInput input, JsonFigures figures, FileReport file) {
        ObjectNode node = JsonText.object();
        node.put("path", file.displayPath());
        node.put("loaded", file.loaded());
        node.put("profile", file.profile());
        figures.programme(file).ifPresent(p -> node.set("programme", p));
        ArrayNode findings = node.putArray("findings");
        file.findings().stream().filter(f -> f.severity() != Severity.OFF)
                .forEach(f -> findings.add(finding(input, f)));
        return node;
    }

    private static ObjectNode finding(ReportInput input, Finding f) {
        ObjectNode node = JsonText.object();
        node.put("ruleId", f.ruleId());
        node.put("severity", f.severity().label());
        node.put("line", f.location().line());
        node.put("column", f.location().column());
        node.put("pointer", f.location().pointer());
        ReportedReasons reasons = new ReportedReasons(input.options());
        node.put("message", reasons.text(f, f.message()));
        node.put("fix", reasons.text(f, f.fix()));
        input.options().helpUri(f.ruleId()).ifPresent(uri -> node.put("helpUri", uri));
        node.put("fingerprint", Fingerprints.hash(f));
        node.put("baselined", f.baselined());
        node.put("endLine", f.location().endLine());
        node.put("endColumn", f.location().endColumn());
        facts(node, f);
        f.waiver().ifPresent(w -> node.putObject("waiver").put("reason", w.reason())
                .put("line", w.location().line()).put("column", w.location().column())
                .put("wholeFile", w.wholeFile()));
        return node;
    }

    /** The finding's data besides its words: subject, measure and applicable edit, each only when known. */
    private static void facts(ObjectNode node, Finding f) {
        Subject s = f.subject();
        if (!s.equals(Subject.NONE)) {
            ObjectNode subject = node.putObject("subject");
            Optional.ofNullable(s.muscle()).ifPresent(m -> subject.put("muscle", m));
            Optional.ofNullable(s.exercise()).ifPresent(e -> subject.put("exercise", e));
            Optional.ofNullable(s.day()).ifPresent(d -> subject.put("day", d));
            if (!s.weeks().isEmpty()) {
                ArrayNode weeks = subject.putArray("weeks");
                s.weeks().forEach(weeks::add);
            }
        }
        f.measure().ifPresent(m -> node.putObject("measure").put("value", m.value()).put("limit", m.limit())
                .put("unit", m.unit()));
        f.edit().ifPresent(e -> node.putObject("edit").put("pointer", e.pointer()).put("key", e.key())
                .put("text", e.text()).put("line", e.location().line()).put("column", e.location().column()));
    }

    /** The programme object of the {@code metrics} list. */
    static ObjectNode metrics(ProgrammeFigures figures) {
        ObjectNode node = JsonText.object();
        node.put("file", figures.file());
        node.put("id", figures.programmeId());
        ArrayNode weeks = node.putArray("weeks");
        for (WeekFigures week : figures.weeks()) {
            ObjectNode w = weeks.addObject();
            w.put("week", week.week());
            ObjectNode muscles = w.putObject("muscles");
            for (Map.Entry<String, MuscleWeek> e : week.muscles().entrySet()) {
                muscles.putObject(e.getKey()).put("hardSets", JsonText.round(e.getValue().hardSets()))
                        .put("stimulatingReps", JsonText.round(e.getValue().stimulatingReps()))
                        .put("stimulus", JsonText.round(e.getValue().stimulus()));
            }
            ArrayNode sessions = w.putArray("sessions");
            for (SessionFigures s : week.sessions()) {
                ObjectNode session = sessions.addObject();
                session.put("day", s.day());
                session.put("name", s.name() == null ? "" : s.name());
                session.put("minutes", JsonText.round(s.minutes()));
                ArrayNode sets = session.putArray("sets");
                sets(s.sets(), sets);
            }
        }
        return node;
    }

    private static void sets(List<SetFigures> figures, ArrayNode sets) {
        for (SetFigures set : figures) {
            sets.addObject().put("exercise", set.exercise()).put("line", set.line())
                    .put("stimulus", JsonText.round(set.stimulus()))
                    .put("discountedStimulus", JsonText.round(set.discountedStimulus()));
        }
    }
}
