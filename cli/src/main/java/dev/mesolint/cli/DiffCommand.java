package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.review.ChangeReview;
import dev.mesolint.core.review.Review;
import dev.mesolint.core.review.ReviewFormat;
import dev.mesolint.core.review.ReviewInput;
import dev.mesolint.core.review.ReviewRequest;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code mesolint diff}: what a change does to the programmes, read from two revisions of the git repository. */
@Command(name = "diff", mixinStandardHelpOptions = true,
        description = {"Compares two revisions of the programme repository, read from git (no git program needed):",
            "per programme added, removed or renamed; per week and muscle the change in working sets, hard sets and",
            "stimulus; per session the minutes; per lift the top-set intensity and volume load; findings new,",
            "resolved and unchanged; the profile limits the change crosses. Prints changes only.",
            "Write a pull-request comment with --format markdown, or files with --report FORMAT=PATH, e.g.",
            "  --report markdown=target/mesolint-diff.md --report sarif=target/mesolint-diff.sarif"},
        footer = {"", "The head is the work tree (uncommitted changes included) unless --head names a revision; the",
            "base is the merge base with the default branch (origin/HEAD, main or master) unless --base names one.",
            "To fail a build only on new findings, use 'mesolint check --new-since REV'.", "",
            ConfigOptions.PRECEDENCE, "",
            "Exit codes: 0 compared, 2 usage, configuration, git or internal error.",
            "", "Caution: " + Mesolint.CAUTION})
final class DiffCommand implements Callable<Integer> {

    /** Reads {@code FORMAT=PATH} for a review output. */
    record Target(ReviewFormat format, Path path) {
    }

    static final class TargetConverter implements CommandLine.ITypeConverter<Target> {
        @Override
        public Target convert(String value) {
            int eq = value.indexOf('=');
            if (eq <= 0 || eq == value.length() - 1) {
                throw new CommandLine.TypeConversionException("a report is written FORMAT=PATH, e.g. "
                        + "markdown=target/mesolint-diff.md, not '" + value + "'");
            }
            String name = value.substring(0, eq);
            ReviewFormat format = ReviewFormat.parse(name).orElseThrow(() -> new CommandLine.TypeConversionException(
                    "unknown report format '" + name + "'; use one of " + ReviewFormat.names()));
            return new Target(format, Path.of(value.substring(eq + 1)));
        }
    }

    static final class FormatConverter implements CommandLine.ITypeConverter<ReviewFormat> {
        @Override
        public ReviewFormat convert(String value) {
            return ReviewFormat.parse(value).filter(f -> f != ReviewFormat.HTML).orElseThrow(() ->
                    new CommandLine.TypeConversionException("--format is one of console, markdown, json, sarif, "
                            + "not '" + value + "' (write HTML with --report html=PATH)"));
        }
    }

    @Parameters(arity = "0..*", paramLabel = "PATH",
            description = "Programme files or folders to compare (default: the whole root).")
    List<Path> paths = new ArrayList<>();

    @Option(names = "--base", paramLabel = "REV",
            description = "The revision to compare with: a branch, tag or commit (default: the merge base with the "
                    + "default branch).")
    String base;

    @Option(names = "--head", paramLabel = "REV",
            description = "The revision to review (default: the work tree, uncommitted changes included).")
    String head;

    @Option(names = "--format", paramLabel = "FORMAT", converter = FormatConverter.class,
            description = "What to print: console (default), markdown, json or sarif.")
    ReviewFormat format = ReviewFormat.CONSOLE;

    @Option(names = "--report", paramLabel = "FORMAT=PATH", converter = TargetConverter.class,
            description = "Also write the review to a file (repeatable). FORMAT is one of: console, markdown, json, "
                    + "sarif, html.")
    List<Target> reports = new ArrayList<>();

    @Option(names = "--show-reasons",
            description = "Keep the reasons of athlete constraints in the Markdown and console output. They are "
                    + "health data, left out by default from what may be posted where others read it.")
    boolean showReasons;

    @Mixin
    ConfigOptions options;

    @Mixin
    ConfigOptions.Catalogues catalogues;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Review review;
        List<RuleDefinition> rules;
        RunOptions run = options.toRunOptions(paths, catalogues.files, Optional.empty(), Optional.empty());
        try {
            rules = Installed.rules().rules();
            review = ChangeReview.run(new ReviewRequest(run, paths, Optional.ofNullable(base),
                    Optional.ofNullable(head)), rules);
        } catch (ConfigProblem e) {
            return Installed.fail(e, spec.commandLine().getErr());
        }
        Path root = run.root();
        ReviewInput input = new ReviewInput(review, rules, root, showReasons);
        try {
            format.writer().write(input, spec.commandLine().getOut());
            spec.commandLine().getOut().flush();
            for (Target target : reports) {
                Path file = target.path().toAbsolutePath();
                if (file.getParent() != null) {
                    Files.createDirectories(file.getParent());
                }
                try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
                    target.format().writer().write(input, out);
                }
            }
        } catch (IOException e) {
            spec.commandLine().getErr().println("mesolint: cannot write the review: " + e.getMessage());
            return MesolintCommand.EXIT_USAGE;
        }
        return 0;
    }
}
