package dev.ampsieve.report;

import dev.ampsieve.text.Visible;
import java.util.List;

/**
 * A decision record as one self-contained HTML file: no external style sheet, script, font or
 * image (the charts are inline SVG), a print layout with each part on its own page, and the
 * record's facts in a JSON block for {@code recheck}.
 */
final class RecordHtml {
    private RecordHtml() {}

    /** The style sheet, inline: system fonts only, nothing fetched. */
    private static final String CSS = """
            body{font-family:system-ui,-apple-system,"Segoe UI",Roboto,"DejaVu Sans",sans-serif;font-size:13px;color:#111;
            margin:24px auto;max-width:1000px;line-height:1.4}
            h1{font-size:20px;border-bottom:2px solid #333;padding-bottom:4px}h2{font-size:16px;margin-top:22px;
            border-bottom:1px solid #999}h3{font-size:14px;margin:14px 0 4px}
            table{border-collapse:collapse;margin:6px 0 10px;width:100%}
            th,td{border:1px solid #bbb;padding:2px 6px;vertical-align:top;text-align:left}
            th{background:#eee}table.kv{width:auto;min-width:50%}td.num{text-align:right;white-space:nowrap}
            p.caution{border:1px solid #b60;background:#fff6e6;padding:6px}p.note{color:#444;font-size:12px}
            p.warning{margin:2px 0 2px 12px}p.warning::before{content:"\\2022  "}
            pre{background:#f6f6f6;border:1px solid #ccc;padding:6px;font-size:11px;white-space:pre-wrap}
            svg.chart{display:block;max-width:100%;height:auto;margin:6px 0}
            svg text{font-family:inherit;font-size:11px;fill:#222}
            svg .grid{stroke:#ddd;stroke-width:1}svg .limit{stroke:#c00;stroke-width:2}svg text.limit-label{fill:#c00}
            svg rect.term{fill:#4a78b0}svg rect.term.over{fill:#d0703a}
            svg circle.candidate{fill:#fff;stroke:#555;stroke-width:1.5}svg circle.candidate.fits{fill:#4a78b0}
            svg circle.pareto{stroke:#111;stroke-width:2}svg polyline.pareto{fill:none;stroke:#111;stroke-dasharray:4 3}
            .page-break{break-before:page}
            @media print{body{margin:0;max-width:none;font-size:10.5px}h2{break-after:avoid}h3{break-after:avoid}
            tr,svg{break-inside:avoid}p:has(+table),p:has(+svg){break-after:avoid}.page-break{break-before:page;page-break-before:always}
            @page{size:A4;margin:14mm}}
            """;

    static String render(List<RecordDoc.Block> blocks, String title, String json) {
        StringBuilder o = new StringBuilder();
        o.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                // nothing may be fetched: a record opened years later must look the same, and offline
                .append(
                        "<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; style-src 'unsafe-inline'; img-src data:\">\n")
                .append("<meta name=\"generator\" content=\"ampsieve record\">\n")
                .append("<title>")
                .append(esc(title))
                .append("</title>\n<style>\n")
                .append(CSS)
                .append("</style>\n</head>\n<body>\n");
        for (RecordDoc.Block b : blocks) {
            block(o, b);
        }
        o.append("<script type=\"application/json\" id=\"")
                .append(RecordJson.BLOCK_ID)
                .append("\">\n")
                .append(json)
                .append("\n</script>\n</body>\n</html>\n");
        return o.toString();
    }

    private static void block(StringBuilder o, RecordDoc.Block b) {
        if (b instanceof RecordDoc.Heading h) {
            o.append("<h")
                    .append(h.level())
                    .append(h.anchor() == null ? "" : " id=\"" + esc(h.anchor()) + "\"")
                    .append('>')
                    .append(esc(h.text()))
                    .append("</h")
                    .append(h.level())
                    .append(">\n");
        } else if (b instanceof RecordDoc.Para p) {
            o.append(p.kind() == null ? "<p>" : "<p class=\"" + p.kind() + "\">")
                    .append(esc(p.text()))
                    .append("</p>\n");
        } else if (b instanceof RecordDoc.Table t) {
            table(o, t);
        } else if (b instanceof RecordDoc.Chart c) {
            o.append(c.svg());
        } else if (b instanceof RecordDoc.Pre p) {
            o.append("<pre>").append(esc(p.text())).append("</pre>\n");
        } else {
            o.append("<div class=\"page-break\"></div>\n");
        }
    }

    private static void table(StringBuilder o, RecordDoc.Table t) {
        boolean head = t.head().stream().anyMatch(h -> !h.isEmpty());
        // a table of names and values is as wide as its text; a table of figures takes the page
        o.append(head && t.head().size() > 2 ? "<table>\n" : "<table class=\"kv\">\n");
        if (head) {
            o.append("<thead><tr>");
            for (String h : t.head()) {
                o.append("<th>").append(esc(h)).append("</th>");
            }
            o.append("</tr></thead>\n");
        }
        o.append("<tbody>\n");
        for (List<String> row : t.rows()) {
            o.append("<tr>");
            for (int i = 0; i < row.size(); i++) {
                boolean num = i < t.numeric().size() && t.numeric().get(i);
                o.append(num ? "<td class=\"num\">" : "<td>")
                        .append(esc(row.get(i)))
                        .append("</td>");
            }
            o.append("</tr>\n");
        }
        o.append("</tbody></table>\n");
    }

    /**
     * Text for HTML content or a quoted attribute: control characters made visible
     * ({@link Visible#of}), then the five markup characters as entities, so a catalog string
     * can never open a tag or leave an attribute.
     */
    static String esc(String s) {
        if (s == null) {
            return "";
        }
        String v = Visible.of(s);
        StringBuilder b = new StringBuilder(v.length() + 16);
        for (int i = 0; i < v.length(); i++) {
            char c = v.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }
}
