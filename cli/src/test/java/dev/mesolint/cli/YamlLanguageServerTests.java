package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * Drives the real yaml-language-server (npm) over stdio as an editor would, on a programme whose first line points
 * at the schema 'mesolint schema' wrote: a misspelt exercise id gets a diagnostic with our message, and completion
 * after {@code exercise: } offers the catalogue's ids. Skipped, saying why, when node or the server is not installed
 * ({@code .ci/run} installs both).
 */
class YamlLanguageServerTests {
    private static final JsonMapper JSON = JsonMapper.builder().build();
    /** Where {@code .ci/run} installs the server; {@code -Dmesolint.yamlLanguageServer=PATH} names another. */
    private static final Path INSTALLED = Path.of(System.getProperty("user.home"), ".cache", "mesolint",
            "yaml-language-server", "node_modules", "yaml-language-server", "bin", "yaml-language-server");

    @TempDir
    Path repo;

    private Process server;
    private final BlockingQueue<JsonNode> incoming = new LinkedBlockingQueue<>();
    private int nextId = 1;

    private static final String PROGRAMME = """
            # yaml-language-server: $schema=../.mesolint/schema/programme.schema.json
            # Invented demo programme of the fictional Harbourside Strength Club.
            format: 1
            programme:
              id: harbour-editor
              level: intermediate
              goal: hypertrophy
            weeks:
              - week: 1
                sessions:
                  - day: 1
                    work:
                      - exercise: barbell-bench-pres
                        sets: 3
                        reps: twelve
                        rir: 2
                        rest: 3min
                      - exercise:\s
            """;

    @AfterEach
    void stop() {
        if (server != null) {
            server.destroy();
        }
    }

    @Test
    void aMisspeltExerciseIsFlaggedAndCompletionOffersCatalogueIds() throws Exception {
        Path bin = Path.of(System.getProperty("mesolint.yamlLanguageServer", INSTALLED.toString()));
        Optional<Path> node = onPath("node");
        Assumptions.assumeTrue(node.isPresent(), "node is not installed: the editor test needs it (.ci/run "
                + "installs it with the yaml-language-server npm package)");
        Assumptions.assumeTrue(Files.isRegularFile(bin), "yaml-language-server is not installed at " + bin
                + ": run .ci/run, or pass -Dmesolint.yamlLanguageServer=PATH");

        StringWriter out = new StringWriter();
        int exit = MesolintCommand.execute(new String[] {"schema", "--root", repo.toString(), "--out",
            repo.resolve(".mesolint/schema").toString()}, new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(0, exit, out.toString());
        Path file = repo.resolve("programmes/block.yaml");
        Files.createDirectories(file.getParent());
        Files.writeString(file, PROGRAMME);
        String uri = file.toUri().toString();

        server = new ProcessBuilder(node.get().toString(), bin.toString(), "--stdio")
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        Thread reader = new Thread(() -> readMessages(server.getInputStream()), "yaml-language-server reader");
        reader.setDaemon(true);
        reader.start();

        ObjectNode init = JSON.createObjectNode();
        init.putNull("processId");
        init.put("rootUri", repo.toUri().toString());
        ObjectNode caps = init.putObject("capabilities");
        caps.putObject("textDocument").putObject("completion").putObject("completionItem")
                .put("snippetSupport", false);
        caps.putObject("workspace").put("configuration", true);
        request("initialize", init);
        notify("initialized", JSON.createObjectNode());
        ObjectNode settings = JSON.createObjectNode();
        settings.putObject("settings").putObject("yaml").put("validate", true).put("completion", true);
        notify("workspace/didChangeConfiguration", settings);
        ObjectNode open = JSON.createObjectNode();
        open.putObject("textDocument").put("uri", uri).put("languageId", "yaml").put("version", 1)
                .put("text", PROGRAMME);
        notify("textDocument/didOpen", open);

        JsonNode published = await(m -> "textDocument/publishDiagnostics".equals(m.path("method").asString(""))
                && uri.equals(m.at("/params/uri").asString("")) && m.at("/params/diagnostics").size() > 0);
        List<String> diagnostics = new ArrayList<>();
        for (JsonNode d : published.at("/params/diagnostics")) {
            diagnostics.add((d.at("/range/start/line").asInt() + 1) + ":" + (d.at("/range/start/character").asInt() + 1)
                    + " " + d.get("message").asString());
        }
        // Shown in the build log, so that a reader sees what an editor shows.
        System.out.println("yaml-language-server diagnostics:");
        diagnostics.forEach(d -> System.out.println("  " + d));
        assertTrue(diagnostics.stream().anyMatch(d -> d.startsWith("13:") && d.contains("unknown exercise id")),
                diagnostics.toString());
        assertTrue(diagnostics.stream().anyMatch(d -> d.startsWith("15:") && d.contains("Reps per set")),
                "our readable message, not a raw pattern: " + diagnostics);

        ObjectNode position = JSON.createObjectNode();
        position.putObject("textDocument").put("uri", uri);
        position.putObject("position").put("line", 17).put("character", 22);
        JsonNode completion = await(request("textDocument/completion", position));
        JsonNode items = completion.at("/result").isArray() ? completion.at("/result") : completion.at("/result/items");
        List<String> labels = new ArrayList<>();
        items.forEach(i -> labels.add(i.get("label").asString()));
        System.out.println("yaml-language-server completion after 'exercise: ': " + labels.size() + " items, e.g. "
                + labels.stream().filter(l -> l.contains("bench")).toList());
        assertTrue(labels.contains("barbell-bench-press"), labels.toString());
        assertTrue(labels.contains("barbell-back-squat"), labels.toString());
    }

    private Predicate<JsonNode> request(String method, JsonNode params) throws IOException {
        int id = nextId++;
        ObjectNode message = JSON.createObjectNode();
        message.put("jsonrpc", "2.0");
        message.put("id", id);
        message.put("method", method);
        message.set("params", params);
        send(message);
        return m -> m.has("id") && m.get("id").asInt() == id && !m.has("method");
    }

    private void notify(String method, JsonNode params) throws IOException {
        ObjectNode message = JSON.createObjectNode();
        message.put("jsonrpc", "2.0");
        message.put("method", method);
        message.set("params", params);
        send(message);
    }

    private synchronized void send(JsonNode message) throws IOException {
        byte[] body = JSON.writeValueAsBytes(message);
        OutputStream to = server.getOutputStream();
        to.write(("Content-Length: " + body.length + "\r\n\r\n").getBytes(StandardCharsets.US_ASCII));
        to.write(body);
        to.flush();
    }

    /** The first message {@code wanted} accepts, answering the server's own requests meanwhile; 60 s at most. */
    private JsonNode await(Predicate<JsonNode> wanted) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (System.nanoTime() < deadline) {
            JsonNode m = incoming.poll(1, TimeUnit.SECONDS);
            if (m == null) {
                continue;
            }
            if (m.has("method") && m.has("id")) {
                answer(m);
            } else if (wanted.test(m)) {
                return m;
            }
        }
        throw new AssertionError("yaml-language-server sent no expected message within 60 s");
    }

