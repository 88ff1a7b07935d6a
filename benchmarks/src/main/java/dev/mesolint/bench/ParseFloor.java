package dev.mesolint.bench;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.Stream;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.constructor.SafeConstructor;
import org.yaml.snakeyaml.nodes.Node;

/**
 * The floor a check is measured against: read every YAML file under the given folders and compose it with
 * SnakeYAML's safe loader, on the given number of threads, and nothing else.
 *
 * <p>Usage: {@code java -cp benchmarks.jar dev.mesolint.bench.ParseFloor THREADS PATH...}. Prints the number of
 * files and nodes, so the work cannot be optimised away and a reader can see it did what the check does first.
 */
public final class ParseFloor {
    private ParseFloor() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length < 2) {
            System.err.println("usage: ParseFloor THREADS PATH...");
            System.exit(2);
        }
        int threads = Integer.parseInt(args[0]);
        List<Path> files = YamlFiles.under(List.of(args).subList(1, args.length));
        AtomicLong nodes = new AtomicLong();
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            pool.submit(() -> files.parallelStream().forEach(f -> nodes.addAndGet(compose(f)))).get();
        } finally {
            pool.shutdown();
        }
        System.out.println(files.size() + " files composed, " + nodes.get() + " nodes");
    }

    /** Reads and composes one file; package-visible so {@link PhaseCosts} times exactly the floor's work. */
    static long compose(Path file) {
        LoaderOptions options = new LoaderOptions();
        options.setAllowDuplicateKeys(false);
        Yaml yaml = new Yaml(new SafeConstructor(options));
        try (Reader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            Node root = yaml.compose(reader);
            return root == null ? 0 : count(root);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (RuntimeException e) {
            return 0; // a file that does not parse still cost its read and parse
        }
    }

    private static long count(Node node) {
        if (node instanceof org.yaml.snakeyaml.nodes.MappingNode m) {
            return 1 + m.getValue().stream().mapToLong(t -> count(t.getKeyNode()) + count(t.getValueNode())).sum();
        }
        if (node instanceof org.yaml.snakeyaml.nodes.SequenceNode s) {
            return 1 + s.getValue().stream().mapToLong(ParseFloor::count).sum();
        }
        return 1;
    }

    /** Every {@code *.yaml} and {@code *.yml} file under the paths, in a stable order. */
    static final class YamlFiles {
        private YamlFiles() {
        }

        static List<Path> under(List<String> paths) throws IOException {
            List<Path> all = new java.util.ArrayList<>();
            for (String p : paths) {
                try (Stream<Path> walk = Files.walk(Path.of(p))) {
                    walk.filter(Files::isRegularFile)
                            .filter(f -> f.toString().endsWith(".yaml") || f.toString().endsWith(".yml"))
                            .sorted().forEach(all::add);
                }
            }
            return all;
        }
    }
}
