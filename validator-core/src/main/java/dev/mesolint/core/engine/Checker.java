package dev.mesolint.core.engine;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.CatalogueFile;
import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.format.CatalogueReader;
import dev.mesolint.core.format.FormatSchema;
import dev.mesolint.core.format.ProgrammeBinder;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.rule.FileScope;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlProblem;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Checks programme files: read safely, validate against the schema, bind, expand weeks, run the rules.
 *
 * <p>Built once per run (the schemas are compiled and the catalogue read here), then thread-safe: files are checked
 * in parallel, each in its own {@link FileScope}. A file that fails in any way is reported and never stops the others.
 */
public final class Checker {
    private final CheckRequest request;
    private final LocatedYamlReader reader;
    private final FormatSchema programmeSchema;
    private final Catalogue catalogue;
    private final List<FileReport> catalogueReports;
    private final List<RuleDefinition> rules;
    private final OwnFileCheck ownFiles;
    private final RuleRunner runner;

    public Checker(CheckRequest request, List<RuleDefinition> rules) {
        this.request = request;
        this.rules = List.copyOf(rules);
        this.reader = new LocatedYamlReader(request.limits());
        // The catalogue's schema only when a catalogue text is read: the built-in catalogue comes from its pack.
        CatalogueReader catalogues = new CatalogueReader(reader, () -> FormatSchema.load(FormatSchema.CATALOGUE));
        this.programmeSchema = FormatSchema.load(FormatSchema.PROGRAMME);
        Catalogue combined = catalogues.builtIn();
        List<FileReport> problems = new ArrayList<>();
        for (Path extra : request.extraCatalogues()) {
            String shown = ProgrammeFiles.display(request.root(), extra);
            CatalogueFile file = catalogues.read(extra, shown);
            if (file.ok()) {
                combined = combined.overlay(file.entries());
            } else {
                problems.add(violationReport(shown, null, file.ruleId(), file.violations()));
            }
        }
        this.catalogue = combined;
        this.catalogueReports = List.copyOf(problems);
        this.ownFiles = new OwnFileCheck(catalogues, this.rules, request.root());
        this.runner = new RuleRunner(this.rules, request.configuration());
    }

    public Catalogue catalogue() {
        return catalogue;
    }

    /** The findings on the request's extra catalogue files (files that did not load), one report per bad file. */
    public List<FileReport> catalogueReports() {
        return catalogueReports;
    }

    /** Checks every programme file found under {@code request.inputs()}. */
    public RunReport run() {
        return run(RunProgress.NONE);
    }

    /** Checks every programme file found under {@code request.inputs()}, telling {@code progress} after each file. */
    public RunReport run(RunProgress progress) {
        ProgrammeFiles.Discovery found = discover();
        List<FileReport> reports = new ArrayList<>(catalogueReports);
        int total = found.programmes().size();
        AtomicInteger done = new AtomicInteger();
        AtomicInteger findings = new AtomicInteger();
        reports.addAll(found.programmes().parallelStream().map(file -> {
            FileReport report = checkFile(file);
            int seen = findings.addAndGet(report.findings().size());
            progress.fileChecked(done.incrementAndGet(), total, seen);
            return report;
        }).toList());
        return RunReport.of(reports, request.failOn(), found, refusedReports(found), request.root());
    }

    /** The programme files of the request, and the entries that cannot be read as programmes. */
    public ProgrammeFiles.Discovery discover() {
        return ProgrammeFiles.find(request.root(), request.inputs(), request.ownFiles());
    }

    /** One report per entry that should have been a programme but cannot be read as one: never dropped silently. */
    public List<FileReport> refusedReports(ProgrammeFiles.Discovery found) {
        return found.refused().stream()
                .map(r -> violationReport(ProgrammeFiles.display(request.root(), r.path()), null, FrameworkRules.YAML_SYNTAX,
                        List.of(new Violation(Location.START, r.reason(), r.hint()))))
                .toList();
    }

    /** Checks one document read elsewhere (standard input), shown and configured as if it were {@code shownAs}. */
    public RunReport run(Path shownAs, byte[] content) {
        List<FileReport> reports = new ArrayList<>(catalogueReports);
        reports.add(checkSafely(shownAs, null, () -> reader.read(content)));
        return new RunReport(reports, request.failOn(), List.of());
    }

    /** Checks one programme file; any failure becomes a finding on that file, never an exception. */
    public FileReport checkFile(Path file) {
        return checkSafely(file, () -> ConfigDocument.read(file, ProgrammeFiles.display(request.root(), file)),
                () -> reader.read(file));
    }

    /** Checks a programme file whose content the caller has already read (to hash it, say): no second read. */
    public FileReport checkFile(Path file, byte[] content) {
        return checkSafely(file, () -> ConfigDocument.read(content, ProgrammeFiles.display(request.root(), file)),
                () -> reader.read(content));
    }

