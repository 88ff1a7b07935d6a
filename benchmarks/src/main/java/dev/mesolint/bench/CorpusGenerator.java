package dev.mesolint.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Writes the benchmark corpora, the same bytes on every run (fixed seeds, sorted templates):
 * <ul>
 *   <li>{@code clean COUNT TEMPLATE_DIR...}: copies of sound programmes, each with its own programme id;</li>
 *   <li>{@code heavy COUNT}: random programmes from the built-in catalogue's ids, with many findings (short rests,
 *       far-from-failure and missing efforts, volume jumps, long sessions);</li>
 *   <li>{@code large}: one programme of 16 weeks, 6 sessions a week, 10 exercises a session;</li>
 * </ul>
 * Usage: {@code java -cp benchmarks.jar dev.mesolint.bench.CorpusGenerator OUT_DIR KIND [COUNT] [TEMPLATE_DIR...]}.
 * The programmes are invented test data in the fictional Harbourside Strength Club scenario.
 */
public final class CorpusGenerator {
    private static final Pattern PROGRAMME_ID = Pattern.compile("(?m)^(  id: )(\\S+)\\s*$");
    private static final String CAUTION = "# Generated benchmark data (fictional Harbourside Strength Club); not training advice.\n";

    /** Catalogue ids of the built-in catalogue, chosen to cover compound and isolation work. */
    private static final List<String> EXERCISES = List.of("barbell-back-squat", "barbell-front-squat",
            "machine-leg-press", "barbell-deadlift", "barbell-romanian-deadlift", "trap-bar-deadlift",
            "dumbbell-bulgarian-split-squat", "barbell-bench-press", "dumbbell-incline-bench-press",
            "machine-chest-press", "cable-chest-fly", "parallel-bar-dip", "barbell-overhead-press",
            "seated-dumbbell-shoulder-press", "barbell-bent-over-row", "chest-supported-dumbbell-row",
            "seated-cable-row", "cable-lat-pulldown", "pull-up", "chin-up", "barbell-curl", "dumbbell-hammer-curl",
            "cable-triceps-pushdown", "dumbbell-overhead-triceps-extension", "machine-leg-extension",
            "machine-seated-leg-curl", "barbell-hip-thrust", "machine-standing-calf-raise",
            "dumbbell-lateral-raise", "cable-face-pull", "cable-crunch", "hanging-leg-raise",
            "balance-dome-squat", "power-clean");

    private CorpusGenerator() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length < 2) {
            System.err.println("usage: CorpusGenerator OUT_DIR clean|heavy|large [COUNT] [TEMPLATE_DIR...]");
            System.exit(2);
        }
        Path out = Path.of(args[0]);
        Files.createDirectories(out);
        switch (args[1]) {
            case "clean" -> clean(out, Integer.parseInt(args[2]), List.of(args).subList(3, args.length));
            case "heavy" -> heavy(out, Integer.parseInt(args[2]));
            case "large" -> write(out.resolve("large.yaml"), randomProgramme("bench-large", new Random(7), 16, 6, 10));
            default -> {
                System.err.println("unknown corpus kind: " + args[1]);
                System.exit(2);
            }
        }
    }

    private static void clean(Path out, int count, List<String> templateDirs) throws IOException {
        List<Path> templates = ParseFloor.YamlFiles.under(templateDirs);
        if (templates.isEmpty()) {
            throw new IllegalArgumentException("no templates under " + templateDirs);
        }
        List<String> texts = new ArrayList<>();
        for (Path t : templates) {
            texts.add(Files.readString(t, StandardCharsets.UTF_8));
        }
        for (int i = 0; i < count; i++) {
            String text = texts.get(i % texts.size());
            String name = stem(templates.get(i % templates.size())) + "-" + i;
            Matcher m = PROGRAMME_ID.matcher(text);
            String renamed = m.find() ? m.replaceFirst("$1" + Matcher.quoteReplacement(m.group(2) + "-" + i)) : text;
            write(out.resolve(name + ".yaml"), renamed);
        }
    }

    private static void heavy(Path out, int count) throws IOException {
        Random random = new Random(42);
        for (int i = 0; i < count; i++) {
            int weeks = 3 + random.nextInt(6);
            int days = 2 + random.nextInt(4);
            int exercises = 4 + random.nextInt(5);
            write(out.resolve("random-" + i + ".yaml"), randomProgramme("bench-random-" + i, random, weeks, days,
                    exercises));
        }
    }

    /** A programme in the core format; values are drawn so that many rules have something to say. */
    static String randomProgramme(String id, Random random, int weeks, int days, int exercises) {
        StringBuilder b = new StringBuilder(CAUTION);
        b.append("format: 1\nprogramme:\n  id: ").append(id).append("\n  title: Harbourside benchmark ").append(id)
                .append("\n  level: intermediate\n  goal: hypertrophy\n  session-minutes: 60\n  units: kg\nweeks:\n");
        for (int w = 1; w <= weeks; w++) {
            b.append("  - week: ").append(w).append("\n    sessions:\n");
            for (int d = 1; d <= days; d++) {
                b.append("      - day: ").append(d).append("\n        name: Session ").append(d)
                        .append("\n        work:\n");
                for (int e = 0; e < exercises; e++) {
                    String exercise = EXERCISES.get(random.nextInt(EXERCISES.size()));
                    int low = 3 + random.nextInt(14);
                    b.append("          - exercise: ").append(exercise).append('\n')
                            .append("            sets: ").append(1 + random.nextInt(6) + (w > 2 ? random.nextInt(3) : 0))
                            .append('\n')
                            .append("            reps: ").append(random.nextBoolean() ? low + "-" + (low + 2) : low)
                            .append('\n');
                    int effort = random.nextInt(10);
                    if (effort < 6) {
                        b.append("            rir: ").append(random.nextInt(7)).append('\n');
                    } else if (effort < 9) {
                        b.append("            rpe: ").append(6 + random.nextInt(9) / 2.0).append('\n');
                    }
                    b.append("            rest: ").append(30 + 15 * random.nextInt(14)).append("s\n");
                }
            }
        }
        return b.toString();
    }

    private static String stem(Path p) {
        String name = p.getFileName().toString();
        return name.substring(0, name.lastIndexOf('.'));
    }

    private static void write(Path file, String text) throws IOException {
        Files.writeString(file, text, StandardCharsets.UTF_8);
    }
}
