package dev.mesolint.bench;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.InstalledRules;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.engine.RunOptions;
import dev.mesolint.core.engine.Workspace;
import dev.mesolint.core.format.FormatSchema;
import dev.mesolint.core.format.ProgrammeBinder;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.LocatedYamlReader;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

/**
 * What each phase of a check costs per file next to the parse floor, in one JVM on one thread: the CPU time of
 * reading and composing with SnakeYAML (the floor), reading into the located tree, schema validation, binding, the
 * training model and the whole check of a file (rules = whole check minus the phases before it). Medians of
 * interleaved rounds after warm-up rounds, so the figures are steady-state costs with the JIT done; the whole-process
 * figures, start-up included, are {@code benchmarks/run.sh}'s.
 *
 * <p>Usage: {@code java -cp cli-all.jar:benchmarks.jar dev.mesolint.bench.PhaseCosts [--rounds N] DIR}. The folder
 * is checked as a repository root (its {@code .mesolint.yaml}, if any, applies); files that do not load are
 * measured for the phases they reach.
 */
public final class PhaseCosts {
    private static final String[] PHASES = {"floor: read + compose", "read to located tree", "schema validation",
        "binding", "training model", "rules (check - phases)", "whole check of a file"};

    private PhaseCosts() {
    }

    public static void main(String[] args) throws Exception {
        int rounds = 7;
        int first = 0;
        if (args.length > 1 && args[0].equals("--rounds")) {
            rounds = Integer.parseInt(args[1]);
            first = 2;
        }
        if (args.length != first + 1) {
            System.err.println("usage: PhaseCosts [--rounds N] DIR");
            System.exit(2);
        }
        Path root = Path.of(args[first]).toAbsolutePath().normalize();
        List<Path> files = ParseFloor.YamlFiles.under(List.of(root.toString()));
        List<RuleDefinition> rules = InstalledRules.builtIn().rules();
        CheckRequest request = Workspace.open(RunOptions.at(root), rules).request(List.of(root));
        Checker checker = new Checker(request, rules);
        Rounds round = new Rounds(files, request, checker);
        int warmUp = 3;
        long[][] samples = new long[PHASES.length][rounds];
        for (int r = -warmUp; r < rounds; r++) {
            long[] one = round.once();
            if (r >= 0) {
                for (int p = 0; p < PHASES.length; p++) {
                    samples[p][r] = one[p];
                }
            }
        }
        double floor = median(samples[0]);
        System.out.printf("%d files, %d rounds after %d warm-up rounds, one thread, CPU time (medians)%n",
                files.size(), rounds, warmUp);
        System.out.printf("%-26s %12s %10s%n", "phase", "us per file", "x floor");
        for (int p = 0; p < PHASES.length; p++) {
            double m = median(samples[p]);
            System.out.printf("%-26s %12.1f %10.2f%n", PHASES[p], m / files.size() / 1000.0, m / floor);
        }
        System.out.println("(" + round.work + ")");
    }

    private static double median(long[] values) {
        long[] sorted = values.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2.0;
    }

    /** One round: each phase over every file, timed apart; the results feed a counter so nothing is optimised away. */
    private static final class Rounds {
        private final ThreadMXBean cpu = ManagementFactory.getThreadMXBean();
        private final List<Path> files;
        private final CheckRequest request;
        private final Checker checker;
        private final LocatedYamlReader reader;
        private final FormatSchema schema = FormatSchema.load(FormatSchema.PROGRAMME);
        private long work;

        Rounds(List<Path> files, CheckRequest request, Checker checker) {
            this.files = files;
            this.request = request;
            this.checker = checker;
            this.reader = new LocatedYamlReader(request.limits());
        }

        long[] once() throws Exception {
            long[] t = new long[PHASES.length];
            long start = now();
            for (Path f : files) {
                work += ParseFloor.compose(f);
            }
            t[0] = now() - start;

            LocatedDocument[] documents = new LocatedDocument[files.size()];
            start = now();
            for (int i = 0; i < documents.length; i++) {
                try {
                    documents[i] = reader.read(files.get(i));
                } catch (Exception e) {
                    work++;
                }
            }
            t[1] = now() - start;

            start = now();
            for (int i = 0; i < documents.length; i++) {
                if (documents[i] != null && !schema.validate(documents[i]).isEmpty()) {
                    documents[i] = null;
                }
            }
            t[2] = now() - start;

            Programme[] programmes = new Programme[documents.length];
            start = now();
            for (int i = 0; i < documents.length; i++) {
                if (documents[i] != null) {
                    programmes[i] = new ProgrammeBinder().bind(documents[i]).programme().orElse(null);
                }
            }
            t[3] = now() - start;

            Catalogue catalogue = checker.catalogue();
            start = now();
            for (int i = 0; i < programmes.length; i++) {
                Programme p = programmes[i];
                if (p != null) {
                    String profile = request.configuration().profileFor(
                            ProgrammeFiles.display(request.root(), files.get(i)), p);
                    work += ProgrammeMetrics.compute(p, catalogue, request.configuration().modelParameters(profile))
                            .weeks().size();
                }
            }
            t[4] = now() - start;
            // dropped before the whole check, so that its collections do not copy them around
            documents = null;
            programmes = null;

            start = now();
            for (Path f : files) {
                work += checker.checkFile(f).findings().size();
            }
            t[6] = now() - start;
            t[5] = t[6] - t[1] - t[2] - t[3] - t[4];
            return t;
        }

        private long now() {
            return cpu.getCurrentThreadCpuTime();
        }
    }
}
