package dev.mesolint.maven;

import dev.mesolint.core.run.RunResult;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
import java.util.ArrayList;
import java.util.List;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;

/**
 * Checks the repository's programmes and fails the build when a finding reaches the fail level. Every finding is
 * logged first as {@code file:line:column: severity rule-id: message} with its fix, then the build fails once.
 *
 * @since 0.1.0
 */
@Mojo(name = "check", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true)
public class CheckMojo extends AbstractMesolintMojo {

    /**
     * Reports to write to the output folder as well, even when the build fails (comma-separated on the command
     * line): {@code console}, {@code json}, {@code sarif}, {@code junit}, {@code html}. Default: none. With
     * {@code html} or {@code json}, every programme is checked afresh (they show figures the cache does not keep).
     *
     * @since 0.1.0
     */
    @Parameter(property = "mesolint.reports")
    List<String> reports = new ArrayList<>();

    @Override
    List<String> reportFormats() {
        return reports;
    }

    @Override
    boolean useCache() {
        return cache;
    }

    @Override
    void afterCheck(RunResult result, boolean reportOnly) throws MojoExecutionException,
            MojoFailureException {
        RunReport run = result.report();
        new FindingLog(getLog(), showWaived).write(run);
        CheckExecution.failOnBrokenRun(result);
        if (reportOnly) {
            getLog().info("mesolint: failOn is none: findings are reported, never a build failure");
            return;
        }
        if (run.failed()) {
            throw new MojoFailureException(failureMessage(run));
        }
    }

    static String failureMessage(RunReport run) {
        long errors = run.count(Severity.ERROR);
        long warnings = run.count(Severity.WARNING);
        long infos = run.count(Severity.INFO);
        StringBuilder counts = new StringBuilder(errors + " error" + (errors == 1 ? "" : "s"));
        if (run.failOn() != Severity.ERROR) {
            counts.append(", ").append(warnings).append(" warning").append(warnings == 1 ? "" : "s");
        }
        if (run.failOn() == Severity.INFO) {
            counts.append(", ").append(infos).append(" info");
        }
        return "mesolint: " + counts + " at or above the fail level '" + run.failOn().label() + "' in "
                + run.files().stream().filter(f -> f.active().stream().anyMatch(x -> x.severity().atLeast(
                        run.failOn()))).count() + " of " + run.files().size() + " files; fix them (see the "
                + "findings above) or waive each with a reason";
    }
}
