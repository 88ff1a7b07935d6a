package dev.mesolint.core.review;

import dev.mesolint.core.engine.RunOptions;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What to review: the repository as a front end was told about it, the programme files and folders to compare (the
 * root when none), and the two revisions.
 *
 * @param base the revision to compare with; empty for the merge base with the default branch
 * @param head the revision to review; empty for the work tree
 */
public record ReviewRequest(RunOptions options, List<Path> inputs, Optional<String> base, Optional<String> head) {

    public ReviewRequest {
        Objects.requireNonNull(options, "options");
        inputs = inputs.isEmpty() ? List.of(options.root()) : List.copyOf(inputs);
        Objects.requireNonNull(base, "base");
        Objects.requireNonNull(head, "head");
    }
}
