package dev.mesolint.core.report;

/**
 * A section another part of mesolint adds to the HTML report, before the programmes (a review's "changes since"
 * section, say). It returns finished HTML: every text in it already escaped.
 */
@FunctionalInterface
public interface HtmlSection {
    String html();
}
