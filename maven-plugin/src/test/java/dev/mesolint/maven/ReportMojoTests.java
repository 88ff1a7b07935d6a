package dev.mesolint.maven;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.maven.plugin.MojoExecutionException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportMojoTests {
    @TempDir
    Path dir;

    @Test
    void writesTheTextReportAndDoesNotFailOnFindings() throws Exception {
        MojoFixture repo = new MojoFixture(dir)
                .programme("misspelt.yaml", MojoFixture.PROGRAMME.replace("barbell-bench", "barbel-bench"));
        ReportMojo mojo = repo.report();
        mojo.reports = List.of(ReportMojo.ALL.split(","));
        mojo.execute();

        for (String name : List.of("mesolint.txt", "mesolint.html", "mesolint.json", "mesolint.sarif",
                "TEST-mesolint.xml")) {
            assertTrue(Files.size(dir.resolve("target/mesolint").resolve(name)) > 0, name);
        }
        assertTrue(Files.readString(dir.resolve("target/mesolint/mesolint.html")).contains("PAR-Q+"));
        assertTrue(repo.log.lines.contains("[INFO] mesolint: reports written to " + dir.resolve("target/mesolint")
                + ": mesolint.txt, mesolint.html, mesolint.json, mesolint.sarif, TEST-mesolint.xml"),
                repo.log.text());
        String report = Files.readString(dir.resolve("target/mesolint/mesolint.txt"));
        assertTrue(report.startsWith("programmes/misspelt.yaml:15:23: error unknown-exercise:"), report);
        assertTrue(report.contains("1 file checked: 1 error, 0 warnings, 0 info, 0 waived -> FAILED"), report);
        assertTrue(report.contains("Note: mesolint applies general, population-level training guidance"), report);
        assertFalse(Files.exists(dir.resolve("target/mesolint/cache.json")), "reports are always made afresh");
    }

    @Test
    void withThePomInASubfolderEveryReportNamesPathsFromTheRepositoryRoot() throws Exception {
        Files.createDirectories(dir.resolve(".git")); // the repository root, as git marks it
        MojoFixture repo = new MojoFixture(dir)
                .programme("misspelt.yaml", MojoFixture.PROGRAMME.replace("barbell-bench", "barbel-bench"));
        ReportMojo mojo = repo.report();
        Path build = Files.createDirectories(dir.resolve("build/programme-checks"));
        mojo.basedir = build.toFile(); // the pom sits two folders below the root
        mojo.outputDirectory = build.resolve("target/mesolint").toFile();
        mojo.reports = List.of("console", "sarif", "json", "junit");
        mojo.execute();

        Path out = build.resolve("target/mesolint");
        String sarif = Files.readString(out.resolve("mesolint.sarif"));
        assertTrue(sarif.contains("\"uri\" : \"programmes/misspelt.yaml\"")
                || sarif.contains("\"uri\":\"programmes/misspelt.yaml\""), sarif);
        for (String name : List.of("mesolint.txt", "mesolint.sarif", "mesolint.json", "TEST-mesolint.xml")) {
            String text = Files.readString(out.resolve(name));
            assertTrue(text.contains("programmes/misspelt.yaml"), name + " names the file from the root");
            assertFalse(text.contains("../programmes") || text.contains("..\\programmes"),
                    name + " names no path relative to the pom's folder");
        }
    }

    @Test
    void anUnknownFormatIsAnExecutionErrorBeforeAnyWork() throws Exception {
        MojoFixture repo = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME);
        ReportMojo mojo = repo.report();
        mojo.reports = List.of("pdf");
        MojoExecutionException error = assertThrows(MojoExecutionException.class, mojo::execute);
        assertTrue(error.getMessage().startsWith("mesolint: reports (mesolint.reports): unknown format 'pdf'; "
                + "formats: console, json"), error.getMessage());
        assertFalse(Files.exists(dir.resolve("target/mesolint")));
    }
}
