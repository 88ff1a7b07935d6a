package dev.mesolint.core.engine;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import java.util.stream.Stream;

/** Finds programme files: the files named, and every {@code *.yaml}/{@code *.yml} below the folders named. */
public final class ProgrammeFiles {
    private ProgrammeFiles() {
    }

    /** The files in a stable order; paths that do not exist are returned in {@code missing}. */
    public static List<Path> discover(List<Path> inputs, List<Path> missing) {
        TreeSet<Path> found = new TreeSet<>();
        for (Path input : inputs) {
            Path p = input.toAbsolutePath().normalize();
            if (Files.isDirectory(p)) {
                try (Stream<Path> walk = Files.walk(p)) {
                    walk.filter(Files::isRegularFile).filter(f -> isProgramme(p, f)).forEach(found::add);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            } else if (Files.isRegularFile(p)) {
                found.add(p);
            } else {
                missing.add(input);
            }
        }
        return new ArrayList<>(found);
    }

    private static boolean isProgramme(Path root, Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (!(name.endsWith(".yaml") || name.endsWith(".yml"))) {
            return false;
        }
        // Hidden files and folders (configuration, caches) and build output are not programmes.
        for (Path part : root.relativize(file)) {
            String s = part.toString();
            if (s.startsWith(".") || s.equals("target")) {
                return false;
            }
        }
        return true;
    }

    /** The path shown in findings: relative to {@code root} when inside it, '/'-separated. */
    public static String display(Path root, Path file) {
        Path abs = file.toAbsolutePath().normalize();
        Path base = root.toAbsolutePath().normalize();
        Path shown = abs.startsWith(base) ? base.relativize(abs) : abs;
        return shown.toString().replace('\\', '/');
    }
}
