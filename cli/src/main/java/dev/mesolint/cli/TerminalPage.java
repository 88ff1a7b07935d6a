package dev.mesolint.cli;

import java.util.ArrayList;
import java.util.List;
import org.commonmark.ext.gfm.tables.TableBlock;
import org.commonmark.ext.gfm.tables.TableCell;
import org.commonmark.ext.gfm.tables.TablesExtension;
import org.commonmark.node.Code;
import org.commonmark.node.FencedCodeBlock;
import org.commonmark.node.HardLineBreak;
import org.commonmark.node.Heading;
import org.commonmark.node.HtmlBlock;
import org.commonmark.node.HtmlInline;
import org.commonmark.node.IndentedCodeBlock;
import org.commonmark.node.Link;
import org.commonmark.node.Node;
import org.commonmark.node.SoftLineBreak;
import org.commonmark.node.Text;
import org.commonmark.node.ThematicBreak;
import org.commonmark.parser.Parser;

/**
 * A rule's reference page (CommonMark with tables, written for docs/rules) as text for a terminal: headings
 * underlined, tables as aligned columns, code blocks indented, no markup characters and no comments meant for
 * contributors.
 */
final class TerminalPage {
    private static final String INDENT = "    ";
    private static final Parser PARSER = Parser.builder().extensions(List.of(TablesExtension.create())).build();

    private TerminalPage() {
    }

    static String render(String markdown) {
        List<String> out = new ArrayList<>();
        for (Node block = PARSER.parse(markdown).getFirstChild(); block != null; block = block.getNext()) {
            block(block, out);
        }
        return String.join("\n", out).replaceAll("\\n{3,}", "\n\n").strip() + "\n";
    }

    private static void block(Node block, List<String> out) {
        if (block instanceof HtmlBlock) {
            return; // comments for contributors
        }
        if (block instanceof Heading heading && heading.getLevel() <= 2) {
            String text = inline(heading);
            out.add(text);
            out.add(String.valueOf(heading.getLevel() == 1 ? '=' : '-').repeat(text.length()));
        } else if (block instanceof FencedCodeBlock code) {
            code.getLiteral().lines().forEach(l -> out.add(INDENT + l));
        } else if (block instanceof IndentedCodeBlock code) {
            code.getLiteral().lines().forEach(l -> out.add(INDENT + l));
        } else if (block instanceof TableBlock table) {
            table(table, out);
        } else if (!(block instanceof ThematicBreak)) {
            out.addAll(inline(block).lines().toList());
        }
        out.add("");
    }

    /** Every row (header included) as aligned columns, indented. */
    private static void table(TableBlock table, List<String> out) {
        List<List<String>> rows = new ArrayList<>();
        for (Node part = table.getFirstChild(); part != null; part = part.getNext()) {
            for (Node row = part.getFirstChild(); row != null; row = row.getNext()) {
                List<String> cells = new ArrayList<>();
                for (Node cell = row.getFirstChild(); cell != null; cell = cell.getNext()) {
                    if (cell instanceof TableCell) {
                        cells.add(inline(cell).strip());
                    }
                }
                rows.add(cells);
            }
        }
        int columns = rows.stream().mapToInt(List::size).max().orElse(0);
        int[] width = new int[columns];
        rows.forEach(r -> {
            for (int i = 0; i < r.size(); i++) {
                width[i] = Math.max(width[i], r.get(i).length());
            }
        });
        for (List<String> row : rows) {
            StringBuilder line = new StringBuilder(INDENT);
            for (int i = 0; i < row.size(); i++) {
                line.append(i == row.size() - 1 ? row.get(i) : String.format("%-" + width[i] + "s  ", row.get(i)));
            }
            out.add(line.toString().stripTrailing());
        }
    }

    /** A block's text without markup; line breaks as written, links keeping their target as a project path. */
    private static String inline(Node parent) {
        StringBuilder text = new StringBuilder();
        for (Node node = parent.getFirstChild(); node != null; node = node.getNext()) {
            if (node instanceof Text t) {
                text.append(t.getLiteral());
            } else if (node instanceof Code c) {
                text.append(c.getLiteral());
            } else if (node instanceof SoftLineBreak || node instanceof HardLineBreak) {
                text.append('\n');
            } else if (node instanceof Link link) {
                String words = inline(link);
                String path = target(link.getDestination());
                // "see [profiles](../profiles.md)" reads "see docs/profiles.md"; other link texts keep their words.
                text.append(path.endsWith("/" + words + ".md") ? path : words + " (" + path + ")");
            } else if (!(node instanceof HtmlInline)) {
                text.append(inline(node)); // emphasis, strong emphasis: their words
            }
        }
        return text.toString();
    }

    /** Pages live in docs/rules: {@code ../profiles.md} is docs/profiles.md, {@code x.md} docs/rules/x.md. */
    private static String target(String href) {
        if (href.contains("://")) {
            return href;
        }
        return href.startsWith("../") ? "docs/" + href.substring(3) : "docs/rules/" + href;
    }
}