    /** @param config the file as a configuration document, or null when it cannot be one of mesolint's own files */
    private FileReport checkSafely(Path file, OwnFileCheck.ConfigSource config, DocumentSource source) {
        String shown = ProgrammeFiles.display(request.root(), file);
        long started = System.nanoTime();
        try {
            FileReport report = check(file, config, source, shown);
            return report.withTiming(new FileTiming(Duration.ofNanos(System.nanoTime() - started),
                    report.timing().perRule()));
        } catch (RuntimeException | StackOverflowError e) {
            String cause = e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage());
            return violationReport(shown, null, FrameworkRules.INTERNAL_ERROR, List.of(new Violation(Location.START,
                    "mesolint failed while checking this file (" + cause + ")",
                    "please report this with the file attached; the other files were checked")));
        }
    }

    /** Where a file's document comes from: read from disk, or parsed from bytes already read. */
    @FunctionalInterface
    private interface DocumentSource {
        LocatedDocument read() throws IOException, YamlProblem;
    }

    private FileReport check(Path file, OwnFileCheck.ConfigSource config, DocumentSource source, String shown) {
        LocatedDocument document;
        try {
            document = source.read();
        } catch (YamlProblem e) {
            return violationReport(shown, null, FrameworkRules.YAML_SYNTAX,
                    List.of(new Violation(e.location(), e.getMessage(), e.hint())));
        } catch (IOException e) {
            return violationReport(shown, null, FrameworkRules.YAML_SYNTAX,
                    List.of(new Violation(Location.START, "cannot read the file: " + e.getMessage(),
                            "check that the file exists and is readable")));
        }
        Optional<OwnFileKind> own = config == null ? Optional.empty() : OwnFileKind.of(file, document.root());
        if (own.isPresent()) {
            OwnFileCheck.Problems problems = ownFiles.check(own.get(), file, document, shown, config);
            FileReport report = violationReport(shown, null, problems.ruleId(), problems.violations());
            return FileReport.ownFile(shown, report.profile(), report.findings(), own.get());
        }
        List<Violation> violations = programmeSchema.validate(document);
        if (!violations.isEmpty()) {
            return violationReport(shown, null, FrameworkRules.SCHEMA, violations);
        }
        ProgrammeBinder.Result bound = new ProgrammeBinder().bind(document);
        if (bound.programme().isEmpty()) {
            return violationReport(shown, null, FrameworkRules.SCHEMA, bound.violations());
        }
        Programme programme = bound.programme().get();
        String profile = request.configuration().profileFor(shown, programme);
        Catalogue fileCatalogue = catalogue.overlay(programme.localExercises());
        // The figures every rule and report reads: computed once per programme.
        ProgrammeMetrics metrics = ProgrammeMetrics.compute(programme, fileCatalogue,
                request.configuration().modelParameters(profile));
        FileScope scope = new FileScope(shown, programme, fileCatalogue, document, profile, metrics);
        Map<String, Duration> ruleTimes = runner.run(scope);
        ProgrammeIdentity identity = new ProgrammeIdentity(programme.info().id(), document.valueAt("/programme/id"));
        // The model is kept only for the reports that show it: held for every file to the end of a run, it is what
        // fills the heap (about 25 KB a programme); the identity says the file loaded.
        return new FileReport(shown, request.keepFigures() ? Optional.of(programme) : Optional.empty(), profile,
                scope.findings(), request.keepFigures() ? Optional.of(metrics) : Optional.empty(),
                new FileTiming(Duration.ZERO, ruleTimes), Optional.of(identity));
    }

    private FileReport violationReport(String shown, Programme programme, String ruleId, List<Violation> violations) {
        String profile = request.configuration().profileFor(shown, programme);
        RuleDefinition rule = rules.stream().filter(r -> r.id().equals(ruleId)).findFirst()
                .orElseThrow(() -> new IllegalStateException("rule " + ruleId + " is not registered"));
        RuleSettings settings = request.configuration().settingsFor(profile, rule);
        List<Finding> findings = violations.stream()
                .map(v -> new Finding(ruleId, settings.severity(), shown, v.location(), v.message(), v.hint(),
                        Optional.empty()))
                .toList();
        return new FileReport(shown, Optional.ofNullable(programme), profile, findings, Optional.empty());
    }

    /**
     * Runs the programme rules of one file in a fixed order, then reports unused waivers. Built once per run: the
     * rules that are on under a profile, with their settings, are worked out on the profile's first file.
     */
    private static final class RuleRunner {
        /** A rule that is on under a profile, with its settings there. */
        private record Configured(Rule rule, RuleSettings settings) {
        }

        private final List<RuleDefinition> rules;
        private final RuleConfiguration configuration;
        private final WaiverAudit waiverAudit;
        private final Map<String, List<Configured>> byProfile = new ConcurrentHashMap<>();

        RuleRunner(List<RuleDefinition> rules, RuleConfiguration configuration) {
            this.rules = rules;
            this.configuration = configuration;
            this.waiverAudit = new WaiverAudit(rules, configuration);
        }

        /** Runs the rules; returns the time each took, for reports. */
        Map<String, Duration> run(FileScope scope) {
            List<Configured> active = byProfile.computeIfAbsent(scope.profileName(), this::active);
            Map<String, Duration> times = new HashMap<>();
            for (Configured c : active) {
                long started = System.nanoTime();
                c.rule().check(new RuleContext(scope, c.rule().metadata(), c.settings()));
                times.put(c.rule().id(), Duration.ofNanos(System.nanoTime() - started));
            }
            waiverAudit.report(scope);
            return times;
        }

        private List<Configured> active(String profile) {
            List<Configured> active = new ArrayList<>();
            for (RuleDefinition definition : rules) {
                if (definition instanceof Rule rule) {
                    RuleSettings settings = configuration.settingsFor(profile, rule);
                    if (settings.severity() != Severity.OFF) {
                        active.add(new Configured(rule, settings));
                    }
                }
            }
            return List.copyOf(active);
        }
    }
}
