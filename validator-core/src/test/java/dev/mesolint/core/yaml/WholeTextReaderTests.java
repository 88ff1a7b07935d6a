package dev.mesolint.core.yaml;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.junit.jupiter.api.Test;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.reader.StreamReader;

/** The whole-text reader against SnakeYAML's own, driven with the same calls: every answer must be the same. */
class WholeTextReaderTests {
    /** Line breaks of every kind (YAML 1.1, 5.4), a byte order mark, a character outside the BMP, plain text. */
    private static final String[] PIECES = {"a", "b", " ", "-", ":", "\n", "\r", "\r\n", "\u0085", "\u2028",
        "\u2029", "\uFEFF", "\uD83D\uDE00", "é", "\t", "sets: 3", "  - {exercise: squat}"};

    @Property(tries = 2000)
    void everyCallAnswersAsTheStockReaderDoes(@ForAll long seed) {
        Random random = new Random(seed);
        StringBuilder text = new StringBuilder();
        int pieces = random.nextInt(3000); // past the stock reader's 1,024-character window, often
        for (int i = 0; i < pieces; i++) {
            text.append(PIECES[random.nextInt(PIECES.length)]);
        }
        compare(text.toString(), random);
    }

    @Test
    void theSampleProgrammesReadTheSame() throws IOException {
        Random random = new Random(20261204L);
        List<Path> files = new ArrayList<>();
        try (Stream<Path> walk = Files.walk(Path.of("../sample-programs"))) {
            walk.filter(p -> p.toString().endsWith(".yaml")).sorted().forEach(files::add);
        }
        assertTrue(files.size() > 20, "sample programmes found: " + files.size());
        for (Path file : files) {
            compare(Files.readString(file), random);
        }
    }

    @Test
    void aTextWithACharacterSnakeYamlRefusesGetsTheStockReader() {
        // a control character: SnakeYAML raises "special characters are not allowed" where it meets it
        assertFalse(WholeTextReader.of("a: 1\n\u0007") instanceof WholeTextReader);
        assertFalse(WholeTextReader.of("a: \uD800") instanceof WholeTextReader, "a lone surrogate");
        assertTrue(WholeTextReader.of("a: 1\n") instanceof WholeTextReader);
    }

    private static void compare(String text, Random random) {
        StreamReader stock = new StreamReader(new StringReader(text));
        StreamReader whole = WholeTextReader.of(text);
        assertTrue(whole instanceof WholeTextReader);
        int steps = 0;
        while (stock.peek() != 0 || whole.peek() != 0) {
            int k = random.nextInt(6);
            assertEquals(stock.peek(k), whole.peek(k), "peek(" + k + ") at step " + steps);
            switch (random.nextInt(6)) {
                case 0 -> assertEquals(stock.prefix(k), whole.prefix(k), "prefix at step " + steps);
                case 1 -> assertEquals(stock.prefixForward(k), whole.prefixForward(k), "prefixForward " + steps);
                case 2 -> {
                    stock.forward(k);
                    whole.forward(k);
                }
                case 3 -> {
                    stock.resetDocumentIndex();
                    whole.resetDocumentIndex();
                }
                default -> {
                    stock.forward();
                    whole.forward();
                }
            }
            assertSame(stock, whole, steps++);
        }
        assertEquals(0, whole.peek());
    }

    private static void assertSame(StreamReader stock, StreamReader whole, int step) {
        assertEquals(stock.getIndex(), whole.getIndex(), "index at step " + step);
        assertEquals(stock.getLine(), whole.getLine(), "line at step " + step);
        assertEquals(stock.getColumn(), whole.getColumn(), "column at step " + step);
        assertEquals(stock.getDocumentIndex(), whole.getDocumentIndex(), "document index at step " + step);
        assertEquals(stock.peek(), whole.peek(), "peek at step " + step);
        Mark a = stock.getMark();
        Mark b = whole.getMark();
        assertEquals(a.getLine(), b.getLine());
        assertEquals(a.getColumn(), b.getColumn());
        assertEquals(a.getIndex(), b.getIndex());
        assertEquals(a.getName(), b.getName());
    }
}
