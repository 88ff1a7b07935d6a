package dev.mesolint.core.report;

import java.net.URI;
import java.net.URISyntaxException;
import java.nio.file.Path;

/** Links from the report to a programme file's line, relative to the folder the report is written to. */
final class SourceLinks {
    private final Path reportDir;
    private final Path root;

    /** @param reportDir the report's folder, null to link by the paths as shown; {@code root} resolves those paths */
    SourceLinks(Path reportDir, Path root) {
        this.reportDir = reportDir == null ? null : reportDir.toAbsolutePath().normalize();
        this.root = root;
    }

    /** {@code ../programmes/a.yaml#L41}. */
    String to(String shownPath, int line) {
        String target;
        Path file = Path.of(shownPath);
        if (reportDir != null) {
            Path absolute = file.isAbsolute() ? file : root.resolve(file).normalize();
            target = reportDir.getRoot() != null && reportDir.getRoot().equals(absolute.getRoot())
                    ? reportDir.relativize(absolute).toString().replace('\\', '/')
                    : absolute.toUri().toString();
        } else {
            target = shownPath;
        }
        return encode(target) + "#L" + line;
    }

    private static String encode(String path) {
        if (path.startsWith("file:")) {
            return path;
        }
        try {
            return new URI(null, null, path, null).toASCIIString();
        } catch (URISyntaxException e) {
            return path;
        }
    }
}
