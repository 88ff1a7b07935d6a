package dev.mesolint.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.reference.ExampleRun;
import dev.mesolint.core.reference.RuleExample;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rules.BuiltInRules;
import dev.mesolint.core.testing.FixtureHarness;
import dev.mesolint.core.testing.TempFiles;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Fixes that hold: every fix that can be applied mechanically, applied as text to the broken samples and the rule
 * fixtures, removes its finding and raises no other (a fix must not break an athlete's constraint or trip another
 * rule).
 *
 * <p>A fix can be applied mechanically when the finding carries an edit of the value it sits on, or when its words
 * start with {@code key: value} and the finding sits on that key (the value written there is replaced), or with
 * {@code add key: value} and the finding sits on the mapping that lacks the key (a line is added).
 */
class FixesThatHoldTests {
    private static final Path SAMPLES = Path.of("../sample-programs/broken").toAbsolutePath().normalize();
    /** {@code [add] key: value} at the start of a fix; the value ends at a space, comma, semicolon or bracket. */
    private static final Pattern EDIT = Pattern.compile("^(add )?([a-z][a-z-]*): ([\\w.][^\\s,;)]*)");
    /**
     * The share of active findings on the broken samples and fixtures that carried a fix applicable this way when
     * the test was written (2 December 2026: 37 of 87 findings). It must not fall.
     */
    private static final double SHARE_BEFORE = 37.0 / 87;

    private static final List<RuleDefinition> RULES = BuiltInRules.all();
    private static List<Checked> checked;

    @TempDir
    static Path edits;

    /** One file's findings before any fix: the active ones and the places of the waived ones. */
    private record Checked(RuleExample example, List<Finding> active, Set<String> waived) {
    }

    /** A fix applied: the finding it answers and the edited copy of its file. */
    private record Applied(Checked source, Finding finding, RuleExample edited) {
    }

    @BeforeAll
    static void checkEverything() throws IOException {
        List<RuleExample> examples = new ArrayList<>(FixtureHarness.all());
        try (var samples = Files.list(SAMPLES)) {
            for (Path p : samples.filter(p -> p.toString().endsWith(".yaml")).sorted().toList()) {
                examples.add(RuleExample.read(p));
            }
        }
        Map<Path, FileReport> reports = ExampleRun.check(examples, Path.of("/"), RULES);
        checked = examples.stream().map(e -> new Checked(e, active(reports.get(e.file())),
                reports.get(e.file()).waived().stream().map(FixesThatHoldTests::place).collect(Collectors.toSet())))
                .toList();
    }

    @Test
    void theShareOfFindingsWithAnApplicableFixDoesNotFall() {
        long all = checked.stream().mapToLong(c -> c.active().size()).sum();
        long applicable = checked.stream().flatMap(c -> c.active().stream())
                .filter(f -> edit(f).isPresent()).count();
        assertTrue(all > 0);
        assertTrue((double) applicable / all >= SHARE_BEFORE,
                applicable + " of " + all + " findings have an applicable fix, fewer than the " + SHARE_BEFORE
                        + " share before");
    }

    @Test
    void everyApplicableFixRemovesItsFindingAndRaisesNoOther() {
        List<Applied> applied = new ArrayList<>();
        int n = 0;
        for (Checked c : checked) {
            for (Finding f : c.active()) {
                Optional<String> text = apply(c.example().text(), f);
                if (text.isPresent()) {
                    Path copy = TempFiles.write(edits, (n++) + "/" + c.example().file().getFileName(), text.get());
                    applied.add(new Applied(c, f, new RuleExample(copy, text.get(), c.example().profile(),
                            List.of())));
                }
            }
        }
        assertFalse(applied.isEmpty());
        Map<Path, FileReport> after = ExampleRun.check(applied.stream().map(Applied::edited).toList(), edits, RULES);
        List<String> broken = new ArrayList<>();
        for (Applied a : applied) {
            Set<String> before = a.source().active().stream().map(FixesThatHoldTests::place)
                    .collect(Collectors.toSet());
            List<Finding> now = active(after.get(a.edited().file()));
            String what = a.source().example().file().getFileName() + " (" + a.source().example().ruleId() + "), "
                    + a.finding().ruleId() + " at " + a.finding().location() + ", fix '" + a.finding().fix() + "'";
            if (now.stream().anyMatch(f -> place(f).equals(place(a.finding())))) {
                broken.add(what + ": the finding is still there");
            }
            now.stream().filter(f -> !before.contains(place(f)) && !waiverLeftOver(a, f)).forEach(f -> broken.add(what + ": raises "
                    + f.ruleId() + " at " + f.location() + ": " + f.message()));
        }
        assertEquals(List.of(), broken);
    }

    /**
     * A fix on a written line that a repeated week copies also fixes the weeks where the author waived the finding:
     * the waiver is then reported as unused, which is what the author should hear.
     */
    private static boolean waiverLeftOver(Applied a, Finding raised) {
        return raised.ruleId().equals("unused-waiver") && a.source().waived().contains(place(a.finding()));
    }

    /** Where a finding is and of which rule: what survives an edit of the value it sits on. */
    private static String place(Finding f) {
        return f.ruleId() + "|" + f.location().pointer();
    }

    private static List<Finding> active(FileReport report) {
        return report.active().stream().filter(f -> f.severity() != Severity.OFF).toList();
    }

    /** A fix that can be applied as text: set {@code key} to {@code value}, or add it to the mapping. */
    private record Edit(String key, String value, boolean add) {
    }

    /**
     * The edit of a fix that can be applied at the finding's place: {@code key: value} where the finding sits on that
     * key, or {@code add key: value} where it sits on the mapping that lacks it.
     */
    private static Optional<Edit> edit(Finding f) {
        if (f.edit().isPresent() && f.edit().get().location().equals(f.location())) {
            return Optional.of(new Edit(f.edit().get().key(), f.edit().get().text(), false));
        }
        Matcher m = EDIT.matcher(f.fix());
        if (!m.find()) {
            return Optional.empty();
        }
        boolean add = m.group(1) != null;
        boolean onKey = f.location().pointer().endsWith("/" + m.group(2));
        return add == onKey ? Optional.empty() : Optional.of(new Edit(m.group(2), m.group(3), add));
    }

    /** {@code text} with the fix's edit made at the finding's location. */
    private static Optional<String> apply(String text, Finding f) {
        Optional<Edit> edit = edit(f);
        if (edit.isEmpty()) {
            return Optional.empty();
        }
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        int row = f.location().line() - 1;
        String line = lines.get(row);
        int start = f.location().column() - 1;
        String pair = edit.get().key() + ": " + edit.get().value();
        int close = line.indexOf('}', start);
        if (edit.get().add() && line.lastIndexOf('{', start) >= 0 && close > 0) {
            lines.set(row, line.substring(0, close) + ", " + pair + line.substring(close));
        } else if (edit.get().add()) {
            int indent = line.length() - line.stripLeading().length();
            indent += line.stripLeading().startsWith("- ") ? 2 : 0;
            lines.add(row + 1, " ".repeat(indent) + pair);
        } else {
            int end = start;
            while (end < line.length() && " ,}#".indexOf(line.charAt(end)) < 0) {
                end++;
            }
            lines.set(row, line.substring(0, start) + edit.get().value() + line.substring(end));
        }
        return Optional.of(String.join("\n", lines));
    }
}
