package dev.mesolint.core.report;

import dev.mesolint.core.text.SafeWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * Writes reports to files, creating their folders; shared by the CLI and the Maven plugin.
 *
 * <p>Each report is written to a temporary file in the target's folder and then renamed over the target, so a reader
 * (or a second run writing the same path) never sees half a report, a failed writer leaves the old file as it was,
 * and an existing link at the target is replaced, never followed. Everything passes through a {@link SafeWriter}.
 */
public final class ReportFiles {
    private ReportFiles() {
    }

    /** Writes {@code input} in the target's format to the target's path (UTF-8), replacing any earlier file. */
    public static void write(ReportInput input, ReportTarget target) throws IOException {
        write(input, target.path(), target.format().writer(target.path().toAbsolutePath()));
    }

    /** Writes {@code input} with {@code writer} to {@code file} (UTF-8), replacing any earlier file. */
    public static void write(ReportInput input, Path file, ReportWriter writer) throws IOException {
        Path path = file.toAbsolutePath().normalize();
        Path folder = path.getParent();
        Files.createDirectories(folder);
        Path temporary = temporaryFile(folder, "." + path.getFileName() + ".");
        try {
            try (Writer out = new SafeWriter(Files.newBufferedWriter(temporary, StandardCharsets.UTF_8))) {
                writer.write(input, out);
            }
            moveIntoPlace(temporary, path);
        } finally {
            Files.deleteIfExists(temporary);
        }
    }

    /** A fresh file beside the target, readable by others like any report (a plain temp file would be private). */
    private static Path temporaryFile(Path folder, String prefix) throws IOException {
        if (folder.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            return Files.createTempFile(folder, prefix, ".part",
                    PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rw-r--r--")));
        }
        return Files.createTempFile(folder, prefix, ".part");
    }

    private static void moveIntoPlace(Path temporary, Path path) throws IOException {
        try {
            Files.move(temporary, path, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(temporary, path, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
