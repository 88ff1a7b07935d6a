package dev.mesolint.core.cache;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * A {@link Checker} run that reuses the stored findings of unchanged files. The checker (schemas, catalogue) is only
 * built when some file changed, so a run where nothing changed costs one hash per file.
 */
public final class CachedCheck {
    private final CheckRequest request;
    private final List<RuleDefinition> rules;

    /**
     * @param reused     files whose findings came from the cache
     * @param checked    files checked afresh
     * @param unreadable files that could not be read (each also has a finding saying so)
     */
    public record Outcome(RunReport report, int reused, int checked, List<Path> unreadable) {
        public Outcome {
            unreadable = List.copyOf(unreadable);
        }
    }

    public CachedCheck(CheckRequest request, List<RuleDefinition> rules) {
        this.request = request;
        this.rules = List.copyOf(rules);
    }

    /**
     * Checks every programme file of the request. {@code cache}, when present, is read and given this run's results;
     * saving it is the caller's choice ({@link ResultCache#save()}), so a cache that cannot be written never costs a
     * result.
     */
    public Outcome run(Optional<ResultCache> cache) throws IOException {
        List<Path> missing = new ArrayList<>();
        List<Path> files;
        try {
            files = ProgrammeFiles.discover(request.inputs(), missing);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        Supplier<Checker> checker = lazily(() -> new Checker(request, rules));
        List<Pending> pending = files.stream().map(f -> pending(f, cache)).toList();

        List<FileReport> reports = new ArrayList<>(cache.flatMap(ResultCache::catalogueReports)
                .orElseGet(() -> checker.get().catalogueReports()));
        reports.addAll(pending.parallelStream()
                .map(p -> p.cached().orElseGet(() -> checker.get().checkFile(p.file())))
                .toList());

        int reused = (int) pending.stream().filter(p -> p.cached().isPresent()).count();
        List<Path> unreadable = pending.stream().filter(p -> p.hash() == null).map(Pending::file).toList();
        if (cache.isPresent()) {
            ResultCache c = cache.get();
            int catalogues = reports.size() - pending.size();
            c.putCatalogueReports(reports.subList(0, catalogues));
            for (int i = 0; i < pending.size(); i++) {
                Pending p = pending.get(i);
                if (p.hash() != null) {
                    c.put(p.shown(), p.hash(), reports.get(catalogues + i));
                }
            }
        }
        RunReport report = new RunReport(reports, request.failOn(), missing.stream().map(Path::toString).toList());
        return new Outcome(report, reused, pending.size() - reused, unreadable);
    }

    /** A file to report on: its hash (null when unreadable) and the cached report when still valid. */
    private record Pending(Path file, String shown, String hash, Optional<FileReport> cached) {
    }

    private Pending pending(Path file, Optional<ResultCache> cache) {
        String shown = ProgrammeFiles.display(request.root(), file);
        String hash;
        try {
            hash = ContentHash.ofFile(file);
        } catch (IOException e) {
            return new Pending(file, shown, null, Optional.empty());
        }
        return new Pending(file, shown, hash, cache.flatMap(c -> c.lookup(shown, hash)));
    }

    private static <T> Supplier<T> lazily(Supplier<T> make) {
        return new Supplier<>() {
            private T value;

            @Override
            public synchronized T get() {
                if (value == null) {
                    value = make.get();
                }
                return value;
            }
        };
    }
}
