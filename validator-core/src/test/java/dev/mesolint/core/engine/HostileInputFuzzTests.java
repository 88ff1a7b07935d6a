package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.report.ConsoleReport;
import dev.mesolint.core.report.JsonReport;
import dev.mesolint.core.report.ReportInput;
import dev.mesolint.core.report.SarifReport;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.text.SafeWriter;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Mutated sample programmes, a bounded number per build: whatever the bytes, a file gets findings (never an escaping
 * exception or an internal error), its reports parse back, and its console lines hold no control character. The
 * mutations are the kinds that broke earlier versions: numbers far out of range, chained repeats that grow, lone
 * surrogates and terminal escapes in strings, cut files, stray indentation and anchors.
 */
class HostileInputFuzzTests {
    private static final Path SAMPLES = Path.of("..", "sample-programs").toAbsolutePath().normalize();
    private static final Path ROOT = SAMPLES.getParent();
    private static final Checker CHECKER = new Checker(CheckRequest.of(List.of(), ROOT), BuiltInRules.all());
    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final List<String> SOURCES = sources();

    private static final List<String> HOSTILE_NUMBERS = List.of("10000000000000000000", "1.0e19", "-1", "0",
            "99999999999999999999", "2147483648", "1-2147483648", "9223372036854775808", "1e400", "-0.0", ".nan",
            "0x7fffffff", "3-1", "101");
    private static final List<String> HOSTILE_TEXT = List.of("\\ud800", "\\udfff", "\\e[31m", "\\a", "\\n", "\\r\\n",
            "\\u202e", "\\0", "\\u0085", "\\x1b]0;t\\a");

    @Property(tries = 2000, shrinking = ShrinkingMode.OFF, seed = "20261202")
    void everyMutatedProgrammeIsReportedWithoutAnInternalError(@ForAll("mutated") String text) throws IOException {
        FileReport report = CHECKER.checkFile(ROOT.resolve("fuzz/mutated.yaml"), text.getBytes(StandardCharsets.UTF_8));
        assertEquals("fuzz/mutated.yaml", report.displayPath());
        List<String> internal = report.findings().stream().filter(f -> f.ruleId().equals(FrameworkRules.INTERNAL_ERROR))
                .map(Finding::message).toList();
        assertTrue(internal.isEmpty(), () -> internal + "\n--- input:\n" + text);
        RunReport run = new RunReport(List.of(report), dev.mesolint.core.finding.Severity.ERROR, List.of());
        ReportInput input = ReportInput.of(run, BuiltInRules.all(), ROOT);
        JSON.readTree(written(new JsonReport(), input));
        JSON.readTree(written(new SarifReport(), input));
        for (Finding f : report.findings()) {
            for (String line : ConsoleReport.lines(f)) {
                assertFalse(line.chars().anyMatch(c -> c < 0x20 || c >= 0x7f && c <= 0x9f || c == 0x2028
                        || Character.isSurrogate((char) c) && !pairedAt(line, line.indexOf(c))), line);
            }
        }
    }

    /** What a report writer produces, through the same safe layer as a report file. */
    private static String written(dev.mesolint.core.report.ReportWriter writer, ReportInput input)
            throws IOException {
        StringWriter out = new StringWriter();
        try (SafeWriter safe = new SafeWriter(out)) {
            writer.write(input, safe);
        }
        return out.toString();
    }

