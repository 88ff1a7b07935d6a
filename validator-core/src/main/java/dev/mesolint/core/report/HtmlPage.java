package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;

/** The parts every HTML page mesolint writes shares: the head with its strict policy, the caution and the footer. */
final class HtmlPage {
    private HtmlPage() {
    }

    /**
     * The document head. The policy allows inline styles, data images and, when {@code script}, the one hashed
     * script (written by {@link #footer}, after the content it enhances); nothing can be fetched.
     */
    static void head(StringBuilder page, String title, boolean script) {
        page.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; ")
                .append("style-src 'unsafe-inline'; img-src data:")
                .append(script ? "; script-src " + HtmlScript.CSP_SOURCE : "").append("\">\n")
                .append("<link rel=\"icon\" href=\"data:,\">\n")
                .append("<title>").append(Html.esc(title)).append("</title>\n<style>\n").append(HtmlStyles.CSS)
                .append("</style>\n");
        page.append("</head>\n");
    }

    static void caution(StringBuilder page, String cssClass) {
        page.append("<p class=\"caution ").append(cssClass).append("\"><strong>Caution.</strong> ")
                .append(Html.esc(Mesolint.CAUTION)).append("</p>\n");
    }

    /** The footer with the caution, then the page's script when {@code script}, and the end of the page. */
    static void footer(StringBuilder page, boolean script) {
        page.append("<footer>\n");
        caution(page, "caution-end");
        page.append("<p>Written by mesolint ").append(Html.esc(Mesolint.version()))
                .append(" · <code>mesolint explain RULE</code> prints a rule's reference</p>\n</footer>\n");
        if (script) {
            page.append("<script>").append(HtmlScript.JS).append("</script>\n");
        }
        page.append("</body>\n</html>\n");
    }

    static String fact(String term, String value) {
        return "<div><dt>" + Html.esc(term) + "</dt><dd>" + Html.esc(value) + "</dd></div>";
    }
}
