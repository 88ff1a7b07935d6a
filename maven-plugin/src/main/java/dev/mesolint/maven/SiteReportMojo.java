package dev.mesolint.maven;

import java.io.File;
import java.util.List;
import java.util.Locale;
import org.apache.maven.doxia.sink.Sink;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;
import org.apache.maven.reporting.MavenReport;
import org.apache.maven.reporting.MavenReportException;

/**
 * The coaches' HTML report as a page of the project site: {@code mvn site} lists it under "Project Reports" as
 * "mesolint". Like {@code report}, it checks every programme afresh and never fails the build on findings; a broken
 * configuration or a programme folder that cannot be read still does.
 *
 * <p>The page is an external report: mesolint writes its own self-contained HTML page ({@code mesolint.html}, with
 * its strict content security policy) into the site folder instead of rendering through the site's skin, so the
 * page a coach reads in the site is the same one {@code mesolint:report} writes.
 *
 * @since 0.1.0
 */
@Mojo(name = "site-report", threadSafe = true)
public class SiteReportMojo extends AbstractReportingMojo implements MavenReport {
    static final String OUTPUT_NAME = "mesolint";

    /**
     * The site folder the page is written to; the site plugin sets it when it runs the report.
     *
     * @since 0.1.0
     */
    @Parameter(defaultValue = "${project.reporting.outputDirectory}", readonly = true, required = true)
    File siteDirectory;

    @Override
    public void generate(Sink sink, Locale locale) throws MavenReportException {
        try {
            execute();
        } catch (MojoExecutionException | MojoFailureException e) {
            throw new MavenReportException(e.getMessage(), e);
        }
    }

    @Override
    List<String> reportFormats() {
        return List.of("html");
    }

    @Override
    File reportFolder() {
        return siteDirectory;
    }

    @Override
    public String getOutputName() {
        return OUTPUT_NAME;
    }

    @Override
    public String getOutputPath() {
        return OUTPUT_NAME;
    }

    @Override
    public String getCategoryName() {
        return CATEGORY_PROJECT_REPORTS;
    }

    @Override
    public String getName(Locale locale) {
        return "mesolint";
    }

    @Override
    public String getDescription(Locale locale) {
        return "Training programmes checked by mesolint: findings and training figures per programme, for coaches.";
    }

    @Override
    public void setReportOutputDirectory(File folder) {
        siteDirectory = folder;
    }

    @Override
    public File getReportOutputDirectory() {
        return siteDirectory;
    }

    /** The page is mesolint's own HTML file, not content rendered into the site's skin. */
    @Override
    public boolean isExternalReport() {
        return true;
    }

    @Override
    public boolean canGenerateReport() {
        return !skip;
    }
}
