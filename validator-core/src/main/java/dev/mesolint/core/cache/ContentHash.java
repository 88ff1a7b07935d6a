package dev.mesolint.core.cache;

import dev.mesolint.core.source.ReadLog;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** SHA-256 of file contents and of text, as lower-case hex. */
public final class ContentHash {
    private ContentHash() {
    }

    public static String of(byte[] bytes) {
        return ReadLog.sha256(bytes);
    }

    public static String of(String text) {
        return of(text.getBytes(StandardCharsets.UTF_8));
    }

    /** The hash of a file's bytes; throws when the file cannot be read. */
    public static String ofFile(Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        ReadLog.record(file, bytes);
        return of(bytes);
    }
}
