package dev.mesolint.core.format;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.CatalogueFile;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlProblem;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

/** Reads catalogue files (the built-in one and a repository's own) through the same safe, located path. */
public final class CatalogueReader {
    public static final String BUILT_IN = "/dev/mesolint/catalogue/exercises.yaml";

    private final LocatedYamlReader reader;
    /** Asked for when a catalogue text is read: a run whose only catalogue is the built-in pack never loads it. */
    private final Supplier<FormatSchema> schema;

    public CatalogueReader(LocatedYamlReader reader, FormatSchema catalogueSchema) {
        this(reader, () -> catalogueSchema);
    }

    /** A reader that loads the catalogue schema when it first reads a catalogue text. */
    public CatalogueReader(LocatedYamlReader reader, Supplier<FormatSchema> catalogueSchema) {
        this.reader = reader;
        this.schema = catalogueSchema;
    }

    /**
     * The catalogue shipped in the core jar: from the build's pack of it ({@link PackedCatalogue}) when the pack was made
     * from this very text, else read from the text. A broken built-in catalogue is a defect: it fails loudly.
     */
    public Catalogue builtIn() {
        byte[] text = builtInText();
        return PackedCatalogue.builtIn(text).orElseGet(() -> Catalogue.of(readBuiltIn(text)));
    }

    /** The built-in catalogue's YAML text, as shipped. */
    static byte[] builtInText() {
        try (InputStream in = CatalogueReader.class.getResourceAsStream(BUILT_IN)) {
            if (in == null) {
                throw new IllegalStateException("the built-in catalogue is missing from the core jar");
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The entries of the built-in catalogue's text, read, validated and bound like any catalogue file. */
    List<Exercise> readBuiltIn(byte[] text) {
        try {
            CatalogueFile file = read(reader.read(text), "built-in");
            if (!file.ok()) {
                throw new IllegalStateException("the built-in catalogue is invalid: " + file.violations());
            }
            return file.entries();
        } catch (YamlProblem e) {
            throw new IllegalStateException("the built-in catalogue does not parse: " + e.getMessage(), e);
        }
    }

    public CatalogueFile read(Path path, String displayPath) {
        try {
            return read(reader.read(path), displayPath);
        } catch (YamlProblem e) {
            return new CatalogueFile(displayPath, List.of(), List.of(new Violation(e.location(), e.getMessage(),
                    e.hint())), FrameworkRules.YAML_SYNTAX);
        } catch (IOException e) {
            return new CatalogueFile(displayPath, List.of(), List.of(new Violation(
                    dev.mesolint.core.source.Location.START, "cannot read the catalogue file: " + e.getMessage(),
                    "check the path in the configuration")), FrameworkRules.YAML_SYNTAX);
        }
    }

    /** Reads a catalogue document parsed elsewhere (a catalogue file found among the programmes, say). */
    public CatalogueFile read(LocatedDocument document, String displayPath) {
        List<Violation> violations = new ArrayList<>(schema.get().validate(document));
        if (!violations.isEmpty()) {
            return new CatalogueFile(displayPath, List.of(), violations, FrameworkRules.SCHEMA);
        }
        BindContext ctx = new BindContext(document);
        List<Exercise> entries = CatalogueEntryBinder.readAll(ctx, document.root().get("exercises"), "/exercises",
                displayPath);
        Map<String, Exercise> seen = new HashMap<>();
        for (Exercise e : entries) {
            Exercise earlier = seen.putIfAbsent(e.id(), e);
            if (earlier != null) {
                violations.add(new Violation(e.location(), "catalogue id '" + e.id() + "' is written twice (first at line "
                        + earlier.location().line() + ")", "keep one entry per id"));
            }
            if (e.primeMover().isEmpty()) {
                violations.add(new Violation(e.location(), "'" + e.id() + "' has no prime mover (no muscle with credit 1)",
                        "give the main muscle credit 1; synergists get 0.5"));
            }
        }
        return new CatalogueFile(displayPath, violations.isEmpty() ? entries : List.of(), violations, FrameworkRules.SCHEMA);
    }
}
