package dev.mesolint.cli;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.MovementPattern;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.catalogue.Named;
import dev.mesolint.core.format.CatalogueReader;
import dev.mesolint.core.format.FormatSchema;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.PrintWriter;
import java.util.Comparator;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code mesolint catalogue}: lists the built-in exercises, so authors can find the right id. */
@Command(name = "catalogue", mixinStandardHelpOptions = true,
        description = "Lists the built-in exercise catalogue: id, kind, pattern, stability, skill and muscle credits.")
final class CatalogueCommand implements Callable<Integer> {

    @Option(names = "--pattern", paramLabel = "PATTERN", description = "Only this movement pattern, e.g. squat.")
    String pattern;

    @Option(names = "--muscle", paramLabel = "MUSCLE", description = "Only exercises that credit this muscle.")
    String muscle;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Catalogue catalogue = new CatalogueReader(new LocatedYamlReader(YamlLimits.DEFAULTS),
                FormatSchema.load(FormatSchema.CATALOGUE)).builtIn();
        MovementPattern wantedPattern = pattern == null ? null : Named.byYamlName(MovementPattern.class, pattern)
                .orElseThrow(() -> new CommandLine.ParameterException(spec.commandLine(), "unknown pattern '" + pattern
                        + "'; patterns: " + names(MovementPattern.values())));
        Muscle wantedMuscle = muscle == null ? null : Named.byYamlName(Muscle.class, muscle)
                .orElseThrow(() -> new CommandLine.ParameterException(spec.commandLine(), "unknown muscle '" + muscle
                        + "'; muscles: " + names(Muscle.values())));
        PrintWriter out = spec.commandLine().getOut();
        catalogue.entries().stream()
                .filter(e -> wantedPattern == null || e.pattern() == wantedPattern)
                .filter(e -> wantedMuscle == null || e.credit(wantedMuscle) > 0)
                .sorted(Comparator.comparing(Exercise::id))
                .forEach(e -> out.printf("%-40s %-10s %-16s %-9s %-9s %s%n", e.id(), e.kind().yamlName(),
                        e.pattern().yamlName(), e.stability().yamlName(), e.skill().yamlName(), credits(e.muscles())));
        return 0;
    }

    private static String credits(Map<Muscle, Double> muscles) {
        return muscles.entrySet().stream()
                .map(m -> m.getKey().yamlName() + " " + (m.getValue() >= 1 ? "1" : "0.5"))
                .collect(Collectors.joining(", "));
    }

    private static String names(Named[] values) {
        return java.util.Arrays.stream(values).map(Named::yamlName).collect(Collectors.joining(", "));
    }
}
