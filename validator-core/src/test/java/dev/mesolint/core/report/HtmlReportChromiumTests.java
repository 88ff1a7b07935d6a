package dev.mesolint.core.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Opens the HTML report and the athlete's sheet in headless Chromium: the rendered page must hold the prescription
 * rows and worked-out loads, the findings under their own week, the index marks and the charts; it must log nothing
 * to the console (a blocked script, a policy violation or a markup problem would); printed to PDF on A4 and Letter no
 * page may hold only a heading (text per page from {@code pdftotext}); the sheet of a four-week sample prints on at
 * most four pages; and axe-core finds no serious or critical violation. Screenshots and PDFs are kept under
 * {@code target/report-chromium/} for people to look at.
 *
 * <p>Skipped when no Chromium is installed ({@code apt-get install -y chromium}); {@code -Dmesolint.chromium=PATH}
 * names another binary. The PDF checks need poppler-utils, the accessibility check the axe-core npm package
 * ({@code -Dmesolint.axe=PATH} to its {@code axe.min.js}); CI installs both, so there they are required.
 */
class HtmlReportChromiumTests {
    private static final Path TARGET = Path.of("target").toAbsolutePath();
    private static final Path OUT = TARGET.resolve("report-chromium");
    private static final Pattern CONSOLE = Pattern.compile(":CONSOLE[:(][^\\]]*\\] \"?(.*)");
    private static final Optional<Path> CHROMIUM = locate(System.getProperty("mesolint.chromium", ""),
            "chromium", "chromium-browser");
    private static final Optional<Path> PDFTOTEXT = locate("", "pdftotext");
    private static final Optional<Path> AXE = Optional.of(Path.of(System.getProperty("mesolint.axe",
            System.getProperty("user.home") + "/.cache/mesolint/axe-core/node_modules/axe-core/axe.min.js")))
            .filter(Files::isRegularFile);
    private static final boolean CI = "true".equals(System.getenv("CI"));
    private static final String FOUR_WEEKS = "sample-programs/programmes/minimal-30-minutes.yaml";
    private static final String ROUNDING = "validator-core/src/test/resources/report/plate-rounding.yaml";

    @BeforeEach
    void requireChromium() {
        Assumptions.assumeTrue(CHROMIUM.isPresent(),
                "Chromium not installed (apt-get install -y chromium); the browser check is skipped");
    }

    private static void require(Optional<Path> tool, String what) {
        if (CI) {
            assertTrue(tool.isPresent(), what + " is installed by .ci/run and required in CI");
        }
        Assumptions.assumeTrue(tool.isPresent(), what + " not installed; this check is skipped");
    }

