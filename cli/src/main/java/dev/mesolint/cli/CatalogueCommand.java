package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.MovementPattern;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.catalogue.Named;
import dev.mesolint.core.catalogue.Region;
import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.report.ConsoleReport;
import java.io.PrintWriter;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.function.Predicate;
import java.util.stream.Collectors;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code mesolint catalogue [search TEXT]}: the exercises a programme can name, the built-in ones and those of the
 * repository's catalogue files, so that authors can find the right id.
 */
@Command(name = "catalogue", mixinStandardHelpOptions = true,
        description = {"Lists the exercise catalogue: the built-in exercises and those of the repository's catalogue "
                + "files (the configuration's and --catalogue's), with id, kind, pattern, loaded regions, muscle "
                + "credits and where each entry comes from.",
            "'mesolint catalogue search TEXT' lists the entries whose id or name holds every word of TEXT."},
        footer = {"", "Exit codes: 0 listed, 2 usage or a catalogue file that does not load.", "",
            "Caution: " + Mesolint.CAUTION},
        subcommands = CatalogueCommand.Search.class)
final class CatalogueCommand implements Callable<Integer> {

    /** The filters both forms share, and the listing itself. */
    static final class Listing {
        @Option(names = "--pattern", paramLabel = "PATTERN", description = "Only this movement pattern, e.g. squat.")
        String pattern;

        @Option(names = "--muscle", paramLabel = "MUSCLE", description = "Only exercises that credit this muscle.")
        String muscle;

        @Option(names = "--region", paramLabel = "REGION",
                description = "Only exercises that load this joint or region, e.g. knee or lower-back.")
        String region;

        @Mixin
        ConfigOptions options;

        @Mixin
        ConfigOptions.Catalogues catalogues;

        int list(CommandLine commandLine, Optional<String> text) {
            Predicate<Exercise> wanted = byName(MovementPattern.class, pattern, "--pattern", commandLine,
                    (e, p) -> e.pattern() == p)
                    .and(byName(Muscle.class, muscle, "--muscle", commandLine, (e, m) -> e.credit(m) > 0))
                    .and(byName(Region.class, region, "--region", commandLine, (e, r) -> e.regions().contains(r)))
                    .and(e -> text.isEmpty() || matches(e, text.get()));
            PrintWriter out = commandLine.getOut();
            PrintWriter err = commandLine.getErr();
            Checker checker;
            try {
                InstalledRules installed = Installed.rules();
                Workspace workspace = Workspace.open(options.toRunOptions(List.of(), catalogues.files,
                        Optional.empty(), Optional.empty()), installed.rules());
                checker = new Checker(workspace.request(List.of()), installed.rules());
            } catch (ConfigProblem e) {
                return Installed.fail(e, err);
            }
            for (FileReport bad : checker.catalogueReports()) {
                bad.active().forEach(f -> err.println(ConsoleReport.line(f)));
                err.println("mesolint: catalogue " + bad.displayPath() + " did not load: its exercises are not "
                        + "listed (and are unknown to checks) until it is fixed");
            }
            Catalogue catalogue = checker.catalogue();
            List<Exercise> shown = catalogue.entries().stream().filter(wanted)
                    .sorted(Comparator.comparing(Exercise::id)).toList();
            out.printf("%-36s %-10s %-16s %-28s %-18s %s%n", "ID", "KIND", "PATTERN", "REGIONS", "FROM", "MUSCLES");
            shown.forEach(e -> out.printf("%-36s %-10s %-16s %-28s %-18s %s%n", e.id(), e.kind().yamlName(),
                    e.pattern().yamlName(), e.regions().stream().map(Region::yamlName)
                            .collect(Collectors.joining(",")), e.origin(), credits(e.muscles())));
            if (shown.isEmpty()) {
                out.println("No exercise matches" + text.map(t -> " '" + t + "'").orElse("")
                        + near(catalogue, text) + ".");
            }
            out.println();
            out.println("Caution: " + Mesolint.CAUTION);
            out.flush();
            return checker.catalogueReports().isEmpty() ? 0 : MesolintCommand.EXIT_USAGE;
        }
    }

    @Mixin
    Listing listing;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return listing.list(spec.commandLine(), Optional.empty());
    }

    /** {@code mesolint catalogue search TEXT}. */
    @Command(name = "search", mixinStandardHelpOptions = true,
            description = "Lists the catalogue entries whose id or name holds every word of TEXT "
                    + "(case does not matter): 'mesolint catalogue search bench press'.",
            footer = {"", "Caution: " + Mesolint.CAUTION})
    static final class Search implements Callable<Integer> {
        @Parameters(arity = "1..*", paramLabel = "TEXT", description = "Words to look for in ids and names.")
        List<String> words;

        @Mixin
        Listing listing;

        @CommandLine.Spec
        CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            return listing.list(spec.commandLine(), Optional.of(String.join(" ", words)));
        }
    }

    /** Every word of {@code text} appears in the id or the name (ids' hyphens count as spaces). */
    static boolean matches(Exercise e, String text) {
        String haystack = (e.id().replace('-', ' ') + " " + e.name()).toLowerCase(Locale.ROOT);
        return Arrays.stream(text.toLowerCase(Locale.ROOT).split("[\\s-]+")).filter(w -> !w.isEmpty())
                .allMatch(haystack::contains);
    }

    private static String near(Catalogue catalogue, Optional<String> text) {
        if (text.isEmpty()) {
            return "";
        }
        List<String> close = catalogue.closest(text.get().trim().replace(' ', '-'), 3);
        return close.isEmpty() ? "" : "; closest ids: " + String.join(", ", close);
    }

    /** A filter on a named value; an unknown name is a usage error that suggests the nearest one. */
    private static <T extends Enum<T> & Named> Predicate<Exercise> byName(Class<T> type, String text, String option,
            CommandLine commandLine, java.util.function.BiPredicate<Exercise, T> test) {
        if (text == null) {
            return e -> true;
        }
        T value = Named.byYamlName(type, text).orElseThrow(() -> {
            List<String> names = Arrays.stream(type.getEnumConstants()).map(Named::yamlName).toList();
            String start = text.substring(0, Math.min(3, text.length()));
            String hint = ConfigDocument.closest(text, names)
                    .or(() -> names.stream().filter(n -> n.startsWith(start)).findFirst())
                    .map(n -> "did you mean '" + n + "'? ").orElse("");
            return new CommandLine.ParameterException(commandLine, option + ": unknown value '" + text + "'; "
                    + hint + "values: " + String.join(", ", names));
        });
        return e -> test.test(e, value);
    }

    private static String credits(Map<Muscle, Double> muscles) {
        return muscles.entrySet().stream()
                .map(m -> m.getKey().yamlName() + " " + (m.getValue() >= 1 ? "1" : "0.5"))
                .collect(Collectors.joining(", "));
    }
}
