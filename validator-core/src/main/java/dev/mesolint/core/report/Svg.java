package dev.mesolint.core.report;

/**
 * Builds one accessible inline SVG chart: {@code role="img"}, a {@code <title>} and {@code <desc>} named by
 * {@code aria-labelledby}, and shapes styled by the page's classes. Every text is escaped.
 */
final class Svg {
    private final StringBuilder out = new StringBuilder();
    private final StringBuilder top = new StringBuilder();

    Svg(String id, double width, double height, String title, String description) {
        out.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"chart\" role=\"img\" id=\"").append(id)
                .append("\" viewBox=\"0 0 ").append(Html.px(width)).append(' ').append(Html.px(height))
                .append("\" width=\"").append(Html.px(width)).append("\" height=\"").append(Html.px(height))
                .append("\" aria-labelledby=\"").append(id).append("-title ").append(id).append("-desc\">")
                .append("<title id=\"").append(id).append("-title\">").append(Html.esc(title)).append("</title>")
                .append("<desc id=\"").append(id).append("-desc\">").append(Html.esc(description)).append("</desc>\n");
    }

    /** A rectangle; {@code tooltip} (may be null) becomes its {@code <title>}. */
    Svg rect(double x, double y, double w, double h, String cssClass, String tooltip) {
        out.append("<rect x=\"").append(Html.px(x)).append("\" y=\"").append(Html.px(y)).append("\" width=\"")
                .append(Html.px(Math.max(0, w))).append("\" height=\"").append(Html.px(h)).append("\" class=\"")
                .append(cssClass).append('"');
        return close("rect", tooltip);
    }

    /** Fills a rectangle with a pattern over a colour, so that the meaning never rests on colour alone. */
    Svg patterned(double x, double y, double w, double h, String cssClass, String pattern, String tooltip) {
        rect(x, y, w, h, cssClass, null);
        out.append("<rect x=\"").append(Html.px(x)).append("\" y=\"").append(Html.px(y)).append("\" width=\"")
                .append(Html.px(Math.max(0, w))).append("\" height=\"").append(Html.px(h))
                .append("\" fill=\"url(#").append(pattern).append(")\"");
        return close("rect", tooltip);
    }

    Svg line(double x1, double y1, double x2, double y2, String cssClass, String tooltip) {
        out.append("<line x1=\"").append(Html.px(x1)).append("\" y1=\"").append(Html.px(y1)).append("\" x2=\"")
                .append(Html.px(x2)).append("\" y2=\"").append(Html.px(y2)).append("\" class=\"").append(cssClass)
                .append('"');
        return close("line", tooltip);
    }

    /** A circle; {@code tooltip} (may be null) becomes its {@code <title>}. */
    Svg circle(double cx, double cy, double r, String cssClass, String tooltip) {
        out.append("<circle cx=\"").append(Html.px(cx)).append("\" cy=\"").append(Html.px(cy)).append("\" r=\"")
                .append(Html.px(r)).append("\" class=\"").append(cssClass).append('"');
        return close("circle", tooltip);
    }

    /** Text; {@code anchor} is start, middle or end. */
    Svg text(double x, double y, String text, String cssClass, String anchor) {
        out.append("<text x=\"").append(Html.px(x)).append("\" y=\"").append(Html.px(y)).append("\" class=\"")
                .append(cssClass).append("\" text-anchor=\"").append(anchor).append("\">").append(Html.esc(text))
                .append("</text>\n");
        return this;
    }

    /** Text painted above every shape (value labels that reference lines must not cross). */
    Svg label(double x, double y, String text, String cssClass) {
        top.append("<text x=\"").append(Html.px(x)).append("\" y=\"").append(Html.px(y)).append("\" class=\"")
                .append(cssClass).append("\">").append(Html.esc(text)).append("</text>\n");
        return this;
    }

    private Svg close(String element, String tooltip) {
        if (tooltip == null) {
            out.append("/>\n");
        } else {
            out.append("><title>").append(Html.esc(tooltip)).append("</title></").append(element).append(">\n");
        }
        return this;
    }

    String end() {
        return out.append(top).append("</svg>\n").toString();
    }

    /**
     * The shared pattern definitions, written once per page in a zero-size SVG (not {@code display:none}, which
     * would stop browsers from painting the patterns).
     */
    static String patternDefs() {
        return "<svg class=\"defs\" width=\"0\" height=\"0\" aria-hidden=\"true\" focusable=\"false\"><defs>"
                + "<pattern id=\"hatch\" width=\"6\" height=\"6\" patternUnits=\"userSpaceOnUse\""
                + " patternTransform=\"rotate(45)\"><rect width=\"2.5\" height=\"6\" class=\"pattern-ink\"/></pattern>"
                + "<pattern id=\"cross\" width=\"6\" height=\"6\" patternUnits=\"userSpaceOnUse\">"
                + "<path d=\"M0 0L6 6M6 0L0 6\" class=\"pattern-line\"/></pattern>"
                + "</defs></svg>\n";
    }
}