    /** Settings for {@code workspace/configuration}, nothing for other requests (capability registration). */
    private void answer(JsonNode request) throws IOException {
        ObjectNode reply = JSON.createObjectNode();
        reply.put("jsonrpc", "2.0");
        reply.set("id", request.get("id"));
        if ("workspace/configuration".equals(request.get("method").asString())) {
            var result = reply.putArray("result");
            for (JsonNode item : request.at("/params/items")) {
                if ("yaml".equals(item.path("section").asString(""))) {
                    result.addObject().put("validate", true).put("completion", true);
                } else {
                    result.addNull();
                }
            }
        } else {
            reply.putNull("result");
        }
        send(reply);
    }

    private void readMessages(InputStream in) {
        try {
            while (true) {
                int length = -1;
                String line;
                while (!(line = headerLine(in)).isEmpty()) {
                    if (line.toLowerCase(java.util.Locale.ROOT).startsWith("content-length:")) {
                        length = Integer.parseInt(line.substring(15).trim());
                    }
                }
                if (length < 0) {
                    return;
                }
                incoming.add(JSON.readTree(in.readNBytes(length)));
            }
        } catch (IOException | RuntimeException e) {
            // The server stopped: the test's await reports what was missing.
        }
    }

    private static String headerLine(InputStream in) throws IOException {
        ByteArrayOutputStream line = new ByteArrayOutputStream();
        int c;
        while ((c = in.read()) != -1 && c != '\n') {
            if (c != '\r') {
                line.write(c);
            }
        }
        if (c == -1 && line.size() == 0) {
            throw new IOException("end of stream");
        }
        return line.toString(StandardCharsets.US_ASCII);
    }

    private static Optional<Path> onPath(String program) {
        for (String dir : System.getenv().getOrDefault("PATH", "").split(java.io.File.pathSeparator)) {
            Path candidate = Path.of(dir, program);
            if (Files.isExecutable(candidate)) {
                return Optional.of(candidate);
            }
        }
        return Optional.empty();
    }
}
