package dev.mesolint.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** {@code -} as the path: one programme read from standard input, checked as if it were the file named. */
final class StandardInput {
    /** How a programme from standard input is named when no {@code --stdin-filename} is given. */
    static final String DEFAULT_NAME = "<stdin>";
    /** A programme is small; a larger input is refused rather than read into memory. */
    static final int MAX_BYTES = 8 * 1024 * 1024;

    /** The document read, and the path it is checked as. */
    record Document(Path path, byte[] content) {
    }

    @Option(names = "--stdin-filename", paramLabel = "PATH",
            description = "With '-' as the PATH: the file the programme on standard input stands for. Its folder "
                    + "decides the configuration and profile; messages name it (default: " + DEFAULT_NAME + ").")
    Path filename;

    /** The document, when the only path is {@code -}; empty otherwise. */
    Optional<Document> read(List<Path> paths, InputStream in, CommandLine commandLine) throws IOException {
        boolean dash = paths.stream().anyMatch(p -> p.toString().equals("-"));
        if (!dash) {
            if (filename != null) {
                throw new CommandLine.ParameterException(commandLine,
                        "--stdin-filename names the programme read from standard input; pass '-' as the path");
            }
            return Optional.empty();
        }
        if (paths.size() > 1) {
            throw new CommandLine.ParameterException(commandLine,
                    "'-' (standard input) is one programme: check it in a run of its own, without other paths");
        }
        byte[] content = in.readNBytes(MAX_BYTES + 1);
        if (content.length > MAX_BYTES) {
            throw new CommandLine.ParameterException(commandLine, "standard input holds more than "
                    + MAX_BYTES / (1024 * 1024) + " MiB; a programme is far smaller: check the file instead");
        }
        Path path = (filename != null ? filename : Path.of(DEFAULT_NAME)).toAbsolutePath().normalize();
        return Optional.of(new Document(path, content));
    }
}
