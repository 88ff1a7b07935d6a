package dev.mesolint.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A rule's reference page (Markdown, written for docs/rules) as text for a terminal: headings underlined, tables as
 * aligned columns, code blocks indented, no markup characters and no comments meant for contributors.
 */
final class TerminalPage {
    private static final Pattern COMMENT = Pattern.compile("(?s)<!--.*?-->\\n*");
    private static final Pattern LINK = Pattern.compile("\\[([^\\]]+)]\\(([^)]+)\\)");
    private static final Pattern STRONG = Pattern.compile("\\*\\*([^*]+)\\*\\*");
    private static final Pattern EMPHASIS = Pattern.compile("(?<![*\\w])\\*([^*\\s][^*]*)\\*(?![*\\w])");
    private static final String INDENT = "    ";

    private TerminalPage() {
    }

    static String render(String markdown) {
        List<String> out = new ArrayList<>();
        List<String[]> table = new ArrayList<>();
        boolean code = false;
        for (String line : COMMENT.matcher(markdown).replaceAll("").split("\\R", -1)) {
            if (line.startsWith("```")) {
                code = !code;
                continue;
            }
            if (code) {
                out.add(INDENT + line);
                continue;
            }
            if (line.startsWith("|")) {
                if (!line.matches("\\|[-|: ]+\\|?")) {
                    table.add(cells(line));
                }
                continue;
            }
            flush(table, out);
            if (line.startsWith("# ")) {
                underline(out, inline(line.substring(2)), '=');
            } else if (line.startsWith("## ")) {
                underline(out, inline(line.substring(3)), '-');
            } else if (line.strip().equals("---")) {
                out.add("");
            } else {
                out.add(inline(line));
            }
        }
        flush(table, out);
        return String.join("\n", out).replaceAll("\\n{3,}", "\n\n").strip() + "\n";
    }

    private static void underline(List<String> out, String heading, char mark) {
        out.add(heading);
        out.add(String.valueOf(mark).repeat(heading.length()));
    }

    /** A table row's cells; {@code \|} inside a cell is a bar, not a cell boundary. */
    private static String[] cells(String row) {
        String inner = row.strip().replaceAll("^\\|", "").replaceAll("\\|$", "");
        String[] raw = inner.split("(?<!\\\\)\\|", -1);
        String[] cells = new String[raw.length];
        for (int i = 0; i < raw.length; i++) {
            cells[i] = inline(raw[i].strip().replace("\\|", "|"));
        }
        return cells;
    }

    private static void flush(List<String[]> table, List<String> out) {
        if (table.isEmpty()) {
            return;
        }
        int columns = table.stream().mapToInt(r -> r.length).max().orElse(0);
        int[] width = new int[columns];
        for (String[] row : table) {
            for (int i = 0; i < row.length; i++) {
                width[i] = Math.max(width[i], row[i].length());
            }
        }
        for (String[] row : table) {
            StringBuilder line = new StringBuilder(INDENT);
            for (int i = 0; i < row.length; i++) {
                line.append(i == row.length - 1 ? row[i] : String.format("%-" + width[i] + "s  ", row[i]));
            }
            out.add(line.toString().stripTrailing());
        }
        table.clear();
    }

    /** Markup inside a line: code spans, emphasis, and links, which keep their target as a path in the project. */
    private static String inline(String text) {
        Matcher link = LINK.matcher(text);
        StringBuilder linked = new StringBuilder();
        while (link.find()) {
            String path = target(link.group(2));
            // "see [profiles](../profiles.md)" reads "see docs/profiles.md"; other link texts keep their words.
            boolean named = path.endsWith("/" + link.group(1) + ".md");
            link.appendReplacement(linked, Matcher.quoteReplacement(named ? path : link.group(1) + " (" + path + ")"));
        }
        link.appendTail(linked);
        String plain = STRONG.matcher(linked.toString().replace("`", "")).replaceAll("$1");
        return EMPHASIS.matcher(plain).replaceAll("$1");
    }

    /** Pages live in docs/rules: {@code ../profiles.md} is docs/profiles.md, {@code x.md} docs/rules/x.md. */
    private static String target(String href) {
        if (href.contains("://")) {
            return href;
        }
        return href.startsWith("../") ? "docs/" + href.substring(3) : "docs/rules/" + href;
    }
}
