package org.quire.app.report;

import java.util.Locale;

/**
 * Draws a chart as inline SVG for the HTML report, from the shapes {@link ChartLayout} places.
 *
 * <p>Stateless and thread-safe.
 */
final class Svg {
    private Svg() {
    }

    static String render(Chart c) {
        ChartLayout.Layout l = ChartLayout.of(c);
        StringBuilder s = new StringBuilder();
        s.append(String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 %.1f %.1f\" "
                + "width=\"100%%\" style=\"max-width:%.0fpx\" role=\"img\" aria-label=\"%s\" "
                + "font-family=\"DejaVu Sans, Helvetica, Arial, sans-serif\">\n",
                l.width(), l.height(), l.width() * 1.4, HtmlReport.esc(c.caption())));
        for (ChartLayout.Shape sh : l.shapes()) {
            if (sh instanceof ChartLayout.Rect) {
                ChartLayout.Rect r = (ChartLayout.Rect) sh;
                s.append(String.format(Locale.ROOT, "<rect x=\"%.2f\" y=\"%.2f\" width=\"%.2f\" height=\"%.2f\" fill=\"#%06x\"/>\n",
                        r.x(), r.y(), r.w(), r.h(), r.rgb()));
            } else if (sh instanceof ChartLayout.Line) {
                ChartLayout.Line ln = (ChartLayout.Line) sh;
                s.append(String.format(Locale.ROOT, "<line x1=\"%.2f\" y1=\"%.2f\" x2=\"%.2f\" y2=\"%.2f\" stroke=\"#%06x\" "
                        + "stroke-width=\"%.2f\"%s/>\n", ln.x1(), ln.y1(), ln.x2(), ln.y2(), ln.rgb(), ln.width(),
                        ln.dashed() ? " stroke-dasharray=\"3 2\"" : ""));
            } else {
                ChartLayout.Label t = (ChartLayout.Label) sh;
                String anchor = t.anchor() == ChartLayout.Anchor.START ? "start"
                        : t.anchor() == ChartLayout.Anchor.MIDDLE ? "middle" : "end";
                s.append(String.format(Locale.ROOT, "<text x=\"%.2f\" y=\"%.2f\" font-size=\"%.1f\" text-anchor=\"%s\" fill=\"#%06x\">",
                        t.x(), t.y(), t.size(), anchor, t.rgb()));
                MathText.Shift prev = MathText.Shift.BASE;
                for (MathText.Run r : t.text().runs()) {
                    float dy = shift(r.shift(), t.size()) - shift(prev, t.size());
                    float size = r.shift() == MathText.Shift.BASE ? t.size() : t.size() * 0.7f;
                    s.append(String.format(Locale.ROOT, "<tspan dy=\"%.2f\" font-size=\"%.1f\"%s>%s</tspan>", dy, size,
                            r.italic() ? " font-style=\"italic\"" : "", HtmlReport.esc(r.text())));
                    prev = r.shift();
                }
                s.append("</text>\n");
            }
        }
        s.append("</svg>\n");
        return s.toString();
    }

    private static float shift(MathText.Shift s, float size) {
        return s == MathText.Shift.SUB ? 0.25f * size : s == MathText.Shift.SUP ? -0.35f * size : 0f;
    }
}
