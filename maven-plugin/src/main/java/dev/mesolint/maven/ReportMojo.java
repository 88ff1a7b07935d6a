package dev.mesolint.maven;

import dev.mesolint.core.cache.CachedCheck;
import dev.mesolint.core.report.ConsoleReport;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;

/**
 * Writes the reports for coaches and never fails the build on findings: every programme is checked afresh and the
 * results go to the output folder. Bad configuration is still a BUILD ERROR.
 *
 * @since 0.1.0
 */
@Mojo(name = "report", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true)
public class ReportMojo extends AbstractMesolintMojo {
    static final List<String> FORMATS = List.of("text");

    /**
     * The report formats to write to the output folder: {@code text} ({@code mesolint.txt}, the console form with
     * waived findings and their reasons). On the command line, comma-separated.
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.reports", defaultValue = "text")
    List<String> reports = new ArrayList<>(List.of("text"));

    @Override
    boolean useCache() {
        return false;
    }

    @Override
    void checkParameters() throws MojoExecutionException {
        for (String format : reports) {
            if (!FORMATS.contains(format.trim())) {
                throw new MojoExecutionException("mesolint: reports (mesolint.reports): unknown format '" + format
                        + "'; formats: " + String.join(", ", FORMATS));
            }
        }
    }

    @Override
    void afterCheck(CachedCheck.Outcome outcome) throws MojoExecutionException {
        getLog().info("mesolint: " + ConsoleReport.summary(outcome.report()));
        Path out = outputDirectory.toPath().resolve("mesolint.txt");
        try {
            Files.createDirectories(out.getParent());
            try (PrintWriter writer = new PrintWriter(Files.newBufferedWriter(out, StandardCharsets.UTF_8))) {
                new ConsoleReport(true).write(outcome.report(), writer);
            }
        } catch (IOException e) {
            throw new MojoExecutionException("mesolint: cannot write " + out + ": " + e.getMessage(), e);
        }
        getLog().info("mesolint: text report written to " + out);
        failOnBrokenRun(outcome);
    }
}
