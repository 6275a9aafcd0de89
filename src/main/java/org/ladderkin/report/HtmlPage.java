package org.ladderkin.report;

import java.util.List;

/**
 * A small builder for one self-contained HTML page: inline CSS, embedded SVG charts, no scripts and no external
 * resources, so the file can be mailed or archived with a lab notebook and still open years later.
 */
public final class HtmlPage {

    private static final String CSS = """
            body{font-family:system-ui,-apple-system,"Segoe UI",Roboto,sans-serif;max-width:1100px;margin:2em auto;padding:0 1em;color:#1d1d1f;line-height:1.45}
            h1{font-size:1.6em;margin-bottom:.2em}h2{font-size:1.25em;margin-top:1.8em;border-bottom:1px solid #ccc;padding-bottom:.2em}
            h3{font-size:1.05em;margin-top:1.2em}
            table{border-collapse:collapse;margin:.6em 0;font-size:.92em}th,td{border:1px solid #ccc;padding:.25em .55em;text-align:left;vertical-align:top}
            th{background:#f3f3f3}td.num{text-align:right;font-variant-numeric:tabular-nums}
            .pass{background:#e6f4ea}.warn{background:#fff4d6}.fail{background:#fde2e1}
            .caution{border-left:5px solid #d93025;background:#fdecea;padding:.6em 1em;margin:.8em 0}
            .note{color:#555;font-size:.9em}.charts{display:flex;flex-wrap:wrap;gap:12px}.charts svg{border:1px solid #e3e3e3}
            .summary{background:#eef4fb;border:1px solid #c9dcf0;padding:.6em 1em}
            """;

    private final StringBuilder body = new StringBuilder();
    private final String title;

    public HtmlPage(String title) {
        this.title = title;
    }

    /** Escapes text for HTML element content and attribute values. */
    public static String escape(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    public HtmlPage heading(int level, String text) {
        body.append("<h").append(level).append('>').append(escape(text)).append("</h").append(level).append(">\n");
        return this;
    }

    public HtmlPage paragraph(String text) {
        body.append("<p>").append(escape(text)).append("</p>\n");
        return this;
    }

    /** A paragraph with a CSS class ("note", "summary", "caution"). */
    public HtmlPage block(String cssClass, String text) {
        body.append("<div class=\"").append(cssClass).append("\">").append(escape(text)).append("</div>\n");
        return this;
    }

    public HtmlPage bullets(List<String> items) {
        body.append("<ul>\n");
        for (String i : items) {
            body.append("<li>").append(escape(i)).append("</li>\n");
        }
        body.append("</ul>\n");
        return this;
    }

    /**
     * A table. Cells that parse as numbers are right-aligned; a row whose last cell is PASS, WARN or FAIL is coloured.
     */
    public HtmlPage table(List<String> header, List<List<String>> rows) {
        body.append("<table>\n<tr>");
        for (String h : header) {
            body.append("<th>").append(escape(h)).append("</th>");
        }
        body.append("</tr>\n");
        for (List<String> row : rows) {
            String last = row.isEmpty() ? "" : row.get(row.size() - 1);
            String cls = switch (last) {
                case "PASS" -> " class=\"pass\"";
                case "WARN" -> " class=\"warn\"";
                case "FAIL" -> " class=\"fail\"";
                default -> "";
            };
            body.append("<tr").append(cls).append('>');
            for (String c : row) {
                body.append(isNumber(c) ? "<td class=\"num\">" : "<td>").append(escape(c)).append("</td>");
            }
            body.append("</tr>\n");
        }
        body.append("</table>\n");
        return this;
    }

    /** Charts side by side, each rendered to inline SVG. */
    public HtmlPage charts(List<ChartSpec> specs, int width, int height) {
        body.append("<div class=\"charts\">\n");
        // each chart renders on its own: use the cores, keep the order
        List<String> svgs = specs.parallelStream().map(s -> Charts.svg(s, width, height)).toList();
        for (String svg : svgs) {
            body.append(svg).append('\n');
        }
        body.append("</div>\n");
        return this;
    }

    /** The safety cautions, each in a highlighted box. */
    public HtmlPage cautions(List<String> cautions) {
        for (String c : cautions) {
            block("caution", c);
        }
        return this;
    }

    /** The complete document. */
    public String render() {
        return "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n"
                + "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n<title>" + escape(title)
                + "</title>\n<style>\n" + CSS + "</style>\n</head>\n<body>\n<h1>" + escape(title) + "</h1>\n" + body
                + "</body>\n</html>\n";
    }

    private static boolean isNumber(String s) {
        if (s.isEmpty()) {
            return false;
        }
        try {
            Double.parseDouble(s.replace(" ", ""));
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
