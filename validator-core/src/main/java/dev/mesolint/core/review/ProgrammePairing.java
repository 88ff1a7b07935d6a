package dev.mesolint.core.review;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.git.PathChange;
import dev.mesolint.core.report.ProgrammeFigures;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Pairs the programme files of the base and the head and compares each pair. A head file is paired with, in order:
 * the base file git saw it renamed or moved from; the base file at the same path; a base file left unpaired whose
 * programme has the same id (a move with heavy edits, which git's similarity test misses).
 */
final class ProgrammePairing {
    private ProgrammePairing() {
    }

    static List<ProgrammeChange> compare(SideCheck before, SideCheck after, List<PathChange> changes) {
        Map<String, FileReport> base = byPath(before);
        Map<String, FileReport> head = byPath(after);
        Map<String, String> renamedFrom = new HashMap<>();
        Set<String> touched = new HashSet<>();
        for (PathChange c : changes) {
            c.after().ifPresent(touched::add);
            if (c.kind() == PathChange.Kind.RENAMED) {
                renamedFrom.put(c.after().orElseThrow(), c.before().orElseThrow());
            }
        }
        Set<String> used = new HashSet<>();
        List<ProgrammeChange> result = new ArrayList<>();
        List<FileReport> unpaired = new ArrayList<>();
        for (FileReport h : head.values()) {
            String from = renamedFrom.get(h.displayPath());
            if (from != null && base.containsKey(from) && used.add(from)) {
                result.add(pair(ProgrammeChange.Status.RENAMED, base.get(from), h, before, after));
            } else if (base.containsKey(h.displayPath()) && used.add(h.displayPath())) {
                result.add(pair(touched.contains(h.displayPath()) ? ProgrammeChange.Status.EDITED
                        : ProgrammeChange.Status.UNCHANGED, base.get(h.displayPath()), h, before, after));
            } else {
                unpaired.add(h);
            }
        }
        for (FileReport h : unpaired) {
            Optional<FileReport> moved = id(h).flatMap(id -> base.values().stream()
                    .filter(b -> !used.contains(b.displayPath()) && id(b).equals(Optional.of(id))).findFirst());
            if (moved.isPresent()) {
                used.add(moved.get().displayPath());
                result.add(pair(ProgrammeChange.Status.RENAMED, moved.get(), h, before, after));
            } else {
                result.add(one(ProgrammeChange.Status.ADDED, h, FindingChanges.match(List.of(), h.findings(),
                        h.displayPath())));
            }
        }
        for (FileReport b : base.values()) {
            if (!used.contains(b.displayPath())) {
                result.add(one(ProgrammeChange.Status.REMOVED, b, FindingChanges.match(b.findings(), List.of(),
                        b.displayPath())));
            }
        }
        result.sort(Comparator.comparing(ProgrammeChange::path));
        return result;
    }

    private static Map<String, FileReport> byPath(SideCheck side) {
        Map<String, FileReport> files = new LinkedHashMap<>();
        side.report().files().forEach(f -> files.put(f.displayPath(), f));
        return files;
    }

    private static Optional<String> id(FileReport file) {
        return file.programme().map(p -> p.info().id());
    }

    private static ProgrammeChange pair(ProgrammeChange.Status status, FileReport b, FileReport h, SideCheck before,
            SideCheck after) {
        FigureChanges figures = FigureChanges.NONE;
        List<LimitCrossing> limits = List.of();
        if (b.metrics().isPresent() && h.metrics().isPresent()) {
            figures = FigureChanges.between(b.metrics().get(), h.metrics().get());
            Optional<ProgrammeFigures> fb = before.figures().of(b);
            Optional<ProgrammeFigures> fh = after.figures().of(h);
            if (fb.isPresent() && fh.isPresent()) {
                limits = LimitCrossings.between(b.metrics().get(), fb.get(), h.metrics().get(), fh.get());
            }
        }
        return new ProgrammeChange(status, Optional.of(b.displayPath()), Optional.of(h.displayPath()),
                id(h).or(() -> id(b)), Optional.of(b.profile()), Optional.of(h.profile()), b.programme().isPresent(),
                h.programme().isPresent(), units(h).or(() -> units(b)), figures, limits,
                FindingChanges.match(b.findings(), h.findings(), h.displayPath()));
    }

    private static ProgrammeChange one(ProgrammeChange.Status status, FileReport file, FindingChanges findings) {
        boolean added = status == ProgrammeChange.Status.ADDED;
        Optional<String> path = Optional.of(file.displayPath());
        Optional<String> profile = Optional.of(file.profile());
        boolean loaded = file.programme().isPresent();
        return new ProgrammeChange(status, added ? Optional.empty() : path, added ? path : Optional.empty(), id(file),
                added ? Optional.empty() : profile, added ? profile : Optional.empty(), !added && loaded,
                added && loaded, units(file), FigureChanges.NONE, List.of(), findings);
    }

    private static Optional<String> units(FileReport file) {
        return file.metrics().map(m -> m.units().symbol());
    }
}
