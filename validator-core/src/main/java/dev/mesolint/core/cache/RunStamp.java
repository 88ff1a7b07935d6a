package dev.mesolint.core.cache;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.source.ReadLog;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystemLoopException;
import java.nio.file.FileVisitOption;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;

/**
 * Proof that a whole run would see exactly what the last one saw, so that its outcome can be replayed without
 * loading the checker (no YAML parser, schema validator or rule is touched on a hit).
 *
 * <p>A stamp is taken before a run: the tool version and rule set, the caller's settings, and a listing of every
 * entry below the searched folders (kind and size; links followed) and of the repository markers ({@code .git},
 * {@code .mesolint.yaml}) in every folder above them. After the run it is saved with the hash of every file the run
 * read ({@link ReadLog}) and what the run reported. A later run replays only when its own stamp is equal and every
 * recorded file still has the same hash; anything else, a damaged stamp file included, means a real run.
 */
public final class RunStamp {
    private static final String HEADER = "mesolint run stamp 1";

    private final String inputs;

    private RunStamp(String inputs) {
        this.inputs = inputs;
    }

    /** A line the run logged: its level (as the caller names levels) and its text. */
    public record Line(String level, String text) {
    }

    /**
     * What a replay gives back.
     *
     * @param programmes how many programme files the run covered
     * @param log        the lines the run logged, in order
     * @param failure    the failure the run ended with, if it failed on findings
     */
    public record Replay(int programmes, List<Line> log, Optional<String> failure) {
    }

    /**
     * Takes the stamp of the inputs as they are now.
     *
     * @param settings everything the caller decides the run with, as text (an equal text means equal settings)
     * @param searched the folders and files the run looks for programmes in
     * @param skipped  folders the run writes to (its output), left out of the listing
     */
    public static RunStamp take(String settings, List<Path> searched, Set<Path> skipped) throws IOException {
        StringBuilder text = new StringBuilder("tool ").append(Mesolint.version()).append(' ')
                .append(Mesolint.RULE_SET_VERSION).append('\n').append("settings ")
                .append(ContentHash.of(settings)).append('\n');
        for (Path start : searched) {
            Path folder = start.toAbsolutePath().normalize();
            text.append("searched ").append(folder).append('\n');
            listing(folder, normalized(skipped), text);
            for (Path up = folder.getParent(); up != null; up = up.getParent()) {
                text.append("above ").append(up).append(kind(up.resolve(".git"))).append(kind(up.resolve(
                        ".mesolint.yaml"))).append('\n');
            }
        }
        return new RunStamp(ContentHash.of(text.toString()));
    }

    /**
     * Writes this stamp with what the run read and reported, to a temporary file moved into place (a reader never
     * sees half a stamp). The file ends with a checksum of everything before it.
     */
    public void save(Path file, Map<Path, String> read, int programmes, List<Line> log, Optional<String> failure)
            throws IOException {
        StringBuilder out = new StringBuilder(HEADER).append('\n').append("inputs ").append(inputs).append('\n')
                .append("programmes ").append(programmes).append('\n');
        new TreeMap<>(read).forEach((path, hash) -> out.append("read ").append(hash).append(' ')
                .append(escape(path.toString())).append('\n'));
        for (Line line : log) {
            out.append("log ").append(line.level()).append(' ').append(escape(line.text())).append('\n');
        }
        out.append(failure.map(f -> "failed " + escape(f)).orElse("passed")).append('\n');
        String checksum = ContentHash.of(out.toString());
        out.append("checksum ").append(checksum).append('\n');
        Files.createDirectories(file.toAbsolutePath().getParent());
        Path temporary = Files.createTempFile(file.toAbsolutePath().getParent(), ".run-stamp", ".tmp");
        try {
            Files.writeString(temporary, out, StandardCharsets.UTF_8);
            Files.move(temporary, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(temporary);
        }
    }

    /**
     * The saved run's outcome, when {@code file} holds an intact stamp equal to this one and every file it read is
     * unchanged; empty otherwise (no file, another version, damaged, or anything changed).
     */
    public Optional<Replay> replay(Path file) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
        if (lines.size() < 5 || !lines.get(0).equals(HEADER) || !intact(lines)
                || !lines.get(1).equals("inputs " + inputs)) {
            return Optional.empty();
        }
        try {
            int programmes = Integer.parseInt(lines.get(2).substring("programmes ".length()));
            List<Line> log = new ArrayList<>();
            Optional<String> failure = Optional.empty();
            for (String line : lines.subList(3, lines.size() - 1)) {
                if (line.startsWith("read ")) {
                    int space = line.indexOf(' ', 5);
                    if (!unchanged(Path.of(unescape(line.substring(space + 1))), line.substring(5, space))) {
                        return Optional.empty();
                    }
                } else if (line.startsWith("log ")) {
                    int space = line.indexOf(' ', 4);
                    log.add(new Line(line.substring(4, space), unescape(line.substring(space + 1))));
                } else if (line.startsWith("failed ")) {
                    failure = Optional.of(unescape(line.substring("failed ".length())));
                } else if (!line.equals("passed")) {
                    return Optional.empty();
                }
            }
            return Optional.of(new Replay(programmes, List.copyOf(log), failure));
        } catch (RuntimeException e) {
            return Optional.empty(); // a stamp we cannot read is no proof
        }
    }

