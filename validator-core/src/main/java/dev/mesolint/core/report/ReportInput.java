package dev.mesolint.core.report;

import dev.mesolint.core.engine.RuleConfiguration;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Objects;

/**
 * Everything a report writer reads: the run, the registered rules and how they were configured, the folder paths are
 * relative to, and optional extras (training figures, the run's duration; baselined findings are marked on the findings themselves).
 *
 * <p>The findings-only formats (SARIF, JUnit, JSON findings, console) need nothing beyond the run and the rules.
 *
 * @param rules   every registered rule, in reference order (SARIF lists them all; JUnit has a case per rule run)
 * @param root    the folder that findings' paths are relative to
 * @param elapsed how long the run took; {@link Duration#ZERO} when not measured
 * @param options how the front end wants the reports worded (help links, baseline, JUnit failures, git)
 * @param html    how the coach's report and the athlete's sheet are written (plate increment, reasons, catalogue,
 *                extra sections)
 */
public record ReportInput(RunReport run, List<RuleDefinition> rules, RuleConfiguration configuration, Path root,
        ReportFigures figures, Duration elapsed, ReportOptions options, HtmlOptions html) {

    public ReportInput(RunReport run, List<RuleDefinition> rules, RuleConfiguration configuration, Path root,
            ReportFigures figures, Duration elapsed, ReportOptions options) {
        this(run, rules, configuration, root, figures, elapsed, options, HtmlOptions.DEFAULTS);
    }

    public ReportInput(RunReport run, List<RuleDefinition> rules, RuleConfiguration configuration, Path root,
            ReportFigures figures, Duration elapsed) {
        this(run, rules, configuration, root, figures, elapsed, ReportOptions.DEFAULTS);
    }

    public ReportInput {
        Objects.requireNonNull(run, "run");
        rules = List.copyOf(rules);
        Objects.requireNonNull(configuration, "configuration");
        root = root.toAbsolutePath().normalize();
        Objects.requireNonNull(figures, "figures");
        Objects.requireNonNull(elapsed, "elapsed");
        Objects.requireNonNull(options, "options");
        Objects.requireNonNull(html, "html");
    }

    /** Default configuration, no figures, duration not measured. */
    public static ReportInput of(RunReport run, List<RuleDefinition> rules, Path root) {
        return new ReportInput(run, rules, RuleConfiguration.DEFAULTS, root, ReportFigures.NONE, Duration.ZERO);
    }

    public ReportInput withConfiguration(RuleConfiguration newConfiguration) {
        return new ReportInput(run, rules, newConfiguration, root, figures, elapsed, options, html);
    }

    public ReportInput withFigures(ReportFigures newFigures) {
        return new ReportInput(run, rules, configuration, root, newFigures, elapsed, options, html);
    }

    public ReportInput withElapsed(Duration newElapsed) {
        return new ReportInput(run, rules, configuration, root, figures, newElapsed, options, html);
    }

    public ReportInput withOptions(ReportOptions newOptions) {
        return new ReportInput(run, rules, configuration, root, figures, elapsed, newOptions, html);
    }

    public ReportInput withHtml(HtmlOptions newHtml) {
        return new ReportInput(run, rules, configuration, root, figures, elapsed, options, newHtml);
    }

    /** The rules that run on a file checked under {@code profile}: the registered rules that are not off there. */
    public List<RuleDefinition> rulesRunUnder(String profile) {
        return rules.stream().filter(r -> configuration.settingsFor(profile, r).severity() != Severity.OFF).toList();
    }

    /** The position of {@code ruleId} among {@link #rules()}, or -1. */
    public int ruleIndex(String ruleId) {
        for (int i = 0; i < rules.size(); i++) {
            if (rules.get(i).id().equals(ruleId)) {
                return i;
            }
        }
        return -1;
    }
}
