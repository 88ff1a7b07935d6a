package dev.mesolint.maven;

import java.util.ArrayList;
import java.util.List;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;

/**
 * Writes the reports for coaches and never fails the build on findings: every programme is checked afresh and the
 * reports go to the output folder. Bad configuration is still a build error.
 *
 * @since 0.1.0
 */
@Mojo(name = "report", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true)
public class ReportMojo extends AbstractReportingMojo {
    static final String ALL = "console,html,json,sarif,junit";

    /**
     * The report formats to write to the output folder (comma-separated on the command line): {@code console}
     * ({@code mesolint.txt}, with waived findings and their reasons), {@code html} ({@code mesolint.html}, for
     * coaches), {@code json} ({@code mesolint.json}), {@code sarif} ({@code mesolint.sarif}), {@code junit}
     * ({@code TEST-mesolint.xml}), and on request {@code html-sheet} ({@code mesolint-sheet.html}, the athlete's
     * sheet).
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.reports", defaultValue = ALL)
    List<String> reports = new ArrayList<>(List.of(ALL.split(",")));

    @Override
    List<String> reportFormats() {
        return reports;
    }
}
