package dev.mesolint.core.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * The lines of checked files, read once per file while a report is written file by file, for snippets. A file that has changed
 * or gone since the check, or is not text, simply gives no snippet.
 */
final class SourceLines {
    /** Snippets are for a reader's eye; longer lines are cut. */
    private static final int MAX_LENGTH = 400;

    private final Path root;
    // Only the last file read: reports go file by file, and holding every file's text filled the heap on big runs.
    private String lastPath;
    private List<String> lastLines = List.of();

    SourceLines(Path root) {
        this.root = root;
    }

    /** No snippets: for findings whose files are not on disk as they were (a base revision's, say). */
    static SourceLines none() {
        return new SourceLines(null);
    }

    /** A node spanning many lines is quoted by its first ones. */
    private static final int MAX_LINES = 10;

    /**
     * Lines {@code first} to {@code last} (1-based, inclusive) of the file shown as {@code shownPath} (relative to
     * the root, or absolute), joined by newlines.
     */
    Optional<String> lines(String shownPath, int first, int last) {
        if (!shownPath.equals(lastPath)) {
            lastLines = read(shownPath);
            lastPath = shownPath;
        }
        List<String> lines = lastLines;
        if (first < 1 || first > lines.size()) {
            return Optional.empty();
        }
        int end = Math.min(Math.min(Math.max(first, last), lines.size()), first + MAX_LINES - 1);
        StringBuilder text = new StringBuilder();
        for (int i = first; i <= end; i++) {
            String line = lines.get(i - 1);
            text.append(i > first ? "\n" : "").append(line.length() > MAX_LENGTH ? line.substring(0, MAX_LENGTH)
                    : line);
        }
        return Optional.of(text.toString());
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
