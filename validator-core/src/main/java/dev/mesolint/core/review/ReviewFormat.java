package dev.mesolint.core.review;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/** The forms a review can be written in; each has one writer. */
public enum ReviewFormat {
    /** For a terminal: changes only, the summary, the caution. */
    CONSOLE,
    /** GitHub-flavoured Markdown for a pull-request comment. */
    MARKDOWN,
    /** One JSON document (docs/schema/diff.schema.json). */
    JSON,
    /** SARIF 2.1.0 with baselineState relative to the base. */
    SARIF,
    /** A self-contained HTML page with the changes section. */
    HTML;

    public String id() {
        return name().toLowerCase(Locale.ROOT);
    }

    public ReviewWriter writer() {
        return switch (this) {
            case CONSOLE -> new ReviewConsole();
            case MARKDOWN -> new ReviewMarkdown();
            case JSON -> new ReviewJson();
            case SARIF -> new ReviewSarif();
            case HTML -> new ReviewHtmlPage();
        };
    }

    public static Optional<ReviewFormat> parse(String text) {
        return Arrays.stream(values()).filter(f -> f.id().equalsIgnoreCase(text == null ? "" : text.trim()))
                .findFirst();
    }

    public static String names() {
        return Arrays.stream(values()).map(ReviewFormat::id).collect(Collectors.joining(", "));
    }
}
