package dev.mesolint.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.apache.maven.reporting.MavenReport;
import org.apache.maven.reporting.MavenReportException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SiteReportMojoTests {
    @TempDir
    Path dir;

    @Test
    void writesTheCoachesPageIntoTheSiteAndDoesNotFailOnFindings() throws Exception {
        MojoFixture repo = new MojoFixture(dir)
                .programme("misspelt.yaml", MojoFixture.PROGRAMME.replace("barbell-bench", "barbel-bench"));
        MavenReport report = repo.siteReport();
        report.generate(null, Locale.ENGLISH); // an external report renders no sink content

        Path page = dir.resolve("target/site/mesolint.html");
        String html = Files.readString(page);
        assertTrue(html.contains("unknown-exercise"), "the page shows the finding");
        assertTrue(html.contains("PAR-Q+"), "the page carries the caution");
        assertTrue(repo.log.lines.contains("[INFO] mesolint: 1 file checked: 1 error, 0 warnings, 0 info, "
                + "0 waived -> FAILED (fail level: error)"), repo.log.text());
        assertFalse(Files.exists(dir.resolve("target/mesolint/cache.json")), "a site page is always made afresh");
        assertFalse(Files.exists(dir.resolve("target/site/mesolint.json")), "only the page goes into the site");
    }

    @Test
    void isListedAsAnExternalProjectReportLinkedByItsOutputName() {
        MavenReport report = new MojoFixture(dir).siteReport();
        // The site plugin links an external report as <output name>.html under "Project Reports".
        assertTrue(report.isExternalReport());
        assertEquals(MavenReport.CATEGORY_PROJECT_REPORTS, report.getCategoryName());
        assertEquals("mesolint", report.getOutputName());
        assertEquals("mesolint", report.getOutputPath());
        assertEquals(dir.resolve("target/site").toFile(), report.getReportOutputDirectory());
    }

    @Test
    void skippedMeansNoPageInTheSite() throws Exception {
        SiteReportMojo report = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME).siteReport();
        assertTrue(report.canGenerateReport());
        report.skip = true;
        assertFalse(report.canGenerateReport());
    }

    @Test
    void aBrokenConfigurationFailsTheSiteWithTheLocatedProblem() throws Exception {
        MojoFixture repo = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME);
        Files.writeString(dir.resolve(".mesolint.yaml"), "fail-on: fatal\n");
        MavenReportException error = assertThrows(MavenReportException.class,
                () -> repo.siteReport().generate(null, Locale.ENGLISH));
        assertTrue(error.getMessage().startsWith("mesolint: .mesolint.yaml:1:10: fail-on 'fatal' is not a level"),
                error.getMessage());
        assertFalse(Files.exists(dir.resolve("target/site/mesolint.html")));
    }
}