    private static Optional<Path> locate(String named, String... names) {
        if (!named.isBlank()) {
            return Optional.of(Path.of(named)).filter(Files::isExecutable);
        }
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            for (String name : names) {
                Path candidate = Path.of(dir, name);
                if (Files.isExecutable(candidate)) {
                    return Optional.of(candidate);
                }
            }
        }
        return Optional.empty();
    }

    /**
     * The upper/lower sample with hand-made figures, the strength sample, the plate-rounding programme (a finding in
     * week 3 on a line week 1 writes) and a broken sample, written where a CI artefact upload would find them.
     */
    private static Path writeReport() throws IOException {
        var run = ReportFixtures.check(HandMadeFigures.FILE, "sample-programs/programmes/strength-block.yaml", ROUNDING,
                "sample-programs/broken/week-sequence.yaml");
        ReportFigures figures = file -> file.displayPath().equals(HandMadeFigures.FILE)
                ? Optional.of(new HandMadeFigures()) : Optional.empty();
        Path html = OUT.resolve("mesolint.html");
        // The programme with charts first, so that the screenshot shows them.
        List<dev.mesolint.core.engine.FileReport> files = new ArrayList<>(run.files());
        files.sort(java.util.Comparator.comparing(f -> !f.displayPath().equals(HandMadeFigures.FILE)));
        var ordered = new dev.mesolint.core.engine.RunReport(files, run.failOn(), run.missing());
        ReportFiles.write(ReportFixtures.withCatalogue(ordered).withFigures(figures),
                new ReportTarget(ReportFormat.HTML, html));
        return html;
    }

    private static Path writeSheet() throws IOException {
        Path html = OUT.resolve("mesolint-sheet.html");
        ReportFiles.write(ReportFixtures.withCatalogue(ReportFixtures.check(FOUR_WEEKS)),
                new ReportTarget(ReportFormat.HTML_SHEET, html));
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
        return exec(temp, command);
    }

    private static Result exec(Path temp, List<String> command) throws IOException, InterruptedException {
        Path out = Files.createTempFile(temp, "out", ".txt");
        Path err = Files.createTempFile(temp, "err", ".txt");
        Process p = new ProcessBuilder(command).redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null")))
                .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("did not finish within 120 s: " + command);
        }
        return new Result(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }

    @Test
    void consoleMessagesAreDetected(@TempDir Path temp) throws Exception {
        // Proves that the checks below can see console output at all.
        Path probe = temp.resolve("probe.html");
        Files.writeString(probe, "<!DOCTYPE html><title>probe</title><script>console.error('mesolint-probe')</script>");
        Result r = run(temp, "--dump-dom", probe.toUri().toString());
        assertTrue(r.consoleMessages().stream().anyMatch(m -> m.contains("mesolint-probe")), r.stderr());
    }

    @Test
    void rendersPrescriptionFindingsIndexAndChartsWithoutConsoleMessages(@TempDir Path temp) throws Exception {
        Path html = writeReport();
        Result r = run(temp, "--dump-dom", html.toUri().toString());
        assertEquals(0, r.exit(), r.stderr());
        assertEquals(List.of(), r.consoleMessages(), "the page logged to the console (a blocked script logs here)");
        String dom = r.stdout();
        for (String chart : List.of("p1-volume", "p1-heat", "p1-stimulus", "p1-time")) {
            assertTrue(dom.contains("id=\"" + chart + "\""), chart + " missing from the rendered page");
        }
        // The index: a mark and a word per programme, and the script ran under the policy (it adds sort buttons).
        String index = between(dom, "<table class=\"index\">", "</table>");
        assertEquals(4, count(index, "<tr><td data-sort="), index);
        assertEquals(2, count(index, "✖ fails"), "week-sequence and the plate-rounding programme fail on errors");
        assertEquals(2, count(index, "✔ passes"));
        assertTrue(index.contains("<button type=\"button\" class=\"sort\">Result</button>"), index);

        // The prescription of the strength sample (p2): rows and loads, worked by hand from the 1RMs with 2.5 kg
        // plates to the nearest step (common practice): 80% of 140 kg = 112 -> 112.5 kg; of 95 kg = 76 -> 75 kg.
        String strength = programmeId(index, "Harbourside six-week strength block");
        String strengthWeek1 = between(dom, "id=\"" + strength + "-w1\"", "</section>");
        assertEquals(4, count(strengthWeek1, "<caption>"), "four sessions in week 1");
        assertTrue(rowLoad(strengthWeek1, "Barbell back squat").equals("112.5 kg"), strengthWeek1);
        assertEquals("75 kg", rowLoad(strengthWeek1, "Barbell bench press"));
        // Week 5 at 90% is near-maximal, so down (common practice): 90% of 140 kg = 126 -> 125 kg.
        assertEquals("125 kg", rowLoad(between(dom, "id=\"" + strength + "-w5\"", "</section>"), "Barbell back squat"));
        // Hand-worked: 75% of 142.5 kg = 106.875 -> 107.5 kg; 70% of 142.5 kg under a 70% cap -> 97.5 kg.
        String check = programmeId(index, "Harbourside plate rounding check");
        String rounding = between(dom, "id=\"" + check + "-w1\"", "</section>");
        assertEquals("107.5 kg", rowLoad(rounding, "Barbell back squat"));
        assertEquals("97.5 kg", rowLoad(rounding, "Barbell bench press"));

        // Findings under their own week: the week-3 bench press over the cap sits under "Week 3", though its line is
        // written in week 1, and the row of week 3 links to it.
        String findings = between(dom, "id=\"" + check + "-findings\"", "</section>");
        String week3 = between(findings, "<h4>Week 3 · day 1 (Heavy)</h4>", "</ul>");
        assertTrue(week3.contains("data-rule=\"constraint-load\""), findings);
        String week1 = between(findings, "<h4>Week 1 · day 1 (Heavy)</h4>", "</ul>");
        assertTrue(!week1.contains("data-rule=\"constraint-load\""), "week 1 keeps to the cap: " + week1);
        assertTrue(between(dom, "id=\"" + check + "-w3\"", "</section>").contains("✖ constraint-load</a>"));
        // The filters exist only because the script ran.
        assertTrue(findings.contains("class=\"filter\""), "the findings filter was added");
        assertTrue(dom.contains("<footer>"));
    }

    /** The element id of the programme the index lists under {@code title}: {@code p2}. */
    private static String programmeId(String index, String title) {
        Matcher m = Pattern.compile("<a href=\"#(p\\d+)\">" + Pattern.quote(title) + "</a>").matcher(index);
        assertTrue(m.find(), title + " is in the index: " + index);
        return m.group(1);
    }

    private static String rowLoad(String week, String exercise) {
        Matcher m = Pattern.compile("<th scope=\"row\">" + Pattern.quote(exercise)
                + "</th>.*?<td class=\"load[^\"]*\"><strong>([^<]+)</strong>").matcher(week);
        assertTrue(m.find(), exercise + " has a worked-out load in " + week);
        return m.group(1);
    }

    private static String between(String text, String start, String end) {
        int from = text.indexOf(start);
        assertTrue(from >= 0, "missing: " + start);
        int to = text.indexOf(end, from + start.length());
        return text.substring(from, to < 0 ? text.length() : to);
    }

    private static int count(String text, String part) {
        int n = 0;
        for (int at = text.indexOf(part); at >= 0; at = text.indexOf(part, at + part.length())) {
            n++;
        }
        return n;
    }

    @Test
    void keepsAScreenshot(@TempDir Path temp) throws Exception {
        Path html = writeReport();
        Path png = OUT.resolve("report-screenshot.png");
        Files.deleteIfExists(png);
        Result r = run(temp, "--screenshot=" + png, "--window-size=1280,2400", html.toUri().toString());
        assertEquals(0, r.exit(), r.stderr());
        assertEquals(List.of(), r.consoleMessages());
        byte[] bytes = Files.readAllBytes(png);
        assertTrue(bytes.length > 20_000, "a page with charts is not a blank image: " + bytes.length + " bytes");
        assertEquals((byte) 0x89, bytes[0]);
        assertEquals("PNG", new String(bytes, 1, 3, StandardCharsets.US_ASCII));
    }

    /** The page's heading texts (h1-h4, captions), whitespace collapsed, tags dropped. */
    private static Set<String> headings(String html) {
        Set<String> all = new LinkedHashSet<>();
        Matcher m = Pattern.compile("<(h[1-4]|caption|figcaption)\\b[^>]*>(.*?)</\\1>|<(figcaption)\\b[^>]*>(.*?)<p>",
                Pattern.DOTALL).matcher(html);
        while (m.find()) {
            String inner = m.group(2) != null ? m.group(2) : m.group(4);
            String text = plain(inner);
            if (!text.isEmpty()) {
                all.add(text);
            }
        }
        return all;
    }

    private static String plain(String html) {
        return html.replaceAll("<[^>]+>", " ").replace("&amp;", "&").replace("&#39;", "'").replace("&quot;", "\"")
                .replace("&lt;", "<").replace("&gt;", ">").replaceAll("\\s+", " ").trim();
    }

    /** Prints {@code html} to PDF on {@code paper} (A4 or Letter) and returns each page's text. */
    private static List<String> print(Path temp, Path html, String paper) throws Exception {
        String page = Files.readString(html, StandardCharsets.UTF_8).replace("</head>",
                "<style>@page { size: " + paper + "; }</style>\n</head>");
        Path copy = html.resolveSibling(html.getFileName().toString().replace(".html", "-" + paper + ".html"));
        Files.writeString(copy, page, StandardCharsets.UTF_8);
        Path pdf = copy.resolveSibling(copy.getFileName().toString().replace(".html", ".pdf"));
        Files.deleteIfExists(pdf);
        Result r = run(temp, "--no-pdf-header-footer", "--print-to-pdf=" + pdf, copy.toUri().toString());
        assertEquals(0, r.exit(), r.stderr());
        assertTrue(Files.size(pdf) > 1000, "a PDF was printed");
        Result text = exec(temp, List.of(PDFTOTEXT.orElseThrow().toString(), "-layout", pdf.toString(), "-"));
        assertEquals(0, text.exit(), text.stderr());
        List<String> pages = new ArrayList<>(List.of(text.stdout().split("\f", -1)));
        if (!pages.isEmpty() && pages.get(pages.size() - 1).isBlank()) {
            pages.remove(pages.size() - 1);
        }
        return pages;
    }

    /** Fails on a printed page whose every line is (part of) a heading: a title orphaned from what it heads. */
    private static void assertNoHeadingOnlyPage(List<String> pages, Set<String> headings, String what) {
        for (int i = 0; i < pages.size(); i++) {
            List<String> lines = pages.get(i).lines().map(l -> l.replaceAll("\\s+", " ").trim())
                    .filter(l -> !l.isEmpty()).toList();
            assertTrue(!lines.isEmpty(), what + ": page " + (i + 1) + " is blank");
            boolean onlyHeadings = lines.stream().allMatch(l -> headings.stream().anyMatch(h -> h.contains(l)));
            assertTrue(!onlyHeadings, what + ": page " + (i + 1) + " holds only a heading: " + lines);
        }
    }

    @Test
    void printsOnA4AndLetterWithoutAPageOfOnlyAHeading(@TempDir Path temp) throws Exception {
        require(PDFTOTEXT, "pdftotext (poppler-utils)");
        Path html = writeReport();
        Set<String> headings = headings(Files.readString(html, StandardCharsets.UTF_8));
        assertTrue(headings.contains("Training figures") && headings.contains("Findings"), headings.toString());
        for (String paper : List.of("A4", "Letter")) {
            List<String> pages = print(temp, html, paper);
            assertTrue(pages.size() > 3, paper + ": " + pages.size() + " pages");
            assertNoHeadingOnlyPage(pages, headings, "report on " + paper);
            assertTrue(pages.get(pages.size() - 1).contains("Caution."), "the caution closes the printed report");
        }
    }

    @Test
    void theSheetOfAFourWeekSamplePrintsAtMostOnePagePerWeek(@TempDir Path temp) throws Exception {
        require(PDFTOTEXT, "pdftotext (poppler-utils)");
        Path html = writeSheet();
        Set<String> headings = headings(Files.readString(html, StandardCharsets.UTF_8));
        for (String paper : List.of("A4", "Letter")) {
            List<String> pages = print(temp, html, paper);
            assertTrue(pages.size() <= 4, paper + ": four weeks printed on " + pages.size() + " pages");
            assertNoHeadingOnlyPage(pages, headings, "sheet on " + paper);
            for (int week = 1; week <= 4; week++) {
                String heading = "Week " + week;
                long on = pages.stream().filter(p -> p.lines().anyMatch(l -> l.trim().equals(heading))).count();
                assertEquals(1, on, heading + " is printed once");
            }
            assertTrue(pages.get(0).contains("Caution."), "the caution heads the sheet");
        }
        Result shot = run(temp, "--screenshot=" + OUT.resolve("sheet-screenshot.png"), "--window-size=1000,1400",
                html.toUri().toString());
        assertEquals(0, shot.exit(), shot.stderr());
        assertEquals(List.of(), shot.consoleMessages());
    }

    @Test
    void axeCoreFindsNoSeriousViolation(@TempDir Path temp) throws Exception {
        require(AXE, "axe-core (npm install axe-core)");
        for (Path html : List.of(writeReport(), writeSheet())) {
            // A copy with axe and a runner added; the report's policy would rightly block them, so the copy drops it.
            String page = Files.readString(html, StandardCharsets.UTF_8)
                    .replaceFirst("<meta http-equiv=\"Content-Security-Policy\"[^>]*>", "")
                    .replace("</body>", "<script>" + Files.readString(AXE.get(), StandardCharsets.UTF_8)
                            + "</script>\n<script>axe.run(document, {resultTypes: ['violations']}).then(function (r) {"
                            + " r.violations.forEach(function (v) { console.log('AXE ' + v.impact + ' ' + v.id + ' '"
                            + " + v.nodes.length + ' ' + v.nodes[0].target.join(' ')); });"
                            + " console.log('AXE-DONE ' + r.violations.length); });</script>\n</body>");
            Path copy = temp.resolve("axe-" + html.getFileName());
            Files.writeString(copy, page, StandardCharsets.UTF_8);
            Result r = run(temp, "--virtual-time-budget=30000", "--dump-dom", copy.toUri().toString());
            List<String> messages = r.consoleMessages();
            assertTrue(messages.stream().anyMatch(m -> m.startsWith("AXE-DONE")), "axe ran: " + r.stderr());
            List<String> serious = messages.stream().filter(m -> m.startsWith("AXE serious")
                    || m.startsWith("AXE critical")).toList();
            assertEquals(List.of(), serious, html.getFileName() + ": serious accessibility violations");
        }
    }
}
