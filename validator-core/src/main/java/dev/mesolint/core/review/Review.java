package dev.mesolint.core.review;

import dev.mesolint.core.engine.CheckRequest;
import dev.mesolint.core.engine.RunReport;
import dev.mesolint.core.git.Revision;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A change reviewed: both revisions checked and every programme under the inputs compared.
 *
 * @param head       the head revision; empty for the work tree (uncommitted changes included)
 * @param programmes every programme at either revision, in path order, changed or not
 * @param before     the check of the base revision
 * @param after      the check of the head
 * @param afterRequest how the head was checked (its configuration and profiles), for the head's reports
 */
public record Review(Revision base, Optional<Revision> head, List<ProgrammeChange> programmes, RunReport before,
        RunReport after, CheckRequest afterRequest) {

    public Review {
        Objects.requireNonNull(base, "base");
        programmes = List.copyOf(programmes);
    }

    /** {@code work tree}, or the head revision's label. */
    public String headLabel() {
        return head.map(Revision::label).orElse("the work tree");
    }

    /** The programmes with something to show. */
    public List<ProgrammeChange> changed() {
        return programmes.stream().filter(ProgrammeChange::changed).toList();
    }

    public long count(ProgrammeChange.Status status) {
        return programmes.stream().filter(p -> p.status() == status).count();
    }

    public int introducedCount() {
        return programmes.stream().mapToInt(p -> p.findings().introduced().size()).sum();
    }

    public int resolvedCount() {
        return programmes.stream().mapToInt(p -> p.findings().resolved().size()).sum();
    }

    public int unchangedCount() {
        return programmes.stream().mapToInt(p -> p.findings().unchanged().size()).sum();
    }

    /** Limits the change moves figures out of. */
    public long limitsBroken() {
        return programmes.stream().flatMap(p -> p.limits().stream()).filter(l -> l.kind().worse()).count();
    }
}
