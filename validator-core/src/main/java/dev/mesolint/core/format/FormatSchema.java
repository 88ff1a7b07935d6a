package dev.mesolint.core.format;

import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.Pointers;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ConcurrentHashMap;
import tools.jackson.databind.JsonNode;

/**
 * A published JSON Schema (programme or catalogue), compiled once per JVM and shared by every file and run.
 *
 * <p>Each document first meets the schema's {@link SchemaShortcut}, which passes the documents it can prove valid
 * (nearly all of them) without the general validator; the general validator (networknt) is compiled the first time
 * a document is not passed that way, and alone writes the violations. So a run over valid files never loads it.
 *
 * <p>Thread-safe: networknt compiles the schema into immutable validators; per-call state lives in its context.
 */
public final class FormatSchema {
    public static final String PROGRAMME = "programme.schema.json";
    public static final String CATALOGUE = "catalogue.schema.json";

    /** Each schema loaded once; a schema {@link #prepare prepared} in the background is joined when loaded. */
    private static final Map<String, CompletableFuture<FormatSchema>> LOADED = new ConcurrentHashMap<>();

    private final String name;
    /** Null when the schema uses a form the shortcut does not know: then every document meets the general one. */
    private final SchemaShortcut shortcut;
    private volatile Schema general;

    private FormatSchema(String name, SchemaShortcut shortcut) {
        this.name = name;
        this.shortcut = shortcut;
    }

    /** The schema shipped in the core jar under {@code dev/mesolint/schema/}, loaded on first use. */
    public static FormatSchema load(String name) {
        CompletableFuture<FormatSchema> mine = new CompletableFuture<>();
        CompletableFuture<FormatSchema> known = LOADED.putIfAbsent(name, mine);
        if (known == null) {
            loadInto(mine, name);
            known = mine;
        }
        try {
            return known.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw e;
        }
    }

    /**
     * Starts loading {@code name} on a background thread, so that a run's start-up (configuration, profiles, the
     * file walk) overlaps it; {@link #load} then joins it.
     */
    public static void prepare(String name) {
        CompletableFuture<FormatSchema> mine = new CompletableFuture<>();
        if (LOADED.putIfAbsent(name, mine) == null) {
            Thread loader = new Thread(() -> loadInto(mine, name), "mesolint-schema");
            loader.setDaemon(true);
            loader.start();
        }
    }

    private static void loadInto(CompletableFuture<FormatSchema> result, String name) {
        try {
            SchemaShortcut shortcut = SchemaShortcut.compile(SchemaTree.read(resource(name))).orElse(null);
            FormatSchema schema = new FormatSchema(name, shortcut);
            if (schema.shortcut == null) {
                schema.general(); // every document will need it
            }
            result.complete(schema);
        } catch (RuntimeException | Error e) {
            result.completeExceptionally(e);
        }
    }

    private static byte[] resource(String name) {
        try (InputStream in = FormatSchema.class.getResourceAsStream("/dev/mesolint/schema/" + name)) {
            if (in == null) {
                throw new IllegalStateException("schema " + name + " is missing from the core jar");
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** networknt's compiled schema, made the first time a document needs it. */
    private Schema general() {
        Schema compiled = general;
        if (compiled == null) {
            synchronized (this) {
                compiled = general;
                if (compiled == null) {
                    SchemaRegistry registry = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);
                    compiled = registry.getSchema(new ByteArrayInputStream(resource(name)));
                    compiled.initializeValidators();
                    general = compiled;
                }
            }
        }
        return compiled;
    }

    /** True when the shortcut proves {@code document} valid (package-private for the tests that check it). */
    boolean passedByShortcut(JsonNode document) {
        return shortcut != null && shortcut.certainlyValid(document);
    }

    /** networknt's verdict alone, for the tests that hold the shortcut to it. */
    boolean validByGeneral(JsonNode document) {
        return general().validate(document).isEmpty();
    }

    /** The violations, located at the YAML node each is about, one per place, in file order. */
    public List<Violation> validate(LocatedDocument document) {
        // Numbers no field accepts are refused first: the validator and the binder read numbers as long and int.
        List<Violation> outOfRange = NumberRange.check(document);
        if (!outOfRange.isEmpty()) {
            return outOfRange;
        }
        if (passedByShortcut(document.root())) {
            return List.of();
        }
        List<com.networknt.schema.Error> errors = general().validate(document.root());
        Map<String, Violation> byPlace = new LinkedHashMap<>();
        for (com.networknt.schema.Error error : errors) {
            Violation v = SchemaMessages.describe(error, document);
            // if/then/else unions report the same place twice; the first (most specific) message is kept.
            byPlace.putIfAbsent(v.location().pointer() + "|" + v.location().line() + ":" + v.location().column(), v);
        }
        return byPlace.values().stream()
                .sorted(Comparator.comparingInt((Violation v) -> v.location().line())
                        .thenComparingInt(v -> v.location().column()))
                .toList();
    }

    static String pointerOf(com.networknt.schema.path.NodePath path) {
        String pointer = "";
        for (int i = 0; i < path.getNameCount(); i++) {
            Object element = path.getElement(i);
            pointer = element instanceof Integer index ? Pointers.child(pointer, index)
                    : Pointers.child(pointer, String.valueOf(element));
        }
        return pointer;
    }
}
