package dev.mesolint.core.cache;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.Checker;
import dev.mesolint.core.engine.DuplicateProgrammeIds;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.ProgrammeFiles;
import dev.mesolint.core.engine.RunProgress;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.source.SafeFiles;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.atomic.AtomicInteger;
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
        return run(cache, RunProgress.NONE);
    }

    /** As {@link #run(Optional)}, telling {@code progress} after each programme file, reused or checked. */
    public Outcome run(Optional<ResultCache> cache, RunProgress progress) throws IOException {
        ProgrammeFiles.Discovery found = ProgrammeFiles.find(request.root(), request.inputs(),
                request.ownFiles());
        List<Path> files = found.programmes();
        Supplier<Checker> checker = lazily(() -> new Checker(request, rules));
        List<FileReport> reports = new ArrayList<>(cache.flatMap(ResultCache::catalogueReports)
                .orElseGet(() -> checker.get().catalogueReports()));
        int catalogues = reports.size();
        // Each file is read once, in parallel; with a cache, its bytes are hashed and parsed only when the cache has
        // no result.
        AtomicInteger done = new AtomicInteger();
        AtomicInteger findings = new AtomicInteger();
        List<Pending> pending = files.parallelStream().map(f -> {
            Pending p = pending(f, cache, checker);
            progress.fileChecked(done.incrementAndGet(), files.size(), findings.addAndGet(p.report().findings()
                    .size()));
            return p;
        }).toList();
        pending.forEach(p -> reports.add(p.report()));

        int reused = (int) pending.stream().filter(Pending::reused).count();
        List<Path> unreadable = pending.stream().filter(p -> !p.readable()).map(Pending::file).toList();
        if (cache.isPresent()) {
            ResultCache c = cache.get();
            c.putCatalogueReports(reports.subList(0, catalogues));
            for (int i = 0; i < pending.size(); i++) {
                Pending p = pending.get(i);
                if (p.hash() != null) {
                    c.put(p.shown(), p.hash(), reports.get(catalogues + i));
                }
            }
        }
        // Ids are compared across all files, cached or not, after the cache has stored each file's own findings.
        List<FileReport> marked = DuplicateProgrammeIds.mark(reports, Severity.ERROR);
        List<FileReport> refused = found.refused().isEmpty() ? List.of() : checker.get().refusedReports(found);
        RunReport report = RunReport.of(marked, request.failOn(), found, refused, request.root());
        return new Outcome(report, reused, pending.size() - reused, unreadable);
    }

    /**
     * A file's report, whether it could be read, its hash (null when unreadable or when no cache is used: hashing
     * costs a tenth of a check), and whether the report came from the cache.
     */
    private record Pending(Path file, String shown, boolean readable, String hash, FileReport report, boolean reused) {
    }

    private Pending pending(Path file, Optional<ResultCache> cache, Supplier<Checker> checker) {
        String shown = ProgrammeFiles.display(request.root(), file);
        byte[] content;
        try {
            content = SafeFiles.readRegular(file, request.limits().maxFileBytes());
        } catch (IOException e) {
            return new Pending(file, shown, false, null, checker.get().checkFile(file), false);
        }
        String hash = cache.isPresent() ? ContentHash.of(content) : null;
        Optional<FileReport> cached = cache.flatMap(c -> c.lookup(shown, hash));
        return cached.map(r -> new Pending(file, shown, true, hash, r, true))
                .orElseGet(() -> new Pending(file, shown, true, hash, checked(checker.get(), file, content), false));
    }

    /** A file checked afresh, kept as the request says (its figures packed for a JSON report, say). */
    private FileReport checked(Checker checker, Path file, byte[] content) {
        return request.keep().apply(checker.checkFile(file, content));
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
