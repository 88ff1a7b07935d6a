package dev.mesolint.core.yaml;

import dev.mesolint.core.source.FileRefusedException;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.source.SafeFiles;
import java.io.IOException;
import java.io.StringReader;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.NoSuchElementException;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.composer.Composer;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.parser.ParserImpl;
import org.yaml.snakeyaml.reader.StreamReader;
import org.yaml.snakeyaml.resolver.Resolver;

/**
 * Reads one YAML file safely into a {@link LocatedDocument}: size and text checks first, then SnakeYAML's parser
 * (no object construction, so no arbitrary types) and a located JSON tree: built straight from the parser's events
 * for a plain document ({@link DirectTreeBuilder}), else through SnakeYAML's composer and {@link NodeConverter}.
 *
 * <p>Thread-safe: every call builds its own parser.
 */
public final class LocatedYamlReader {
    static final String SYNTAX_HINT = "check the indentation (spaces, not tabs), that every 'key: value' has a space "
            + "after the colon, and quote values that contain ': ' or ' #'";

    /** Leaves plain scalars to the converter's own typing; holds no state, so one serves every thread. */
    private static final Resolver RESOLVER = new PlainScalarResolver();

    private final YamlLimits limits;

    public LocatedYamlReader(YamlLimits limits) {
        this.limits = limits;
    }

    /**
     * Reads a file; only a regular file is opened (a FIFO or device is refused before it can block or run on), and its
     * size is checked before and while it is read, so a huge file costs nothing.
     */
    public LocatedDocument read(Path file) throws IOException, YamlProblem {
        String notRegular = SafeFiles.notRegular(file);
        if (notRegular != null) {
            throw new YamlProblem("cannot be read as YAML: " + notRegular,
                    "point mesolint at a regular YAML file, or remove this entry", Location.START);
        }
        checkSize(Files.size(file));
        byte[] bytes;
        try {
            bytes = SafeFiles.readRegular(file, limits.maxFileBytes());
        } catch (FileRefusedException e) {
            throw new YamlProblem(e.getMessage(), e.hint(), Location.START);
        }
        return read(bytes);
    }

    /** Reads content already in memory (e.g. read once to hash it). */
    public LocatedDocument read(byte[] bytes) throws YamlProblem {
        checkSize(bytes.length);
        return read(decode(bytes));
    }

    private void checkSize(long size) throws YamlProblem {
        if (size > limits.maxFileBytes()) {
            throw new YamlProblem(String.format("the file is %.1f MB, over the %.1f MB limit for one programme",
                    size / 1048576.0, limits.maxFileBytes() / 1048576.0),
                    "split the block into several programme files, or check that this is a programme at all",
                    Location.START);
        }
    }

    public LocatedDocument read(String text) throws YamlProblem {
        // One pass from the parser's events for the plain documents nearly every programme is; anything else, and
        // every problem, takes the composer's road below (DirectTreeBuilder says which).
        LocatedDocument direct = direct(text);
        return direct != null ? direct : composed(text);
    }

    /** The one-pass road alone: the document, or null where the general road must read it. */
    LocatedDocument direct(String text) {
        return DirectTreeBuilder.build(text, loaderOptions(), RESOLVER, limits);
    }

    /** The general road: SnakeYAML's composer, then {@link NodeConverter}; every problem is found and worded here. */
    LocatedDocument composed(String text) throws YamlProblem {
        LoaderOptions options = loaderOptions();
        Node root;
        try {
            // The composer alone, as Yaml.composeAll builds it: nodes only, no object is ever constructed.
            Composer documents = new Composer(new ParserImpl(new StreamReader(new StringReader(text)), options),
                    RESOLVER, options);
            if (!documents.checkNode()) {
                throw empty();
            }
            root = next(documents);
            if (documents.checkNode()) {
                Node second = next(documents);
                throw new YamlProblem("the file holds more than one YAML document",
                        "keep one programme per file and remove the '---' separator", at(second.getStartMark()));
            }
        } catch (MarkedYAMLException e) {
            throw syntaxProblem(e);
        } catch (YAMLException e) {
            throw limitProblem(e);
        } catch (StackOverflowError e) {
            throw new YamlProblem("the file nests too deeply to read", "keep nesting under " + limits.maxDepth()
                    + " levels", Location.START);
        }
        return new NodeConverter(limits).document(root);
    }

    private static Node next(Composer composer) {
        Node node = composer.getNode();
        if (node == null) {
            throw new NoSuchElementException("No Node is available.");
        }
        return node;
    }

