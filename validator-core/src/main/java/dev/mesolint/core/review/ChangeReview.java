package dev.mesolint.core.review;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.git.GitRevisions;
import dev.mesolint.core.git.PathChange;
import dev.mesolint.core.git.Revision;
import dev.mesolint.core.rule.RuleDefinition;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * Reviews a change: reads both revisions from git, checks each with its own configuration, pairs the programmes
 * (following renames and moves) and compares figures, limits and findings. The one entry point the command line and
 * the Maven plugin call for {@code diff} and for checks that count only new findings.
 */
public final class ChangeReview {
    private ChangeReview() {
    }

    public static Review run(ReviewRequest request, List<RuleDefinition> rules) throws ConfigProblem {
        Path root = request.options().root();
        for (Path input : request.inputs()) {
            if (!input.toAbsolutePath().normalize().startsWith(root)) {
                throw new ConfigProblem(input.toString(), null, "this path is outside the repository root " + root
                        + ", so it has no history to compare", "name programme files or folders inside the root");
            }
        }
        try (GitRevisions git = GitRevisions.open(root)) {
            Optional<Revision> head = request.head().isPresent()
                    ? Optional.of(git.resolve(request.head().get())) : Optional.empty();
            Revision base = request.base().isPresent() ? git.resolve(request.base().get())
                    : git.defaultBase(head).orElseThrow(() -> new ConfigProblem("the git history", null,
                            "no base revision was named, and no default branch (origin/HEAD, main or master) "
                                    + "shares history with the head",
                            "name the revision to compare with, e.g. origin/main or HEAD~1"));
            List<PathChange> changes = git.changes(base, head);
            try (Snapshot baseFiles = Snapshot.of(git, base);
                    Snapshot headFiles = head.isPresent() ? Snapshot.of(git, head.get()) : null) {
                SideCheck before = SideCheck.of(request.options(), request.inputs(), baseFiles.root(), rules,
                        "at " + base.label());
                SideCheck after = headFiles == null
                        ? SideCheck.of(request.options(), request.inputs(), root, rules, "in the work tree")
                        : SideCheck.of(request.options(), request.inputs(), headFiles.root(), rules,
                                "at " + head.get().label());
                return new Review(base, head, ProgrammePairing.compare(before, after, changes), before.report(),
                        after.report(), after.request());
            }
        }
    }
}
