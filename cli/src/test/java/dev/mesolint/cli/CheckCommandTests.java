package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandTests {
    /** path:line:column: severity rule-id: message */
    private static final Pattern FINDING = Pattern.compile("^[^:\\s]+:\\d+:\\d+: (error|warning|info) [a-z-]+: .+$");

    @TempDir
    Path dir;

    private record Run(int exit, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(exit, out.toString(), err.toString());
    }

    @Test
    void theSampleProgrammesAreClean() {
        Run r = run("check", "--root", "..", "../sample-programs/programmes");
        assertEquals(0, r.exit(), r.out());
        assertTrue(r.out().contains("4 files checked: 0 errors, 0 warnings"), r.out());
        assertTrue(r.out().contains("not a medical assessment"), "the caution is printed");
    }

    @Test
    void brokenSamplesPrintLocatedFindingsWithFixesAndExitOne() {
        Run r = run("check", "--root", "../sample-programs", "../sample-programs/broken/unknown-exercise.yaml",
                "../sample-programs/broken/schema.yaml");
        assertEquals(1, r.exit(), r.out());
        String[] lines = r.out().split("\\R");
        long findings = java.util.Arrays.stream(lines).filter(l -> FINDING.matcher(l).matches()).count();
        assertTrue(findings >= 4, r.out());
        assertTrue(r.out().contains("broken/unknown-exercise.yaml:"), r.out());
        assertTrue(r.out().contains("    fix: exercise: barbell-bench-press"), r.out());
        assertFalse(r.out().contains("Exception"), r.out());
    }

    @Test
    void failOnRaisesOrLowersTheBar() throws IOException {
        Path stale = dir.resolve("stale.yaml");
        Files.writeString(stale, Files.readString(Path.of("../sample-programs/programmes/novice-full-body.yaml"))
                .replaceFirst("(?m)^weeks:", "waive:\n  - {rule: session-time, reason: old note}\nweeks:"));
        assertEquals(0, run("check", stale.toString()).exit(), "an unused waiver is a warning");
        Run strict = run("check", "--fail-on", "warning", stale.toString());
        assertEquals(1, strict.exit(), strict.out());
    }

    @Test
    void usageErrorsExitTwoWithoutAStackTrace() {
        Run badLevel = run("check", "--fail-on", "fatal", "x.yaml");
        assertEquals(2, badLevel.exit());
        assertTrue(badLevel.err().contains("--fail-on must be error, warning or info"), badLevel.err());
        Run missing = run("check", dir.resolve("nothing-here.yaml").toString());
        assertEquals(2, missing.exit());
        assertTrue(missing.err().contains("no such file or folder"), missing.err());
        Run noPath = run("check");
        assertEquals(2, noPath.exit());
        assertFalse((noPath.out() + noPath.err()).contains("at dev.mesolint"), "no stack trace");
    }

    @Test
    void versionAndHelpCarryTheEssentials() {
        Run version = run("--version");
        assertEquals(0, version.exit());
        assertTrue(version.out().startsWith("mesolint 0."), version.out());
        assertTrue(version.out().contains("\nrule set " + dev.mesolint.core.Mesolint.RULE_SET_VERSION + "\n"),
                version.out());
        Run help = run("--help");
        assertTrue(help.out().contains("check"), help.out());
        assertTrue(help.out().contains("PAR-Q+"), "help carries the caution");
    }
}
