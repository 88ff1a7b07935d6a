package dev.mesolint.core.report;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Writes reports to files, creating their folders; shared by the CLI and the Maven plugin. */
public final class ReportFiles {
    private ReportFiles() {
    }

    /** Writes {@code input} in the target's format to the target's path (UTF-8), replacing any earlier file. */
    public static void write(ReportInput input, ReportTarget target) throws IOException {
        write(input, target.path(), target.format().writer(target.path().toAbsolutePath()));
    }

    /** Writes {@code input} with {@code writer} to {@code file} (UTF-8), replacing any earlier file. */
    public static void write(ReportInput input, Path file, ReportWriter writer) throws IOException {
        Path path = file.toAbsolutePath();
        if (path.getParent() != null) {
            Files.createDirectories(path.getParent());
        }
        try (Writer out = Files.newBufferedWriter(path, StandardCharsets.UTF_8)) {
            writer.write(input, out);
        }
    }
}
