package dev.mesolint.core.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Writes small text files for tests. */
public final class TempFiles {
    private TempFiles() {
    }

    /** Writes {@code text} to {@code folder/name}, creating folders; returns the file. */
    public static Path write(Path folder, String name, String text) {
        try {
            Path file = folder.resolve(name);
            Files.createDirectories(file.getParent());
            Files.writeString(file, text, StandardCharsets.UTF_8);
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
