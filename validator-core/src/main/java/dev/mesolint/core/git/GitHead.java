package dev.mesolint.core.git;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The commit, branch and {@code origin} address of the git repository at a root, read from its files without running
 * git: for the provenance a report records. Anything it cannot read (no repository, a detached or packed state it
 * does not know) is simply absent; a report never fails for it.
 *
 * @param revision      the commit checked out (40 hex digits)
 * @param branch        the branch checked out; empty when detached
 * @param repositoryUri the {@code origin} remote's address, without any user or password in it
 */
public record GitHead(String revision, Optional<String> branch, Optional<String> repositoryUri) {
    private static final Pattern SHA = Pattern.compile("[0-9a-f]{40}");
    private static final Pattern ORIGIN = Pattern.compile("(?m)^\\[remote \"origin\"\\]\\s*$((?:\\n(?!\\[).*)*)");
    private static final Pattern URL = Pattern.compile("(?m)^\\s*url\\s*=\\s*(\\S+)\\s*$");
    private static final Pattern SCP = Pattern.compile("(?:[^@/:]+@)?([^@/:]+\\.[^@/:]+):(?!//)(.+)");
    private static final Pattern NETWORK = Pattern.compile("(?i)(https?|ssh|git|git\\+ssh)://[^/]+/");

    /** The head of the repository whose root is {@code root} ({@code .git} a folder, or a file as in worktrees). */
    public static Optional<GitHead> at(Path root) {
        try {
            Optional<Path> gitDir = gitDir(root.resolve(".git"));
            if (gitDir.isEmpty()) {
                return Optional.empty();
            }
            Path dir = gitDir.get();
            // A worktree keeps refs and config in the common folder.
            Path common = Files.isRegularFile(dir.resolve("commondir"))
                    ? dir.resolve(read(dir.resolve("commondir"))).normalize() : dir;
            String head = read(dir.resolve("HEAD"));
            Optional<String> branch = Optional.empty();
            String revision = head;
            if (head.startsWith("ref: ")) {
                String ref = head.substring(5).trim();
                branch = Optional.of(ref.startsWith("refs/heads/") ? ref.substring(11) : ref);
                revision = resolve(common, ref).orElse("");
            }
            if (!SHA.matcher(revision).matches()) {
                return Optional.empty();
            }
            return Optional.of(new GitHead(revision, branch, origin(common)));
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    private static Optional<Path> gitDir(Path dotGit) throws IOException {
        if (Files.isDirectory(dotGit)) {
            return Optional.of(dotGit);
        }
        if (Files.isRegularFile(dotGit)) {
            String text = read(dotGit);
            if (text.startsWith("gitdir:")) {
                return Optional.of(dotGit.getParent().resolve(text.substring(7).trim()).normalize());
            }
        }
        return Optional.empty();
    }

    private static Optional<String> resolve(Path common, String ref) throws IOException {
        Path loose = common.resolve(ref);
        if (Files.isRegularFile(loose)) {
            return Optional.of(read(loose));
        }
        Path packed = common.resolve("packed-refs");
        if (Files.isRegularFile(packed)) {
            for (String line : Files.readAllLines(packed, StandardCharsets.UTF_8)) {
                List<String> parts = List.of(line.trim().split(" "));
                if (parts.size() == 2 && parts.get(1).equals(ref)) {
                    return Optional.of(parts.get(0));
                }
            }
        }
        return Optional.empty();
    }

    private static Optional<String> origin(Path common) throws IOException {
        Path config = common.resolve("config");
        if (!Files.isRegularFile(config)) {
            return Optional.empty();
        }
        Matcher section = ORIGIN.matcher(Files.readString(config, StandardCharsets.UTF_8));
        if (!section.find()) {
            return Optional.empty();
        }
        Matcher url = URL.matcher(section.group(1));
        return url.find() ? networkAddress(url.group(1)) : Optional.empty();
    }

    /**
     * The origin as an absolute URI that names a server, without credentials: SARIF requires an absolute
     * {@code repositoryUri}, and a local path or {@code file:} address would only leak this machine's layout.
     * An scp-style address ({@code git@host:team/repo.git}) becomes {@code ssh://host/team/repo.git}.
     */
    static Optional<String> networkAddress(String origin) {
        Matcher scp = SCP.matcher(origin);
        String uri = scp.matches() ? "ssh://" + scp.group(1) + "/" + scp.group(2) : origin;
        if (!NETWORK.matcher(uri).lookingAt()) {
            return Optional.empty();
        }
        // Credentials written into the address never go into a report.
        return Optional.of(uri.replaceFirst("^([a-z+]+://)[^/@]*@", "$1"));
    }

    private static String read(Path file) throws IOException {
        return Files.readString(file, StandardCharsets.UTF_8).trim();
    }
}
