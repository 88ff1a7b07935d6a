package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.io.Writer;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;

/**
 * JUnit XML for CI test views: a {@code testsuite} per programme file, a {@code testcase} per rule that ran on it.
 *
 * <p>A case fails when the rule reported active findings at or above the JUnit failure level (by default the run's
 * fail level, so warnings fail their case exactly when they fail the run); lower findings and waived ones are listed
 * in the case's {@code system-out}. Times are measured: a suite's is its file's whole check, a case's its rule's. A file that did not load is an {@code error} on the load-stage rule
 * that stopped it, and its other rules are {@code skipped}. Inputs that named nothing are suites with one error.
 */
public final class JunitReport implements ReportWriter {
    @Override
    public void write(ReportInput input, Writer out) throws IOException {
        List<Suite> suites = new ArrayList<>();
        input.run().files().forEach(f -> suites.add(suite(input, f)));
        input.run().missing().forEach(m -> suites.add(new Suite(m, List.of(new Case(m, "input", Outcome.ERROR,
                "no such file or folder", "usage", "mesolint was asked to check " + m + ", which does not exist",
                "", Duration.ZERO)), "", Duration.ZERO)));
        try {
            XmlOut xml = new XmlOut(XMLOutputFactory.newFactory().createXMLStreamWriter(out));
            xml.start();
            xml.open("testsuites", 0, "name", "mesolint", "tests", count(suites, null), "failures",
                    count(suites, Outcome.FAILURE), "errors", count(suites, Outcome.ERROR), "skipped",
                    count(suites, Outcome.SKIPPED), "time", seconds(input.elapsed()));
            for (Suite suite : suites) {
                writeSuite(xml, suite);
            }
            xml.close(0);
            xml.end();
        } catch (XMLStreamException e) {
            throw new IOException("cannot write the JUnit report", e);
        }
        out.flush();
    }

    private static Suite suite(ReportInput input, FileReport file) {
        boolean loaded = file.loaded();
        Severity failAt = input.options().junitFailAt().orElse(input.run().failOn());
        List<Case> cases = new ArrayList<>();
        for (RuleDefinition rule : input.rulesRunUnder(file.profile())) {
            List<Finding> findings = file.findings().stream()
                    .filter(f -> f.ruleId().equals(rule.id()) && f.severity() != Severity.OFF).toList();
            List<Finding> active = findings.stream().filter(f -> !f.waived()).toList();
            List<Finding> failing = active.stream().filter(f -> f.severity().atLeast(failAt)).toList();
            String name = file.displayPath();
            Duration time = file.timing().of(rule.id());
            if (!loaded && !active.isEmpty()) {
                cases.add(new Case(name, rule.id(), Outcome.ERROR, headline(active), worst(active), list(active),
                        "", time));
            } else if (!loaded) {
                cases.add(new Case(name, rule.id(), Outcome.SKIPPED, "not run: the file did not load", "", "", "",
                        time));
            } else if (!failing.isEmpty()) {
                List<Finding> rest = findings.stream().filter(f -> !failing.contains(f)).toList();
                cases.add(new Case(name, rule.id(), Outcome.FAILURE, headline(failing), worst(failing), list(failing),
                        list(rest), time));
            } else {
                cases.add(new Case(name, rule.id(), Outcome.PASSED, "", "", "", list(findings), time));
            }
        }
        return new Suite(file.displayPath(), cases, file.profile(), file.timing().total());
    }

    private static void writeSuite(XmlOut xml, Suite suite) throws XMLStreamException {
        xml.open("testsuite", 1, "name", suite.name(), "tests", suite.cases().size(), "failures",
                suite.count(Outcome.FAILURE), "errors", suite.count(Outcome.ERROR), "skipped",
                suite.count(Outcome.SKIPPED), "time", seconds(suite.time()));
        xml.open("properties", 2);
        xml.empty("property", 3, "name", "mesolint.version", "value", Mesolint.version());
        xml.empty("property", 3, "name", "mesolint.rules-version", "value", Mesolint.RULE_SET_VERSION);
        if (!suite.profile().isEmpty()) {
            xml.empty("property", 3, "name", "mesolint.profile", "value", suite.profile());
        }
        xml.empty("property", 3, "name", "mesolint.caution", "value", Mesolint.CAUTION);
        xml.close(2);
        for (Case c : suite.cases()) {
            boolean body = c.outcome() != Outcome.PASSED || !c.output().isEmpty();
            if (!body) {
                xml.empty("testcase", 2, "classname", c.classname(), "name", c.name(), "file", c.classname(), "time",
                        seconds(c.time()));
                continue;
            }
            xml.open("testcase", 2, "classname", c.classname(), "name", c.name(), "file", c.classname(), "time",
                    seconds(c.time()));
            switch (c.outcome()) {
                case FAILURE -> xml.text("failure", 3, c.detail(), "message", c.message(), "type", c.type());
                case ERROR -> xml.text("error", 3, c.detail(), "message", c.message(), "type", c.type());
                case SKIPPED -> xml.empty("skipped", 3, "message", c.message());
                case PASSED -> { }
            }
            if (!c.output().isEmpty()) {
                xml.text("system-out", 3, c.output());
            }
            xml.close(2);
        }
        xml.text("system-out", 2, "Caution: " + Mesolint.CAUTION);
        xml.close(1);
    }

