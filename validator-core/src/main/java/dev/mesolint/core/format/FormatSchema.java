package dev.mesolint.core.format;

import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.Pointers;
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

/**
 * A published JSON Schema (programme or catalogue), compiled once per JVM and shared by every file and run.
 *
 * <p>Thread-safe: networknt compiles the schema into immutable validators; per-call state lives in its context.
 */
public final class FormatSchema {
    public static final String PROGRAMME = "programme.schema.json";
    public static final String CATALOGUE = "catalogue.schema.json";

    /** Each schema compiled once; a schema {@link #prepare prepared} in the background is joined when loaded. */
    private static final Map<String, CompletableFuture<FormatSchema>> COMPILED = new ConcurrentHashMap<>();

    private final Schema schema;

    private FormatSchema(Schema schema) {
        this.schema = schema;
    }

    /** The schema shipped in the core jar under {@code dev/mesolint/schema/}, compiled on first use. */
    public static FormatSchema load(String name) {
        CompletableFuture<FormatSchema> mine = new CompletableFuture<>();
        CompletableFuture<FormatSchema> known = COMPILED.putIfAbsent(name, mine);
        if (known == null) {
            compileInto(mine, name);
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
     * Starts compiling {@code name} on a background thread, so that a run's start-up (configuration, profiles, the
     * file walk) overlaps the compile, about a third of the start-up's time; {@link #load} then joins it.
     */
    public static void prepare(String name) {
        CompletableFuture<FormatSchema> mine = new CompletableFuture<>();
        if (COMPILED.putIfAbsent(name, mine) == null) {
            Thread compiler = new Thread(() -> compileInto(mine, name), "mesolint-schema");
            compiler.setDaemon(true);
            compiler.start();
        }
    }

    private static void compileInto(CompletableFuture<FormatSchema> result, String name) {
        try {
            result.complete(compile(name));
        } catch (RuntimeException | Error e) {
            result.completeExceptionally(e);
        }
    }

    private static FormatSchema compile(String name) {
        SchemaRegistry registry = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);
        try (InputStream in = FormatSchema.class.getResourceAsStream("/dev/mesolint/schema/" + name)) {
            if (in == null) {
                throw new IllegalStateException("schema " + name + " is missing from the core jar");
            }
            Schema schema = registry.getSchema(in);
            schema.initializeValidators();
            return new FormatSchema(schema);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The violations, located at the YAML node each is about, one per place, in file order. */
    public List<Violation> validate(LocatedDocument document) {
        // Numbers no field accepts are refused first: the validator and the binder read numbers as long and int.
        List<Violation> outOfRange = NumberRange.check(document);
        if (!outOfRange.isEmpty()) {
            return outOfRange;
        }
        List<com.networknt.schema.Error> errors = schema.validate(document.root());
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
