package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandReportTests {
    private static final Path ROOT = Path.of("..").toAbsolutePath().normalize();

    private record Outcome(int exit, String out, String err) {
    }

    private static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Outcome(exit, out.toString(), err.toString());
    }

    @Test
    void writesEachRequestedReport(@TempDir Path dir) throws Exception {
        Path sarif = dir.resolve("a/mesolint.sarif");
        Path html = dir.resolve("b/mesolint.html");
        Path junit = dir.resolve("mesolint.xml");
        Outcome o = run("check", "--root", ROOT.toString(),
                ROOT.resolve("sample-programs/broken/week-sequence.yaml").toString(),
                "--report", "sarif=" + sarif, "--report", "html=" + html, "--report", "junit=" + junit);
        assertEquals(1, o.exit(), o.err());
        assertTrue(o.out().contains("sample-programs/broken/week-sequence.yaml:"), "the console form still prints");
        String log = Files.readString(sarif);
        assertTrue(log.contains("\"ruleId\" : \"week-sequence\""), log);
        assertTrue(log.contains("\"uri\" : \"sample-programs/broken/week-sequence.yaml\""));
        assertTrue(Files.readString(html).contains("Gaps and clashes in the calendar"));
        assertTrue(Files.readString(junit).contains("<testsuite name=\"sample-programs/broken/week-sequence.yaml\""));
    }

    @Test
    void rejectsAnUnknownFormatAsAUsageError(@TempDir Path dir) {
        Outcome o = run("check", ROOT.resolve("sample-programs/programmes").toString(), "--report",
                "pdf=" + dir.resolve("x.pdf"));
        assertEquals(2, o.exit());
        assertTrue(o.err().contains("unknown report format 'pdf'"), o.err());
        assertFalse(Files.exists(dir.resolve("x.pdf")));
    }

    @Test
    void rejectsAReportWithoutAPath() {
        Outcome o = run("check", ROOT.resolve("sample-programs/programmes").toString(), "--report", "sarif");
        assertEquals(2, o.exit());
        assertTrue(o.err().contains("FORMAT=PATH"), o.err());
    }

    @Test
    void sarifAndJsonLeaveConstraintReasonsOutUnlessIncludeReasons(@TempDir Path dir) throws Exception {
        // The sample's own reason is quoted by no rule page, but a reason of our own makes the test self-contained.
        String reason = "Harbourside clinic note C-2207";
        Path programme = dir.resolve("programmes/avoid.yaml");
        Files.createDirectories(programme.getParent());
        Files.writeString(programme, Files.readString(ROOT.resolve("sample-programs/broken/constraint-avoid.yaml"))
                .replace("Shoulder discomfort in that position at intake", reason));
        for (boolean include : new boolean[] {false, true}) {
            Path sarif = dir.resolve(include + "/mesolint.sarif");
            Path json = dir.resolve(include + "/mesolint.json");
            Outcome o = include
                    ? run("check", "--root", dir.toString(), programme.toString(), "--report", "sarif=" + sarif,
                            "--report", "json=" + json, "--include-reasons")
                    : run("check", "--root", dir.toString(), programme.toString(), "--report", "sarif=" + sarif,
                            "--report", "json=" + json);
            assertEquals(1, o.exit(), o.err());
            assertTrue(o.out().contains(reason), "the coach's console keeps the reason: " + o.out());
            for (Path report : new Path[] {sarif, json}) {
                String text = Files.readString(report);
                assertTrue(text.contains("constraint-avoid"), text);
                assertEquals(include, text.contains(reason), report + " with include-reasons " + include);
                assertEquals(!include, text.contains("(reason left out)"), report.toString());
            }
        }
    }
}
