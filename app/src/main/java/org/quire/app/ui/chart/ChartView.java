package org.quire.app.ui.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import javax.swing.JComponent;
import org.quire.app.report.Chart;
import org.quire.app.report.ChartLayout;
import org.quire.app.report.MathText;
import org.quire.app.ui.common.Colors;

/**
 * Draws a report {@link Chart} on screen from the same shapes ({@link ChartLayout}) the PDF and SVG reports
 * draw, scaled to the component's width, in the theme's colours ({@code Quire.chart.*}), so that the dark theme
 * keeps its contrast. One chart code for the workbench and the report.
 */
public class ChartView extends JComponent {
    private ChartLayout.Layout layout;
    private String caption = "";

    public ChartView() {
        setOpaque(false);
    }

    /** Shows a chart; null for none. */
    public void setChart(Chart c) {
        layout = c == null ? null : ChartLayout.of(c);
        caption = c == null ? "" : c.caption();
        setToolTipText(caption.isEmpty() ? null : caption);
        revalidate();
        repaint();
    }

    /** @return the layout shown, or null */
    public ChartLayout.Layout layoutShown() {
        return layout;
    }

    @Override
    public Dimension getPreferredSize() {
        if (layout == null) {
            return new Dimension(0, 0);
        }
        float scale = 0.9f * getFont().getSize2D() / 7.5f;
        return new Dimension(Math.round(layout.width() * scale), Math.round(layout.height() * scale));
    }

    private static Color colour(int rgb) {
        switch (rgb) {
            case ChartLayout.BAR: return Colors.get("Quire.chart.bar");
            case ChartLayout.GRID: return Colors.get("Quire.chart.grid");
            case ChartLayout.AXIS: return Colors.get("Quire.chart.axis");
            case ChartLayout.MARK: return Colors.get("Quire.chart.mark");
            case ChartLayout.TEXT: return Colors.get("Quire.chart.text");
            default: return new Color(rgb);
        }
    }

    @Override
    protected void paintComponent(Graphics g0) {
        if (layout == null) {
            return;
        }
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        double scale = Math.min(getWidth() / layout.width(), getHeight() / layout.height());
        g.scale(scale, scale);
        Font base = getFont();
        for (ChartLayout.Shape s : layout.shapes()) {
            if (s instanceof ChartLayout.Rect r) {
                g.setColor(colour(r.rgb()));
                g.fill(new Rectangle2D.Float(r.x(), r.y(), r.w(), r.h()));
            } else if (s instanceof ChartLayout.Line l) {
                g.setColor(colour(l.rgb()));
                g.setStroke(l.dashed() ? new BasicStroke(l.width(), BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 4f,
                        new float[] {3f, 2f}, 0f) : new BasicStroke(l.width()));
                g.draw(new Line2D.Float(l.x1(), l.y1(), l.x2(), l.y2()));
            } else if (s instanceof ChartLayout.Label t) {
                g.setColor(colour(t.rgb()));
                drawText(g, base, t);
            }
        }
        g.dispose();
    }

    private static void drawText(Graphics2D g, Font base, ChartLayout.Label t) {
        float width = 0;
        for (MathText.Run r : t.text().runs()) {
            width += (float) g.getFontMetrics(font(base, r, t.size())).getStringBounds(r.text(), g).getWidth();
        }
        float x = t.anchor() == ChartLayout.Anchor.START ? t.x()
                : t.anchor() == ChartLayout.Anchor.MIDDLE ? t.x() - width / 2 : t.x() - width;
        for (MathText.Run r : t.text().runs()) {
            Font f = font(base, r, t.size());
            g.setFont(f);
            float dy = r.shift() == MathText.Shift.SUB ? 0.25f * t.size() : r.shift() == MathText.Shift.SUP
                    ? -0.35f * t.size() : 0f;
            g.drawString(r.text(), x, t.y() + dy);
            FontMetrics m = g.getFontMetrics(f);
            x += (float) m.getStringBounds(r.text(), g).getWidth();
        }
    }

    private static Font font(Font base, MathText.Run r, float size) {
        float s = r.shift() == MathText.Shift.BASE ? size : size * 0.7f;
        return base.deriveFont(r.italic() ? Font.ITALIC : Font.PLAIN, s);
    }
}
