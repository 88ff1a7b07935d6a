package dev.mesolint.core.text;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** Text from input, as it leaves the tool: safe to encode and parse, unable to forge a console line. */
class SafeTextTests {

    @Test
    void theConsoleFormShowsControlsAsEscapes() {
        assertEquals("a\\nforged.yaml:1:1: error x", SafeText.line("a\nforged.yaml:1:1: error x"));
        assertEquals("Up\\e[31mper\\a", SafeText.line("Up\u001b[31mper\u0007"));
        assertEquals("x\\u202ey", SafeText.line("x\u202ey"), "a right-to-left override cannot reorder the line");
        assertEquals("x \\ud800 y", SafeText.line("x \ud800 y"));
        assertEquals("Bankdrücken 💪", SafeText.line("Bankdrücken 💪"), "letters and paired surrogates are kept");
    }

    @Test
    void printableAsciiIsKeptAndTheControlsAroundItAreEscaped() {
        StringBuilder printable = new StringBuilder();
        for (char c = 0x20; c < 0x7f; c++) {
            printable.append(c);
        }
        assertEquals(printable.toString(), SafeText.line(printable.toString()));
        // the edges of the control ranges (Unicode general category Cc: U+0000-001F, U+007F-009F); NBSP is printable
        assertEquals("\\u001f \\u007f \\u0080 \\u009f \u00a0~", SafeText.line("\u001f \u007f \u0080 \u009f \u00a0~"));
    }

    @Test
    void theDataFormReplacesWhatUtf8AndXmlCannotHold() {
        // XML 1.0, section 2.2 (Char): tab, LF and CR are the only C0 controls allowed.
        assertEquals("x \uFFFD y", SafeText.data("x \ud800 y"));
        assertEquals("a\uFFFDb\tc\nd", SafeText.data("a\u0001b\tc\nd"));
        assertEquals("💪", SafeText.data("💪"));
    }

    @Test
    void theWriterKeepsAPairSplitAcrossWritesAndReplacesALoneHalf() throws IOException {
        StringWriter out = new StringWriter();
        try (SafeWriter w = new SafeWriter(out)) {
            String pair = "💪";
            w.write("a" + pair.charAt(0));
            w.write(pair.charAt(1));
            w.write("\ud800b\u001b");
            w.write('\udc00');
        }
        assertEquals("a💪\uFFFDb\uFFFD\uFFFD", out.toString());
    }
}
