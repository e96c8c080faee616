package org.quire.app.report;

import java.util.List;
import org.quire.app.report.ReportModel.Block;
import org.quire.app.report.ReportModel.ChartBlock;
import org.quire.app.report.ReportModel.Equations;
import org.quire.app.report.ReportModel.Notices;
import org.quire.app.report.ReportModel.Paragraph;
import org.quire.app.report.ReportModel.Part;
import org.quire.app.report.ReportModel.Statement;
import org.quire.app.report.ReportModel.TableBlock;

/**
 * Renders a {@link ReportModel} as one self-contained HTML file: styles inline, charts as inline SVG, no
 * scripts, fonts or images fetched from anywhere. A print stylesheet sets A4 pages, keeps table rows and
 * charts whole and repeats table headings on each page.
 *
 * <p>Stateless and thread-safe.
 */
public final class HtmlReport {
    private static final String STYLE = String.join("\n",
            ":root { --ink: #1d2430; --muted: #5a6472; --rule: #c9cfd8; --band: #eef1f5; --accent: #2f5d8a; }",
            "body { font-family: 'DejaVu Sans', 'Segoe UI', Helvetica, Arial, sans-serif; color: var(--ink);",
            "  max-width: 60rem; margin: 2rem auto; padding: 0 1.5rem; font-size: 10.5pt; line-height: 1.4; }",
            "h1 { font-size: 17pt; margin: 0 0 .3rem; }",
            "h2 { font-size: 12.5pt; color: var(--accent); border-bottom: 1px solid var(--rule); padding-bottom: .15rem;",
            "  margin-top: 1.6rem; break-after: avoid; }",
            "table { border-collapse: collapse; width: 100%; margin: .4rem 0 .9rem; font-size: 9pt; }",
            "caption { text-align: left; font-weight: bold; padding: .2rem 0; color: var(--muted); }",
            "th, td { padding: .2rem .45rem; border-bottom: 1px solid var(--rule); vertical-align: top; text-align: left; }",
            "th { background: var(--band); font-weight: bold; }",
            "td.num, th.num { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }",
            "table.facts th { width: 12rem; background: none; color: var(--muted); font-weight: normal; }",
            "table.facts td.hash { font-family: 'DejaVu Sans Mono', monospace; font-size: 8.5pt; word-break: break-all; }",
            ".eq { margin: .25rem 0 .25rem 1.5rem; font-size: 11pt; }",
            ".statement { font-size: 11.5pt; font-weight: bold; margin: .5rem 0 1rem; padding: .4rem .7rem;",
            "  border-left: 3px solid var(--accent); background: var(--band); }",
            ".notices li { color: #7a4b00; }",
            ".draft-band { background: #a0361c; color: #fff; font-weight: bold; font-size: 9pt; padding: .2rem .6rem;",
            "  margin-bottom: .8rem; }",
            ".cautions { margin-top: 2rem; padding: .6rem .8rem; border: 1px solid var(--rule); font-size: 9pt; }",
            "figure { margin: .5rem 0 1rem; break-inside: avoid; }",
            "figcaption { font-size: 9pt; color: var(--muted); }",
            "footer { margin-top: 1.5rem; font-size: 8pt; color: var(--muted); }",
            "@media print {",
            "  @page { size: A4; margin: 16mm 15mm 18mm; }",
            "  body { max-width: none; margin: 0; padding: 0; font-size: 9.5pt; }",
            "  h2 { break-after: avoid; page-break-after: avoid; }",
            "  tr, figure, .statement, .eq { break-inside: avoid; page-break-inside: avoid; }",
            "  thead { display: table-header-group; }",
            "  .draft-band { position: fixed; top: 0; left: 0; right: 0; -webkit-print-color-adjust: exact;",
            "    print-color-adjust: exact; }",
            "  body { padding-top: 1.4rem; }",
            "  th { background: #e6e9ee !important; -webkit-print-color-adjust: exact; print-color-adjust: exact; }",
            "}");

    private HtmlReport() {
    }