    private LoaderOptions loaderOptions() {
        LoaderOptions o = new LoaderOptions();
        o.setMaxAliasesForCollections(limits.maxAliases());
        o.setNestingDepthLimit(limits.maxDepth());
        o.setCodePointLimit((int) Math.min(Integer.MAX_VALUE, limits.maxFileBytes()));
        o.setAllowRecursiveKeys(false);
        o.setProcessComments(false);
        o.setAllowDuplicateKeys(false);
        return o;
    }

    private static YamlProblem empty() {
        return new YamlProblem("the file is empty", "start from a sample programme: format: 1, programme:, weeks:",
                Location.START);
    }

    private static String decode(byte[] bytes) throws YamlProblem {
        Charset wide = wideEncoding(bytes);
        if (wide != null) {
            return decodeStrictly(bytes, wide);
        }
        for (int i = 0; i < Math.min(bytes.length, 8192); i++) {
            if (bytes[i] == 0) {
                throw new YamlProblem("this is a binary file, not YAML text",
                        "remove it from the programme folder or give it another extension", Location.START);
            }
        }
        // Plain ASCII (most programmes) is valid UTF-8 as it stands and needs no decoder.
        return ascii(bytes) ? new String(bytes, StandardCharsets.US_ASCII)
                : decodeStrictly(bytes, StandardCharsets.UTF_8);
    }

    private static boolean ascii(byte[] bytes) {
        for (byte b : bytes) {
            if (b < 0) {
                return false;
            }
        }
        return true;
    }

    /** UTF-32 or UTF-16 when the file starts with its byte-order mark (YAML 1.2 allows both), else null. */
    private static Charset wideEncoding(byte[] b) {
        if (b.length >= 4 && (b[0] == 0 && b[1] == 0 && b[2] == (byte) 0xFE && b[3] == (byte) 0xFF)) {
            return Charset.forName("UTF-32BE");
        }
        if (b.length >= 4 && (b[0] == (byte) 0xFF && b[1] == (byte) 0xFE && b[2] == 0 && b[3] == 0)) {
            return Charset.forName("UTF-32LE");
        }
        if (b.length >= 2 && b[0] == (byte) 0xFE && b[1] == (byte) 0xFF) {
            return StandardCharsets.UTF_16BE;
        }
        if (b.length >= 2 && b[0] == (byte) 0xFF && b[1] == (byte) 0xFE) {
            return StandardCharsets.UTF_16LE;
        }
        return null;
    }

    private static String decodeStrictly(byte[] bytes, Charset charset) throws YamlProblem {
        try {
            String text = charset.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
            return text.startsWith("\uFEFF") ? text.substring(1) : text;
        } catch (CharacterCodingException e) {
            throw new YamlProblem("the file is not " + charset.name() + " text", "save it as UTF-8", Location.START);
        }
    }

    private static YamlProblem syntaxProblem(MarkedYAMLException e) {
        Mark mark = e.getProblemMark() != null ? e.getProblemMark() : e.getContextMark();
        String problem = e.getProblem() != null ? e.getProblem() : e.getMessage();
        String context = e.getContext() != null ? " (" + e.getContext() + ")" : "";
        String message = problem.contains("exceeds the specified") || problem.contains("Nesting Depth")
                ? limitMessage(problem) : "YAML syntax: " + problem + context;
        return new YamlProblem(message, hintFor(problem), at(mark));
    }

    private YamlProblem limitProblem(YAMLException e) {
        return new YamlProblem(limitMessage(String.valueOf(e.getMessage())), "remove the repeated aliases or deep nesting; "
                + "a programme needs neither", Location.START);
    }

    private static String limitMessage(String raw) {
        if (raw.contains("aliases")) {
            return "too many YAML aliases to collections (a possible alias bomb): " + raw;
        }
        if (raw.toLowerCase(java.util.Locale.ROOT).contains("nesting depth")) {
            return "the document nests too deeply: " + raw;
        }
        if (raw.contains("code point")) {
            return "the file is too large: " + raw;
        }
        return "YAML could not be read: " + raw;
    }

    private static String hintFor(String problem) {
        if (problem.contains("found character '\\t'") || problem.contains("tab")) {
            return "indent with spaces; YAML does not allow tabs";
        }
        if (problem.contains("found duplicate key")) {
            return "remove or rename the repeated key";
        }
        if (problem.contains("aliases") || problem.contains("depth")) {
            return "remove the repeated aliases or deep nesting; a programme needs neither";
        }
        if (problem.contains("could not determine a constructor") || problem.contains("tag")) {
            return "remove the '!' tag; programmes use plain values only";
        }
        return SYNTAX_HINT;
    }

    static Location at(Mark mark) {
        return mark == null ? Location.START : new Location(mark.getLine() + 1, mark.getColumn() + 1, "");
    }
}
