package dev.mesolint.core.source;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * The one way mesolint reads a file it was pointed at: only regular files (a FIFO would block forever, a device
 * never ends), never more than a size cap, and, for paths from configuration, only inside the repository root after
 * every link is resolved (so a configuration cannot make mesolint read and quote a file elsewhere on the machine).
 */
public final class SafeFiles {
    private SafeFiles() {
    }

    /**
     * The real path of {@code file} (links resolved), which must lie inside the real path of {@code root}.
     *
     * @throws FileRefusedException when it resolves outside the root; {@link NoSuchFileException} when it is missing
     */
    public static Path insideRoot(Path root, Path file) throws IOException {
        Path realRoot = root.toRealPath();
        Path real;
        try {
            real = file.toRealPath();
        } catch (NoSuchFileException e) {
            if (Files.isSymbolicLink(file)) {
                throw new FileRefusedException("a link to nothing (" + Files.readSymbolicLink(file) + ")",
                        "remove the link or point it at a file inside the repository");
            }
            throw e;
        }
        if (!real.startsWith(realRoot)) {
            throw new FileRefusedException("it lies outside the repository root " + realRoot.getFileName()
                    + (real.equals(file.toAbsolutePath().normalize()) ? "" : " once its links are resolved"),
                    "keep the file inside the repository");
        }
        return real;
    }

    /** Why {@code file} (links followed) cannot be read as a text file, or null when it is a regular file. */
    public static String notRegular(Path file) {
        BasicFileAttributes attributes;
        try {
            attributes = Files.readAttributes(file, BasicFileAttributes.class);
        } catch (IOException e) {
            return Files.isSymbolicLink(file) ? "it is a link to nothing" : "it cannot be read (" + e.getMessage() + ")";
        }
        if (attributes.isRegularFile()) {
            return null;
        }
        if (attributes.isDirectory()) {
            return "it is a folder";
        }
        return "it is not a regular file but " + kind(file);
    }

    private static String kind(Path file) {
        try {
            Object mode = Files.getAttribute(file, "unix:mode");
            int type = ((Integer) mode) & 0170000;
            return switch (type) {
                case 0010000 -> "a named pipe (FIFO)";
                case 0020000 -> "a character device";
                case 0060000 -> "a block device";
                case 0140000 -> "a socket";
                default -> "a special file";
            };
        } catch (IOException | UnsupportedOperationException | IllegalArgumentException | ClassCastException e) {
            return "a special file";
        }
    }

    /**
     * The bytes of {@code file}, a regular file of at most {@code maxBytes}; the cap holds even when the file grows
     * while it is read.
     *
     * @throws FileRefusedException when it is not a regular file or is larger than {@code maxBytes}
     */
    public static byte[] readRegular(Path file, long maxBytes) throws IOException {
        String notRegular = notRegular(file);
        if (notRegular != null) {
            throw new FileRefusedException("cannot be read: " + notRegular,
                    "point mesolint at a regular YAML file, or remove this entry");
        }
        if (Files.size(file) > maxBytes) {
            throw tooLarge(Files.size(file), maxBytes);
        }
        try (InputStream in = Files.newInputStream(file)) {
            byte[] bytes = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, maxBytes + 1));
            if (bytes.length > maxBytes) {
                throw tooLarge(bytes.length, maxBytes);
            }
            ReadLog.record(file, bytes);
            return bytes;
        }
    }

    private static FileRefusedException tooLarge(long size, long maxBytes) {
        return new FileRefusedException(String.format("the file is %.1f MB, over the %.1f MB limit", size / 1048576.0,
                maxBytes / 1048576.0), "split it into several files, or check that this is the file you meant");
    }
}
