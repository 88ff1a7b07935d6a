package dev.mesolint.core.model.protocol;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.format.CatalogueReader;
import dev.mesolint.core.format.FormatSchema;
import dev.mesolint.core.format.ProgrammeBinder;
import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import dev.mesolint.core.yaml.YamlProblem;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntFunction;

/**
 * One study arm written as a programme of the invented Harbourside Strength Club, in the programme format, read by
 * the same reader and binder as any file and computed with the built-in catalogue and the default parameters.
 */
public final class ProtocolProgramme {
    private static final LocatedYamlReader READER = new LocatedYamlReader(YamlLimits.DEFAULTS);
    static final Catalogue CATALOGUE = new CatalogueReader(READER, FormatSchema.load(FormatSchema.CATALOGUE)).builtIn();

    private final String yaml;

    private ProtocolProgramme(String yaml) {
        this.yaml = yaml;
    }

    /** A block of {@code weeks} weeks; {@code week} gives each week's sessions (1-based week number). */
    public static ProtocolProgramme block(int weeks, IntFunction<List<String>> week) {
        StringBuilder text = new StringBuilder("""
                format: 1
                programme:
                  id: harbour-protocol-arm
                  title: Harbourside study arm
                  author: Harbourside Strength Club coaching team
                  level: intermediate
                  goal: hypertrophy
                  units: kg
                weeks:
                """);
        for (int w = 1; w <= weeks; w++) {
            text.append("  - week: ").append(w).append("\n    sessions:\n");
            week.apply(w).forEach(s -> text.append(s.indent(6)));
        }
        return new ProtocolProgramme(text.toString());
    }

    /** The same sessions every week. */
    public static ProtocolProgramme weekly(int weeks, String... sessions) {
        return block(weeks, w -> List.of(sessions));
    }

    /** A session on {@code day} with its work items (each from {@link #ex} or {@link #superset}). */
    public static String session(int day, String... work) {
        StringBuilder s = new StringBuilder("- day: " + day + "\n  name: Session " + day + "\n  work:\n");
        for (String item : work) {
            s.append(item.indent(4));
        }
        return s.toString();
    }

    /** An exercise entry: {@code fields} is the rest of its flow mapping, for instance {@code "reps: 8, rir: 1"}. */
    public static String ex(String exercise, int sets, String fields) {
        return "- {exercise: " + exercise + ", sets: " + sets + ", " + fields + "}";
    }

    /** A superset of {@code rounds} rounds with {@code rest} after each; items are flow-mapping bodies. */
    public static String superset(int rounds, String rest, String... items) {
        StringBuilder s = new StringBuilder("- superset:\n    rounds: " + rounds + "\n    rest: " + rest
                + "\n    items:\n");
        for (String item : items) {
            s.append("      - {").append(item).append("}\n");
        }
        return s.toString();
    }

    /** The sessions of days {@code days}, each holding {@code work}. */
    public static List<String> onDays(int[] days, String... work) {
        List<String> sessions = new ArrayList<>();
        for (int day : days) {
            sessions.add(session(day, work));
        }
        return sessions;
    }

    public ProgrammeMetrics metrics() {
        return ProgrammeMetrics.compute(programme(), CATALOGUE, ModelParameters.defaults());
    }

    /** The muscle's weekly stimulus added up over the block: the model's figure for the arm's growth. */
    public double blockStimulus(Muscle muscle) {
        return metrics().weeks().stream()
                .mapToDouble(w -> w.muscles().containsKey(muscle) ? w.muscles().get(muscle).stimulus() : 0)
                .sum();
    }

    /** Mean weekly stimulus. */
    public double weeklyStimulus(Muscle muscle) {
        List<WeekMetrics> weeks = metrics().weeks();
        return blockStimulus(muscle) / weeks.size();
    }

    private Programme programme() {
        try {
            ProgrammeBinder.Result r = new ProgrammeBinder().bind(READER.read(yaml));
            if (r.programme().isEmpty() || !r.violations().isEmpty()) {
                throw new IllegalStateException("protocol programme does not bind: " + r.violations() + "\n" + yaml);
            }
            return r.programme().get();
        } catch (YamlProblem e) {
            throw new IllegalStateException("protocol programme is not YAML: " + e.getMessage() + "\n" + yaml, e);
        }
    }

    @Override
    public String toString() {
        return yaml;
    }
}
