package dev.mesolint.core.report;

import dev.mesolint.core.finding.Severity;
import java.util.Objects;
import java.util.Optional;

/**
 * How a front end wants reports worded, beyond the run itself.
 *
 * @param helpUriBase     where the rule reference pages are published ({@code <base>/<rule-id>.md}); without it,
 *                        reports carry the help text inline and link nowhere, as no public site is promised
 * @param baselineInForce true when findings were compared with a baseline, so "new" and "unchanged" mean something
 * @param junitFailAt     the level at which a JUnit case fails; without it, the run's fail level
 * @param revision        the git commit checked, when known (SARIF's provenance and automation id)
 * @param branch          the git branch checked, when known
 * @param repositoryUri   where the repository lives (the {@code origin} remote), when known
 * @param includeReasons  keep athlete-constraint reasons (health data) in the SARIF and JSON reports; by default
 *                        they are left out, as those reports are uploaded to code-scanning services and CI logs
 */
public record ReportOptions(Optional<String> helpUriBase, boolean baselineInForce, Optional<Severity> junitFailAt,
        Optional<String> revision, Optional<String> branch, Optional<String> repositoryUri, boolean includeReasons) {

    public static final ReportOptions DEFAULTS = new ReportOptions(Optional.empty(), false, Optional.empty(),
            Optional.empty(), Optional.empty(), Optional.empty(), false);

    public ReportOptions {
        Objects.requireNonNull(helpUriBase, "helpUriBase");
        helpUriBase = helpUriBase.map(String::strip).filter(s -> !s.isEmpty())
                .map(s -> s.endsWith("/") ? s : s + "/");
        if (junitFailAt.isPresent() && junitFailAt.get() == Severity.OFF) {
            throw new IllegalArgumentException("the JUnit failure level must be error, warning or info");
        }
    }

    /** The reference page of {@code ruleId}, when a base is configured. */
    public Optional<String> helpUri(String ruleId) {
        return helpUriBase.map(base -> base + ruleId + ".md");
    }

    public ReportOptions withHelpUriBase(Optional<String> base) {
        return new ReportOptions(base, baselineInForce, junitFailAt, revision, branch, repositoryUri, includeReasons);
    }

    public ReportOptions withBaselineInForce(boolean inForce) {
        return new ReportOptions(helpUriBase, inForce, junitFailAt, revision, branch, repositoryUri, includeReasons);
    }

    public ReportOptions withJunitFailAt(Optional<Severity> level) {
        return new ReportOptions(helpUriBase, baselineInForce, level, revision, branch, repositoryUri, includeReasons);
    }

    /** The git provenance of the repository at {@code root}, when it is one (read from its files). */
    public ReportOptions withGitAt(java.nio.file.Path root) {
        return dev.mesolint.core.git.GitHead.at(root)
                .map(h -> withGit(Optional.of(h.revision()), h.branch(), h.repositoryUri())).orElse(this);
    }

    public ReportOptions withGit(Optional<String> newRevision, Optional<String> newBranch,
            Optional<String> newRepositoryUri) {
        return new ReportOptions(helpUriBase, baselineInForce, junitFailAt, newRevision, newBranch, newRepositoryUri,
                includeReasons);
    }

    public ReportOptions withIncludeReasons(boolean include) {
        return new ReportOptions(helpUriBase, baselineInForce, junitFailAt, revision, branch, repositoryUri, include);
    }
}