    private static boolean pairedAt(String s, int i) {
        char c = s.charAt(i);
        return Character.isHighSurrogate(c) ? i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))
                : i > 0 && Character.isHighSurrogate(s.charAt(i - 1));
    }

    @Provide
    Arbitrary<String> mutated() {
        Arbitrary<String> source = Arbitraries.of(SOURCES);
        Arbitrary<List<Mutation>> mutations = mutation().list().ofMinSize(1).ofMaxSize(4);
        return Combinators.combine(source, mutations).as((text, list) -> {
            String out = text;
            for (Mutation m : list) {
                out = m.apply(out);
            }
            return out;
        });
    }

    /** One change to a programme's text, at a position given as a fraction of its length. */
    private interface Mutation {
        String apply(String text);
    }

    private Arbitrary<Mutation> mutation() {
        Arbitrary<Double> at = Arbitraries.doubles().between(0, 1);
        return Arbitraries.oneOf(
                Combinators.combine(at, Arbitraries.of(HOSTILE_NUMBERS)).as((p, n) -> t -> replaceNumber(t, p, n)),
                Combinators.combine(at, Arbitraries.of(HOSTILE_TEXT)).as((p, s) -> t -> intoQuotedText(t, p, s)),
                Combinators.combine(at, Arbitraries.integers().between(1, 19))
                        .as((p, k) -> t -> t + growingRepeats(k)),
                at.map(p -> t -> t.substring(0, (int) (p * t.length()))),
                Combinators.combine(at, Arbitraries.of("\t", "  ", "- ", ": ", "&a ", "*a ", "<<: *a\n", "---\n",
                        "? ", "!!binary ", "\uFEFF", "#", "[", "{")).as((p, s) -> t -> insert(t, p, s)),
                Combinators.combine(at, at).as((p, q) -> t -> duplicateLine(t, p, q)),
                at.map(p -> t -> deleteLine(t, p)),
                Combinators.combine(at, Arbitraries.chars().all()).as((p, c) -> t -> insert(t, p, String.valueOf(c))));
    }

    private static String insert(String t, double p, String s) {
        int i = (int) (p * t.length());
        return t.substring(0, i) + s + t.substring(i);
    }

    /** Replaces the digits of the number nearest after {@code p} with {@code number}. */
    private static String replaceNumber(String t, double p, String number) {
        var m = java.util.regex.Pattern.compile("(?<=: )\\d[\\d.]*").matcher(t);
        int from = (int) (p * t.length());
        if (m.find(from) || m.find(0)) {
            return t.substring(0, m.start()) + number + t.substring(m.end());
        }
        return t;
    }

    /** Puts an escape into a double-quoted scalar written as a new title, so YAML decodes it into the string. */
    private static String intoQuotedText(String t, double p, String escape) {
        String line = "  title: \"x " + escape + " y\"\n";
        int i = t.indexOf("\n  title:");
        if (i < 0) {
            return insert(t, p, "\"" + escape + "\"");
        }
        int end = t.indexOf('\n', i + 1);
        return t.substring(0, i + 1) + line + t.substring(end + 1);
    }

    private static String growingRepeats(int sets) {
        StringBuilder b = new StringBuilder();
        for (int k = 2; k <= 104; k++) {
            b.append("  - {week: ").append(100 + k).append(", repeat: ").append(k == 2 ? 1 : 99 + k)
                    .append(", adjust: {sets: ").append(sets).append("}}\n");
        }
        return b.toString();
    }

    private static String duplicateLine(String t, double p, double q) {
        List<String> lines = new java.util.ArrayList<>(t.lines().toList());
        if (lines.isEmpty()) {
            return t;
        }
        String line = lines.get((int) (p * (lines.size() - 1)));
        lines.add((int) (q * lines.size()), line);
        return String.join("\n", lines) + "\n";
    }

    private static String deleteLine(String t, double p) {
        List<String> lines = new java.util.ArrayList<>(t.lines().toList());
        if (lines.isEmpty()) {
            return t;
        }
        lines.remove((int) (p * (lines.size() - 1)));
        return String.join("\n", lines) + "\n";
    }

    private static List<String> sources() {
        try (Stream<Path> files = Stream.concat(Files.list(SAMPLES.resolve("programmes")),
                Files.list(SAMPLES.resolve("broken")))) {
            return files.filter(f -> f.toString().endsWith(".yaml")).sorted().map(f -> {
                try {
                    return Files.readString(f);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }).toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
