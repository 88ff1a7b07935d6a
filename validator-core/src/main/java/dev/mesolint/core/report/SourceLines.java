package dev.mesolint.core.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The lines of checked files, read once per file while a report is written, for snippets. A file that has changed
 * or gone since the check, or is not text, simply gives no snippet.
 */
final class SourceLines {
    /** Snippets are for a reader's eye; longer lines are cut. */
    private static final int MAX_LENGTH = 400;

    private final Path root;
    private final Map<String, List<String>> files = new HashMap<>();

    SourceLines(Path root) {
        this.root = root;
    }

    /** No snippets: for findings whose files are not on disk as they were (a base revision's, say). */
    static SourceLines none() {
        return new SourceLines(null);
    }

    /** Line {@code number} (1-based) of the file shown as {@code shownPath} (relative to the root, or absolute). */
    Optional<String> line(String shownPath, int number) {
        List<String> lines = files.computeIfAbsent(shownPath, this::read);
        if (number < 1 || number > lines.size()) {
            return Optional.empty();
        }
        String text = lines.get(number - 1);
        return Optional.of(text.length() > MAX_LENGTH ? text.substring(0, MAX_LENGTH) : text);
    }

    private List<String> read(String shownPath) {
        if (root == null) {
            return List.of();
        }
        try {
            Path file = root.resolve(shownPath).normalize();
            if (!Files.isRegularFile(file) || Files.size(file) > 4L * 1024 * 1024) {
                return List.of();
            }
            return Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException | RuntimeException e) {
            return List.of();
        }
    }
}