    private static String headline(List<Finding> findings) {
        Finding first = findings.get(0);
        String more = findings.size() == 1 ? "" : " (and " + (findings.size() - 1) + " more)";
        return findings.size() + " finding" + (findings.size() == 1 ? "" : "s") + ": line " + first.location().line()
                + ": " + first.message() + more;
    }

    /** The most severe severity among {@code findings}, as the failure's type. */
    private static String worst(List<Finding> findings) {
        return findings.stream().map(Finding::severity).min(Comparator.naturalOrder()).orElseThrow().label();
    }

    /** One line per finding: {@code path:line:column message (fix)}, waived ones marked. */
    static String list(List<Finding> findings) {
        StringBuilder text = new StringBuilder();
        for (Finding f : findings) {
            text.append(f.file()).append(':').append(f.location().line()).append(':').append(f.location().column())
                    .append(' ');
            f.waiver().ifPresent(w -> text.append("[waived: ").append(w.reason()).append("] "));
            text.append(f.severity().label()).append(' ').append(f.message()).append(" (").append(f.fix())
                    .append(")\n");
        }
        return text.toString();
    }

    private static int count(List<Suite> suites, Outcome outcome) {
        return suites.stream().mapToInt(s -> outcome == null ? s.cases().size() : s.count(outcome)).sum();
    }

    static String seconds(Duration d) {
        return String.format(Locale.ROOT, "%.3f", d.toNanos() / 1e9);
    }

    private enum Outcome {
        PASSED, FAILURE, ERROR, SKIPPED
    }

    private record Case(String classname, String name, Outcome outcome, String message, String type, String detail,
            String output, Duration time) {
    }

    private record Suite(String name, List<Case> cases, String profile, Duration time) {
        int count(Outcome outcome) {
            return (int) cases.stream().filter(c -> c.outcome() == outcome).count();
        }
    }

    /** A thin indenting layer over StAX that also drops characters XML 1.0 cannot hold. */
    private static final class XmlOut {
        private final XMLStreamWriter w;

        XmlOut(XMLStreamWriter w) {
            this.w = w;
        }

        void start() throws XMLStreamException {
            w.writeStartDocument("UTF-8", "1.0");
        }

        void end() throws XMLStreamException {
            w.writeCharacters("\n");
            w.writeEndDocument();
            w.flush();
        }

        void open(String name, int depth, Object... attributes) throws XMLStreamException {
            indent(depth);
            w.writeStartElement(name);
            attributes(attributes);
        }

        void empty(String name, int depth, Object... attributes) throws XMLStreamException {
            indent(depth);
            w.writeEmptyElement(name);
            attributes(attributes);
        }

        void text(String name, int depth, String text, Object... attributes) throws XMLStreamException {
            indent(depth);
            w.writeStartElement(name);
            attributes(attributes);
            w.writeCharacters(clean(text));
            w.writeEndElement();
        }

        void close(int depth) throws XMLStreamException {
            indent(depth);
            w.writeEndElement();
        }

        private void attributes(Object... pairs) throws XMLStreamException {
            for (int i = 0; i < pairs.length; i += 2) {
                w.writeAttribute((String) pairs[i], clean(String.valueOf(pairs[i + 1])));
            }
        }

        private void indent(int depth) throws XMLStreamException {
            w.writeCharacters("\n" + "  ".repeat(depth));
        }

        /** Replaces characters that XML 1.0 forbids (most control characters) with U+FFFD. */
        static String clean(String text) {
            StringBuilder out = new StringBuilder(text.length());
            text.codePoints().forEach(c -> out.appendCodePoint(
                    c == 0x9 || c == 0xA || c == 0xD || c >= 0x20 && c <= 0xD7FF || c >= 0xE000 && c <= 0xFFFD
                            || c >= 0x10000 && c <= 0x10FFFF ? c : 0xFFFD));
            return out.toString();
        }
    }
}
