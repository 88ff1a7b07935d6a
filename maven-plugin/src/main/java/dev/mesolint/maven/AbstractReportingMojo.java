package dev.mesolint.maven;

import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.run.RunResult;
import org.apache.maven.plugin.MojoExecutionException;

/**
 * The goals that write reports for coaches: every programme is checked afresh (the reports show figures the cache
 * does not keep), the counts are logged, and findings never fail the build; a run that broke still does.
 */
abstract class AbstractReportingMojo extends AbstractMesolintMojo {
    @Override
    final boolean useCache() {
        return false;
    }

    @Override
    final void afterCheck(RunResult result, boolean reportOnly) throws MojoExecutionException {
        getLog().info("mesolint: " + ConsoleReport.summary(result.report()));
        CheckExecution.failOnBrokenRun(result);
    }
}
