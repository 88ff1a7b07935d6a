package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class JunitReportTests {

    private static Document parse(ReportInput input) throws Exception {
        String xml = ReportFixtures.render(ReportFormat.JUNIT, input);
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return factory.newDocumentBuilder().parse(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)));
    }

    private static List<Element> elements(Element parent, String name) {
        NodeList nodes = parent.getElementsByTagName(name);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            out.add((Element) nodes.item(i));
        }
        return out;
    }

    private static Element testcase(Element suite, String rule) {
        return elements(suite, "testcase").stream().filter(c -> c.getAttribute("name").equals(rule)).findFirst()
                .orElseThrow(() -> new AssertionError("no test case " + rule));
    }

    @Test
    void countsCasesFailuresErrorsAndSkipsPerFile() throws Exception {
        Document doc = parse(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR))
                .withElapsed(Duration.ofMillis(1234)));
        Element root = doc.getDocumentElement();
        assertEquals("testsuites", root.getTagName());
        int rules = ReportFixtures.RULES.size();
        assertEquals(String.valueOf(2 * rules), root.getAttribute("tests"));
        assertEquals("1", root.getAttribute("failures"), "only the error reaches the fail level");
        assertEquals("1", root.getAttribute("errors"), "the file that did not load");
        assertEquals(String.valueOf(rules - 1), root.getAttribute("skipped"));
        assertEquals("1.234", root.getAttribute("time"));

        List<Element> suites = elements(root, "testsuite");
        assertEquals(2, suites.size());
        Element a = suites.get(0);
        assertEquals("programmes/a.yaml", a.getAttribute("name"));
        assertEquals(String.valueOf(rules), a.getAttribute("tests"));
        assertEquals("1", a.getAttribute("failures"));
        assertEquals("0", a.getAttribute("errors"));
        for (Element c : elements(a, "testcase")) {
            assertEquals("programmes/a.yaml", c.getAttribute("classname"));
            assertEquals("programmes/a.yaml", c.getAttribute("file"));
            assertEquals("0.000", c.getAttribute("time"), "a hand-made run has no measured times");
        }
        Element failure = elements(testcase(a, "week-sequence"), "failure").get(0);
        assertEquals("error", failure.getAttribute("type"));
        assertTrue(failure.getAttribute("message").contains("week 4 follows week 2"));
        assertEquals("programmes/a.yaml:41:7 error week 4 follows week 2: week 3 is missing "
                + "(fix for week 4 follows week 2: week 3 is missing)\n", failure.getTextContent());

        Element waivers = testcase(a, "unused-waiver");
        assertEquals(0, elements(waivers, "failure").size(), "a warning under fail level error passes");
        String out = elements(waivers, "system-out").get(0).getTextContent();
        assertTrue(out.contains("programmes/a.yaml:12:3 warning waiver for 'x' names no known rule"));
        assertTrue(out.contains("[waived: kept while the club reviews its waivers]"));

        Element b = suites.get(1);
        assertEquals("1", b.getAttribute("errors"));
        Element error = elements(testcase(b, "schema"), "error").get(0);
        assertEquals("error", error.getAttribute("type"));
        assertTrue(error.getTextContent().startsWith("broken/b.yaml:3:1 error 'programme' needs 'goal'"));
        assertEquals(1, elements(testcase(b, "week-sequence"), "skipped").size());
    }

    @Test
    void theFailLevelDecidesWhatFails() throws Exception {
        Element root = parse(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.INFO))).getDocumentElement();
        Element a = elements(root, "testsuite").get(0);
        assertEquals("3", a.getAttribute("failures"), "error, warning and info rules all fail at fail level info");
        Element unused = elements(testcase(a, "unused-waiver"), "failure").get(0);
        assertEquals("warning", unused.getAttribute("type"));
        assertTrue(!unused.getTextContent().contains("waived"), "the waived finding is not a failure");
    }

    @Test
    void warningsFailTheirCaseWhenTheJunitLevelSaysSoWhateverTheRunsFailLevel() throws Exception {
        ReportInput input = ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR))
                .withOptions(ReportOptions.DEFAULTS.withJunitFailAt(java.util.Optional.of(Severity.WARNING)));
        Element a = elements(parse(input).getDocumentElement(), "testsuite").get(0);
        assertEquals("2", a.getAttribute("failures"), "the error and the warning fail; the info does not");
        assertEquals("warning", elements(testcase(a, "unused-waiver"), "failure").get(0).getAttribute("type"));
    }

    @Test
    void timesAreMeasuredForEachFileAndRule() throws Exception {
        RunReport checked = ReportFixtures.check("sample-programs/programmes");
        double longest = 0;
        for (Element suite : elements(parse(ReportFixtures.input(checked)).getDocumentElement(), "testsuite")) {
            double total = Double.parseDouble(suite.getAttribute("time"));
            double rules = elements(suite, "testcase").stream()
                    .mapToDouble(c -> Double.parseDouble(c.getAttribute("time"))).sum();
            // A file's time covers reading, schema, model and every rule, so it is never below the rules' sum
            // (each value is rounded to a millisecond).
            longest = Math.max(longest, total);
            assertTrue(total + 0.0005 * elements(suite, "testcase").size() >= rules, suite.getAttribute("name"));
        }
        assertTrue(longest > 0, "the files' times are measured, not written as zero");
    }

    @Test
    void carriesTheCautionAndTheProfile() throws Exception {
        Element suite = elements(parse(ReportFixtures.input(ReportFixtures.handMadeRun(Severity.ERROR)))
                .getDocumentElement(), "testsuite").get(0);
        List<String> names = new ArrayList<>();
        String caution = null;
        for (Element p : elements(suite, "property")) {
            names.add(p.getAttribute("name"));
            if (p.getAttribute("name").equals("mesolint.caution")) {
                caution = p.getAttribute("value");
            }
        }
        assertEquals(List.of("mesolint.version", "mesolint.rules-version", "mesolint.profile", "mesolint.caution"),
                names);
        assertEquals(Mesolint.CAUTION, caution);
        List<Element> outs = elements(suite, "system-out");
        assertTrue(outs.get(outs.size() - 1).getTextContent().contains(Mesolint.CAUTION));
    }

    @Test
    void reportsTheRealSamplesAndMissingInputs() throws Exception {
        RunReport checked = ReportFixtures.check("sample-programs/programmes", "sample-programs/broken/yaml-syntax.yaml");
        RunReport run = new RunReport(checked.files(), Severity.ERROR, List.of("nowhere/plan.yaml"));
        Element root = parse(ReportFixtures.input(run)).getDocumentElement();
        List<Element> suites = elements(root, "testsuite");
        assertEquals(checked.files().size() + 1, suites.size());
        int tests = suites.stream().mapToInt(s -> Integer.parseInt(s.getAttribute("tests"))).sum();
        assertEquals(String.valueOf(tests), root.getAttribute("tests"));
        assertEquals("2", root.getAttribute("errors"), "the YAML syntax error and the missing input");
        Element missing = suites.get(suites.size() - 1);
        assertEquals("nowhere/plan.yaml", missing.getAttribute("name"));
    }

    @Test
    void dropsCharactersXmlCannotHold() throws Exception {
        RunReport run = new RunReport(List.of(new dev.mesolint.core.engine.FileReport("x.yaml", java.util.Optional.empty(),
                "hypertrophy", List.of(ReportFixtures.finding("yaml-syntax", Severity.ERROR, "x.yaml", 1, 1, "",
                        "bad byte \u0001 here")))), Severity.ERROR, List.of());
        Element error = elements(parse(ReportFixtures.input(run)).getDocumentElement(), "error").get(0);
        assertTrue(error.getTextContent().contains("bad byte \uFFFD here"));
    }
}