    private static boolean intact(List<String> lines) {
        String last = lines.get(lines.size() - 1);
        StringBuilder before = new StringBuilder();
        lines.subList(0, lines.size() - 1).forEach(l -> before.append(l).append('\n'));
        return last.equals("checksum " + ContentHash.of(before.toString()));
    }

    private static boolean unchanged(Path file, String hash) {
        try {
            return ContentHash.of(Files.readAllBytes(file)).equals(hash);
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }

    /** Every entry below {@code folder}, links followed, as relative path, kind and size, in a stable order. */
    private static void listing(Path folder, Set<Path> skipped, StringBuilder text) throws IOException {
        if (!Files.isDirectory(folder)) {
            text.append("entry .").append(kind(folder)).append('\n');
            return;
        }
        TreeMap<String, String> entries = new TreeMap<>();
        Files.walkFileTree(folder, EnumSet.of(FileVisitOption.FOLLOW_LINKS), Integer.MAX_VALUE,
                new SimpleFileVisitor<>() {
                    @Override
                    public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
                        if (skipped.contains(dir.toAbsolutePath().normalize())) {
                            return FileVisitResult.SKIP_SUBTREE;
                        }
                        entries.put(folder.relativize(dir).toString(), " folder");
                        return FileVisitResult.CONTINUE;
                    }

                    @Override
                    public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
                        entries.put(folder.relativize(file).toString(), attrs.isRegularFile()
                                ? " file " + attrs.size() : " other");
                        return FileVisitResult.CONTINUE;
                    }

                    @Override
                    public FileVisitResult visitFileFailed(Path file, IOException e) {
                        // A dangling link, a loop, an unreadable folder: listed as such, so a change to it shows.
                        entries.put(folder.relativize(file).toString(), e instanceof FileSystemLoopException
                                ? " loop" : " unreadable " + e.getClass().getSimpleName());
                        return FileVisitResult.CONTINUE;
                    }
                });
        entries.forEach((path, kind) -> text.append("entry ").append(escape(path)).append(kind).append('\n'));
    }

    private static String kind(Path path) {
        try {
            BasicFileAttributes attrs = Files.readAttributes(path, BasicFileAttributes.class);
            return attrs.isDirectory() ? " folder" : attrs.isRegularFile() ? " file " + attrs.size() : " other";
        } catch (NoSuchFileException e) {
            return " none";
        } catch (IOException e) {
            return " unreadable";
        }
    }

    private static Set<Path> normalized(Set<Path> paths) {
        Set<Path> out = new HashSet<>();
        paths.forEach(p -> out.add(p.toAbsolutePath().normalize()));
        return out;
    }

    /** One line per record: backslashes and line breaks escaped. */
    static String escape(String text) {
        return text.replace("\\", "\\\\").replace("\n", "\\n").replace("\r", "\\r");
    }

    static String unescape(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\\' && i + 1 < text.length()) {
                char next = text.charAt(++i);
                out.append(next == 'n' ? '\n' : next == 'r' ? '\r' : next);
            } else {
                out.append(c);
            }
        }
        return out.toString();
    }
}
