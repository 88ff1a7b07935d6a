package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Opens the HTML report of a sample programme in headless Chromium: the charts must be in the rendered page, the page
 * must log nothing to the console (it has no script, so any message is a blocked load or a markup problem), and a
 * screenshot is kept at {@code target/report-screenshot.png} for people to look at.
 *
 * <p>Skipped when no Chromium is installed ({@code apt-get install -y chromium}); {@code -Dmesolint.chromium=PATH}
 * names another binary.
 */
class HtmlReportChromiumTests {
    private static final Path TARGET = Path.of("target").toAbsolutePath();
    private static final Pattern CONSOLE = Pattern.compile(":CONSOLE[:(][^\\]]*\\] (.*)");
    private static final Optional<Path> CHROMIUM = locate();

    @BeforeEach
    void requireChromium() {
        Assumptions.assumeTrue(CHROMIUM.isPresent(),
                "Chromium not installed (apt-get install -y chromium); the browser check is skipped");
    }

    private static Optional<Path> locate() {
        String named = System.getProperty("mesolint.chromium", "");
        if (!named.isBlank()) {
            return Optional.of(Path.of(named)).filter(Files::isExecutable);
        }
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            for (String name : List.of("chromium", "chromium-browser")) {
                Path candidate = Path.of(dir, name);
                if (Files.isExecutable(candidate)) {
                    return Optional.of(candidate);
                }
            }
        }
        return Optional.empty();
    }

    /** The upper/lower sample with hand-made figures, written where a CI artefact upload would find it. */
    private static Path writeReport() throws IOException {
        var run = ReportFixtures.check(HandMadeFigures.FILE, "sample-programs/broken/week-sequence.yaml");
        ReportFigures figures = file -> file.displayPath().equals(HandMadeFigures.FILE)
                ? Optional.of(new HandMadeFigures()) : Optional.empty();
        Path html = TARGET.resolve("report-chromium/mesolint.html");
        // The programme with charts first, so that the screenshot shows them.
        var ordered = new dev.mesolint.core.engine.RunReport(List.of(run.files().get(1), run.files().get(0)),
                run.failOn(), run.missing());
        ReportFiles.write(ReportFixtures.input(ordered).withFigures(figures),
                new ReportTarget(ReportFormat.HTML, html));
        return html;
    }

    private record Result(int exit, String stdout, String stderr) {
        List<String> consoleMessages() {
            List<String> messages = new ArrayList<>();
            Matcher m = CONSOLE.matcher(stderr);
            while (m.find()) {
                messages.add(m.group(1));
            }
            return messages;
        }
    }

    /** Runs Chromium with a fresh profile under {@code temp}, which also holds its captured output. */
    private static Result run(Path temp, String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(CHROMIUM.orElseThrow().toString(), "--headless", "--no-sandbox",
                "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--disable-dev-shm-usage", "--hide-scrollbars",
                "--user-data-dir=" + temp.resolve("profile"), "--enable-logging=stderr", "--v=0"));
        command.addAll(List.of(args));
        Path out = Files.createTempFile(temp, "out", ".txt");
        Path err = Files.createTempFile(temp, "err", ".txt");
        Process p = new ProcessBuilder(command).redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null")))
                .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("Chromium did not finish within 120 s: " + command);
        }
        return new Result(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }

    @Test
    void consoleMessagesAreDetected(@TempDir Path temp) throws Exception {
        // Proves that the check below can see console output at all.
        Path probe = temp.resolve("probe.html");
        Files.writeString(probe, "<!DOCTYPE html><title>probe</title><script>console.error('mesolint-probe')</script>");
        Result r = run(temp, "--dump-dom", probe.toUri().toString());
        assertTrue(r.consoleMessages().stream().anyMatch(m -> m.contains("mesolint-probe")), r.stderr());
    }

    @Test
    void rendersTheChartsWithoutConsoleMessages(@TempDir Path temp) throws Exception {
        Path html = writeReport();
        Result r = run(temp, "--dump-dom", html.toUri().toString());
        assertEquals(0, r.exit(), r.stderr());
        assertEquals(List.of(), r.consoleMessages(), "the page logged to the console");
        String dom = r.stdout();
        for (String chart : List.of("p1-volume", "p1-heat", "p1-stimulus", "p1-time")) {
            assertTrue(dom.contains("id=\"" + chart + "\""), chart + " missing from the rendered page");
        }
        assertTrue(dom.contains("Weekly hard sets per muscle against floor and cap"));
        assertTrue(dom.contains("<footer>"));
    }

    @Test
    void keepsAScreenshot(@TempDir Path temp) throws Exception {
        Path html = writeReport();
        Path png = TARGET.resolve("report-screenshot.png");
        Files.deleteIfExists(png);
        Result r = run(temp, "--screenshot=" + png, "--window-size=1280,2000",
                html.toUri().toString());
        assertEquals(0, r.exit(), r.stderr());
        assertEquals(List.of(), r.consoleMessages());
        byte[] bytes = Files.readAllBytes(png);
        assertTrue(bytes.length > 20_000, "a page with charts is not a blank image: " + bytes.length + " bytes");
        assertEquals((byte) 0x89, bytes[0]);
        assertEquals("PNG", new String(bytes, 1, 3, StandardCharsets.US_ASCII));
    }
}
