package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.report.ConsoleStyle;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** What {@code check} puts on standard output and error: one pipeable document, quiet, colour, standard input. */
class CheckOutputTests {
    private static final JsonMapper JSON = JsonMapper.builder().build();

    @TempDir
    Path root;

    /** A 60 s rest after squats: one short-rest-compound warning under hypertrophy. */
    private static final String PROGRAMME = SquatDay.resting("harbour-output", "60s");

    private record Run(int exit, String out, String err) {
    }

    private Run withInput(String stdin, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(args, new ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8)),
                new PrintWriter(out), new PrintWriter(err));
        return new Run(exit, out.toString(), err.toString());
    }

    private Run run(String... args) {
        return withInput("", args);
    }

    private Path programme() throws IOException {
        Files.createDirectories(root.resolve(".git"));
        Path file = root.resolve("programmes/block.yaml");
        Files.createDirectories(file.getParent());
        return Files.writeString(file, PROGRAMME);
    }

    @Test
    void formatSarifPutsOneJsonDocumentOnStandardOutputAndNothingElse() throws IOException {
        programme();
        Run r = run("check", "--format", "sarif", root.resolve("programmes").toString());

        assertEquals(0, r.exit(), r.err());
        JsonNode log = JSON.readTree(r.out());
        assertEquals("2.1.0", log.get("version").asString());
        assertEquals("short-rest-compound", log.at("/runs/0/results/0/ruleId").asString());
        assertEquals("programmes/block.yaml",
                log.at("/runs/0/results/0/locations/0/physicalLocation/artifactLocation/uri").asString());
        assertEquals(Mesolint.CAUTION, log.at("/runs/0/properties/caution").asString());
        assertFalse(r.out().contains("files checked"), r.out());
    }

    @Test
    void aReportToDashIsStandardOutputAndOtherReportsStillGoToTheirFiles() throws IOException {
        programme();
        Path junit = root.resolve("build/reports/deep/TEST-mesolint.xml");
        Run r = run("check", "--report", "json=-", "--report", "junit=" + junit, root.resolve("programmes").toString());

        assertEquals(0, r.exit(), r.err());
        JsonNode doc = JSON.readTree(r.out());
        assertEquals(1, doc.at("/summary/warnings").asInt());
        assertEquals(Mesolint.CAUTION, doc.get("caution").asString());
        assertTrue(Files.readString(junit).contains("<testsuites"), "the folders of a report are created");
        assertFalse(Files.exists(root.resolve("-")), "'-' is standard output, not a file named '-'");
    }

    @Test
    void twoDocumentsForStandardOutputAreAUsageError() throws IOException {
        programme();
        Run r = run("check", "--format", "sarif", "--report", "json=-", root.resolve("programmes").toString());

        assertEquals(2, r.exit());
        assertTrue(r.err().contains("standard output can carry one report, not sarif and json"), r.err());
    }

    @Test
    void quietPrintsOnlyWhatFailsTheRunThenTheCaution() throws IOException {
        programme();
        Run clean = run("check", "--quiet", root.resolve("programmes").toString());
        assertEquals(0, clean.exit());
        assertEquals("", clean.out(), "a warning under the error fail level does not fail: nothing to say");

        Run failing = run("check", "-q", "--fail-on", "warning", root.resolve("programmes").toString());
        assertEquals(1, failing.exit());
        String[] lines = failing.out().split("\n");
        assertEquals(3, lines.length, failing.out());
        assertTrue(lines[0].startsWith("programmes/block.yaml:16:19: warning short-rest-compound: "), lines[0]);
        assertEquals("    fix: rest: 2min", lines[1]);
        assertEquals("Note: " + Mesolint.CAUTION, lines[2]);
    }

    @Test
    void colourIsAddedOnlyWhenAskedOrOnATerminalWithoutNoColor() throws IOException {
        programme();
        Run plain = run("check", root.resolve("programmes").toString());
        assertFalse(plain.out().contains("\u001b["), "a test's output is not a terminal");

        Run coloured = run("check", "--color", "always", root.resolve("programmes").toString());
        assertTrue(coloured.out().startsWith("\u001b[1mprogrammes/block.yaml:16:19\u001b[0m: \u001b[33mwarning\u001b[0m "
                + "short-rest-compound: "), coloured.out());

        // The NO_COLOR convention: any non-empty value turns automatic colour off.
        assertEquals(ConsoleStyle.ANSI, ConsoleStyle.choose("auto", true, null));
        assertEquals(ConsoleStyle.PLAIN, ConsoleStyle.choose("auto", true, "1"));
        assertEquals(ConsoleStyle.PLAIN, ConsoleStyle.choose("auto", false, null));
        assertEquals(ConsoleStyle.ANSI, ConsoleStyle.choose("always", false, "1"));
        assertEquals(ConsoleStyle.PLAIN, ConsoleStyle.choose("never", true, null));
    }

    @Test
    void aProgrammeOnStandardInputIsCheckedAsTheFileItStandsFor() throws IOException {
        programme();
        Files.writeString(root.resolve(".mesolint.yaml"), "fail-on: warning\n");
        Path unsaved = root.resolve("programmes/unsaved.yaml");

        Run r = withInput(PROGRAMME, "check", "-", "--stdin-filename", unsaved.toString());

        // The configuration above the named file applies (fail-on: warning), and messages name it.
        assertEquals(1, r.exit(), r.out() + r.err());
        assertTrue(r.out().startsWith("programmes/unsaved.yaml:16:19: warning short-rest-compound: "), r.out());
        assertTrue(r.out().contains("1 file checked"), r.out());

        Run mixed = withInput(PROGRAMME, "check", "-", root.resolve("programmes").toString());
        assertEquals(2, mixed.exit());
        assertTrue(mixed.err().contains("'-' (standard input) is one programme"), mixed.err());
    }

    @Test
    void aMissingPathIsAnErrorWithNoSummaryBeforeIt() {
        Run r = run("check", root.resolve("nowhere").toString());

        assertEquals(2, r.exit());
        assertEquals("", r.out());
        assertTrue(r.err().startsWith("mesolint: no such file or folder: "), r.err());
    }

    @Test
    void aWaiverForAMisspeltRuleSuggestsTheRuleMeant() throws IOException {
        Files.createDirectories(root.resolve(".git"));
        Path file = root.resolve("block.yaml");
        Files.writeString(file, PROGRAMME + """
                            waive:
                              - rule: short-rest-compund
                                reason: Timed circuit day for the club's open session.
                """);

        Run r = run("check", file.toString());

        assertTrue(r.out().contains("waiver for 'short-rest-compund' names no known rule"), r.out());
        assertTrue(r.out().contains("fix: did you mean 'short-rest-compound'? correct the rule id, or remove the "
                + "waiver"), r.out());
    }

    @Test
    void aCompletionScriptIsGenerated() {
        Run r = run("generate-completion");

        assertEquals(0, r.exit(), r.err());
        assertTrue(r.out().contains("complete -F"), "a bash completion script");
        assertTrue(r.out().contains("--stdin-filename"), "it completes check's options");
    }
}
