package dev.mesolint.core.engine;

import dev.mesolint.core.source.SafeFiles;
import java.io.IOException;
import java.nio.file.FileSystemLoopException;
import java.nio.file.FileVisitOption;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Finds programme files: the files named, and every {@code *.yaml}/{@code *.yml} below the folders named, outside
 * hidden folders and build output.
 *
 * <p>Nothing is dropped silently. A start path that is a link is followed; links inside it are followed while they
 * stay inside the repository root. Every entry that looks like a programme but cannot be read as one (a FIFO, a
 * device, a dangling link, a link leading outside the root, a named file without the extension, a folder that cannot
 * be read) is returned as {@link Refused} with the reason, so the run reports it as a located problem. Hidden
 * {@code .yaml} files in folders (other than mesolint's own configuration) are skipped but counted. A
 * {@code .mesolint.yaml} below a start folder is returned with the programmes, to be checked as a configuration
 * ({@link OwnFileKind}): it is never the one in effect, which lies at or above the folders checked.
 */
public final class ProgrammeFiles {
    /** The repository configuration's file name; never a programme. */
    static final String CONFIGURATION = ".mesolint.yaml";

    private ProgrammeFiles() {
    }

    /** An entry that should have been a programme but cannot be read as one. */
    public record Refused(Path path, String reason, String hint) {
    }

    /**
     * What a run checks.
     *
     * @param programmes files to check, in a stable order
     * @param refused    entries reported instead of checked
     * @param missing    inputs that name nothing
     * @param hidden     hidden {@code .yaml} files skipped in folders
     */
    public record Discovery(List<Path> programmes, List<Refused> refused, List<Path> missing, List<Path> hidden) {
        public Discovery {
            programmes = List.copyOf(programmes);
            refused = List.copyOf(refused);
            missing = List.copyOf(missing);
            hidden = List.copyOf(hidden);
        }

        /** True when no entry at all was found to check or to report. */
        public boolean empty() {
            return programmes.isEmpty() && refused.isEmpty();
        }
    }

    /** The files in a stable order; paths that do not exist are returned in {@code missing}. */
    public static List<Path> discover(List<Path> inputs, List<Path> missing) {
        Discovery d = find(Path.of("").toAbsolutePath(), inputs, Set.of());
        missing.addAll(d.missing());
        return d.programmes();
    }

    /**
     * Finds the programmes under {@code inputs}. {@code own} are mesolint's own files (catalogues, profiles,
     * baseline) that a folder walk passes over: they are read as what they are, not as programmes.
     */
    public static Discovery find(Path root, List<Path> inputs, Set<Path> own) {
        Walk walk = new Walk(realOrSelf(root), normalised(own));
        for (Path input : inputs) {
            walk.input(input);
        }
        return new Discovery(new ArrayList<>(walk.found), new ArrayList<>(walk.refused.values()), walk.missing,
                new ArrayList<>(walk.hidden));
    }

    /** True for a name a programme file may have: {@code *.yaml} or {@code *.yml}, in any case. */
    public static boolean hasProgrammeExtension(Path file) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        return name.endsWith(".yaml") || name.endsWith(".yml");
    }

    /** The path shown in findings: relative to {@code root} when inside it, '/'-separated. */
    public static String display(Path root, Path file) {
        Path abs = file.toAbsolutePath().normalize();
        Path base = root.toAbsolutePath().normalize();
        Path shown = abs.startsWith(base) ? base.relativize(abs) : abs;
        return shown.toString().replace('\\', '/');
    }

    private static Set<Path> normalised(Set<Path> files) {
        Set<Path> out = new TreeSet<>();
        for (Path f : files) {
            out.add(f.toAbsolutePath().normalize());
            out.add(realOrSelf(f));
        }
        return out;
    }

    private static Path realOrSelf(Path p) {
        try {
            return p.toRealPath();
        } catch (IOException e) {
            return p.toAbsolutePath().normalize();
        }
    }

    /** One discovery's state: the walk of each input adds to it. */
    private static final class Walk {
        private final Path realRoot;
        private final Set<Path> own;
        private final TreeSet<Path> found = new TreeSet<>();
        private final TreeMap<Path, Refused> refused = new TreeMap<>();
        private final List<Path> missing = new ArrayList<>();
        private final TreeSet<Path> hidden = new TreeSet<>();

        Walk(Path realRoot, Set<Path> own) {
            this.realRoot = realRoot;
            this.own = own;
        }

        void input(Path input) {
            Path p = input.toAbsolutePath().normalize();
            if (Files.isDirectory(p)) {
                folder(p);
            } else if (Files.isRegularFile(p)) {
                if (hasProgrammeExtension(p)) {
                    found.add(p);
                } else {
                    refuse(p, "not checked: a programme file's name ends in .yaml or .yml",
                            "rename it (for example to " + p.getFileName() + ".yaml), or leave it out");
                }
            } else if (Files.isSymbolicLink(p) || Files.exists(p, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
                refuse(p, "cannot be read as a programme: " + SafeFiles.notRegular(p),
                        "name a regular YAML file or a folder");
            } else {
                missing.add(input);
            }
        }

        private void folder(Path start) {
            // Links below the start may lead anywhere inside the root, and inside the start itself when it was
            // named through a link that leads out of the root.
            Path realStart = realOrSelf(start);
            try {
                Files.walkFileTree(start, EnumSet.of(FileVisitOption.FOLLOW_LINKS), Integer.MAX_VALUE,
                        new SimpleFileVisitor<>() {
                            @Override
                            public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
                                if (dir.equals(start)) {
                                    return FileVisitResult.CONTINUE;
                                }
                                String name = dir.getFileName().toString();
                                if (name.startsWith(".") || name.equals("target")) {
                                    return FileVisitResult.SKIP_SUBTREE;
                                }
                                if (Files.isSymbolicLink(dir) && !allowed(realOrSelf(dir), realStart)) {
                                    refuse(dir, "not checked: this folder link leads outside the repository root",
                                            "move the programmes into the repository, or name the folder itself "
                                                    + "on the command line");
                                    return FileVisitResult.SKIP_SUBTREE;
                                }
                                return FileVisitResult.CONTINUE;
                            }

                            @Override
                            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
                                entry(file, attrs, start, realStart);
                                return FileVisitResult.CONTINUE;
                            }

                            @Override
                            public FileVisitResult visitFileFailed(Path file, IOException e) {
                                if (e instanceof FileSystemLoopException) {
                                    refuse(file, "not checked: this folder link loops back to a folder above it",
                                            "remove the link");
                                } else if (Files.isDirectory(file) || hasProgrammeExtension(file)) {
                                    refuse(file, "cannot be read: " + e.getClass().getSimpleName()
                                            + (e.getMessage() == null ? "" : " (" + e.getMessage() + ")"),
                                            "check the permissions; the other files were checked");
                                }
                                return FileVisitResult.CONTINUE;
                            }
                        });
            } catch (IOException e) {
                refuse(start, "cannot be read: " + e.getMessage(), "check the permissions");
            }
        }

        private void entry(Path file, BasicFileAttributes attrs, Path start, Path realStart) {
            if (!hasProgrammeExtension(file)) {
                return;
            }
            Path normal = file.toAbsolutePath().normalize();
            String name = file.getFileName().toString();
            boolean configuration = name.equalsIgnoreCase(CONFIGURATION);
            // The start folder's own configuration may be the one in effect, read as such; a deeper one never is.
            if (configuration && start.equals(file.getParent()) || own.contains(normal)
                    || own.contains(realOrSelf(file))) {
                return;
            }
            if (configuration && attrs.isRegularFile()) {
                found.add(normal);
                return;
            }
            if (name.startsWith(".")) {
                hidden.add(normal);
                return;
            }
            if (!attrs.isRegularFile()) {
                refuse(normal, "cannot be read as a programme: " + SafeFiles.notRegular(file),
                        "remove it from the programme folder, or replace it with a regular file");
            } else if (Files.isSymbolicLink(file) && !allowed(realOrSelf(file), realStart)) {
                refuse(normal, "not checked: this link leads outside the repository root",
                        "copy the programme into the repository, or name it on the command line");
            } else {
                found.add(normal);
            }
        }

        private boolean allowed(Path real, Path realStart) {
            return real.startsWith(realRoot) || real.startsWith(realStart);
        }

        private void refuse(Path path, String reason, String hint) {
            refused.putIfAbsent(path.toAbsolutePath().normalize(), new Refused(path.toAbsolutePath().normalize(),
                    reason, hint));
        }
    }
}