    /** @return the report as an HTML document */
    public static String render(ReportModel m) {
        DocumentInfo d = m.document();
        StringBuilder h = new StringBuilder(32_768);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"generator\" content=\"Quire ").append(esc(m.engineVersion())).append("\">\n")
                .append("<title>").append(esc(d.title())).append("</title>\n<style>\n").append(STYLE)
                .append("\n</style>\n</head>\n<body>\n");
        String mark = d.notApprovedMark();
        if (mark != null) {
            // On screen a band at the top; in print the band is fixed, so it repeats on every page.
            h.append("<div class=\"draft-band\">").append(esc(mark)).append("</div>\n");
        }
        h.append("<header>\n<h1>").append(esc(d.title())).append("</h1>\n");
        h.append("<table class=\"facts\">\n");
        fact(h, "Laboratory", d.laboratory());
        fact(h, "Device under test", d.deviceUnderTest());
        fact(h, "Revision", d.revision());
        fact(h, "Status", d.status());
        if (!d.templateExample().isEmpty()) {
            fact(h, "Figures", d.templateExample());
        }
        fact(h, "Date", d.date().toString());
        fact(h, "Author", d.author());
        h.append("<tr><th>Content hash (").append(esc(d.hashAlgorithm())).append(")</th><td class=\"hash\">")
                .append(esc(d.hash())).append("</td></tr>\n");
        fact(h, "Computed by", "Quire engine " + m.engineVersion());
        h.append("</table>\n</header>\n");
        int n = 0;
        for (Part p : m.parts()) {
            n++;
            h.append("<section>\n<h2>").append(n).append(". ").append(math(p.heading())).append("</h2>\n");
            for (Block b : p.blocks()) {
                block(h, b);
            }
            h.append("</section>\n");
        }
        h.append("<section class=\"cautions\"><strong>Cautions.</strong> ").append(esc(m.cautions())).append("</section>\n");
        h.append("<footer>Quire engine ").append(esc(m.engineVersion())).append(" · ").append(esc(d.hashAlgorithm()))
                .append(' ').append(esc(d.hash())).append("</footer>\n</body>\n</html>\n");
        return h.toString();
    }

    private static void fact(StringBuilder h, String key, String value) {
        h.append("<tr><th>").append(esc(key)).append("</th><td>").append(esc(value)).append("</td></tr>\n");
    }

    private static void block(StringBuilder h, Block b) {
        if (b instanceof Paragraph) {
            h.append("<p>").append(math(((Paragraph) b).text())).append("</p>\n");
        } else if (b instanceof Equations) {
            for (MathText line : ((Equations) b).lines()) {
                h.append("<div class=\"eq\">").append(math(line)).append("</div>\n");
            }
        } else if (b instanceof Statement) {
            h.append("<p class=\"statement\">").append(math(((Statement) b).text())).append("</p>\n");
        } else if (b instanceof Notices) {
            h.append("<ul class=\"notices\">\n");
            for (MathText s : ((Notices) b).texts()) {
                h.append("<li>").append(math(s)).append("</li>\n");
            }
            h.append("</ul>\n");
        } else if (b instanceof TableBlock) {
            table(h, ((TableBlock) b).table());
        } else if (b instanceof ChartBlock) {
            Chart c = ((ChartBlock) b).chart();
            h.append("<figure>\n").append(Svg.render(c)).append("<figcaption>").append(math(Typesetter.caption(c.caption())))
                    .append("</figcaption>\n</figure>\n");
        }
    }

    static void table(StringBuilder h, Table t) {
        h.append("<table id=\"").append(esc(t.key())).append("\">\n<caption>").append(math(t.caption()))
                .append("</caption>\n<thead><tr>");
        for (Table.Column c : t.columns()) {
            h.append(c.align() == Table.Align.RIGHT ? "<th class=\"num\">" : "<th>").append(math(c.heading())).append("</th>");
        }
        h.append("</tr></thead>\n<tbody>\n");
        for (List<Table.Cell> row : t.rows()) {
            h.append("<tr>");
            for (int i = 0; i < row.size(); i++) {
                h.append(t.columns().get(i).align() == Table.Align.RIGHT ? "<td class=\"num\">" : "<td>")
                        .append(math(row.get(i).text())).append("</td>");
            }
            h.append("</tr>\n");
        }
        h.append("</tbody>\n</table>\n");
    }

    /** @return the runs as HTML: italic in {@code <i>}, shifted runs in {@code <sub>} and {@code <sup>} */
    public static String math(MathText m) {
        StringBuilder s = new StringBuilder();
        for (MathText.Run r : m.runs()) {
            String t = esc(r.text());
            if (r.italic()) {
                t = "<i>" + t + "</i>";
            }
            if (r.shift() == MathText.Shift.SUB) {
                t = "<sub>" + t + "</sub>";
            } else if (r.shift() == MathText.Shift.SUP) {
                t = "<sup>" + t + "</sup>";
            }
            s.append(t);
        }
        return s.toString();
    }

    /** @return {@code s} with the characters HTML gives a meaning escaped */
    static String esc(String s) {
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<': b.append("&lt;"); break;
                case '>': b.append("&gt;"); break;
                case '&': b.append("&amp;"); break;
                case '"': b.append("&quot;"); break;
                case '\'': b.append("&#39;"); break;
                default:
                    if (c < 0x20 && c != '\n' && c != '\t') {
                        b.append('\ufffd');
                    } else {
                        b.append(c);
                    }
            }
        }
        return b.toString();
    }
}
