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
 * draw, in the theme's colours ({@code Quire.chart.*}), so that the dark theme keeps its contrast. One chart code
 * for the workbench and the report: this class is only the Graphics2D backend.
 *
 * <p>The smallest text of the chart is drawn at the component's font size (the look and feel's default), never
 * smaller: the chart is laid out as wide as the component allows at that scale, and grows in height instead of
 * shrinking its text.
 */
public class ChartView extends JComponent {
    private Chart chart;
    private ChartLayout.Layout layout;
    private String caption = "";
    private float plotHeight = ChartLayout.PLOT_HEIGHT;

    public ChartView() {
        setOpaque(true);
    }

    /** Shows a chart; null for none. */
    public void setChart(Chart c) {
        chart = c;
        layout = null;
        sized = null;
        caption = c == null ? "" : c.caption();
        setToolTipText(caption.isEmpty() ? null : caption);
        revalidate();
        repaint();
    }

    /** Sets the height of a plot's or histogram's data area, in points of the layout (the reports use 160). */
    public void setPlotHeight(float points) {
        plotHeight = points;
        layout = null;
        sized = null;
        revalidate();
        repaint();
    }

    /** @return how many pixels a point of the layout takes: the UI font size over the chart's smallest text */
    public float scale() {
        return baseFont().getSize2D() / ChartLayout.FONT;
    }

    /** @return the component's font, or the look and feel's label font while it has none (no parent yet) */
    public Font baseFont() {
        Font f = getFont();
        if (f == null) {
            f = javax.swing.UIManager.getFont("Label.font");
        }
        return f != null ? f : new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    }

    /** @return the layout shown (at the present width), or null */
    public ChartLayout.Layout layoutShown() {
        if (chart == null) {
            return null;
        }
        float width = (getWidth() > 0 ? getWidth() : preferredWidth()) / scale();
        if (layout == null || Math.abs(layout.width() - Math.max(ChartLayout.MIN_WIDTH, width)) > 0.5f) {
            layout = ChartLayout.of(chart, width, plotHeight);
        }
        return layout;
    }

    private float naturalWidth = 0.75f * ChartLayout.WIDTH;

    /** Sets the width the chart asks its container for, in points of the layout (it fills any width given). */
    public void setNaturalWidth(float points) {
        naturalWidth = Math.max(ChartLayout.MIN_WIDTH, points);
        revalidate();
    }

    private int preferredWidth() {
        return Math.round(naturalWidth * scale());
    }

    /** @return the height in pixels the chart needs when it is {@code widthPx} wide */
    public int heightFor(int widthPx) {
        if (chart == null) {
            return 0;
        }
        float sc = scale();
        ChartLayout.Layout at = layout != null && Math.abs(layout.width() - Math.max(ChartLayout.MIN_WIDTH, widthPx / sc))
                <= 0.5f ? layout : sized;
        if (at == null || Math.abs(at.width() - Math.max(ChartLayout.MIN_WIDTH, widthPx / sc)) > 0.5f) {
            // laid out once per width asked for: a container asks for the sizes many times per layout pass
            at = ChartLayout.of(chart, widthPx / sc, plotHeight);
            sized = at;
        }
        return Math.round(at.height() * sc) + 1;
    }

    /** The layout last made for a size query at a width other than the one shown, or null. */
    private ChartLayout.Layout sized;

    /** A new width can wrap the legend onto more or fewer rows: the container is asked for a new height. */
    @Override
    @SuppressWarnings("deprecation")
    public void reshape(int x, int y, int w, int h) {
        boolean wider = w != getWidth();
        super.reshape(x, y, w, h);
        if (wider && chart != null) {
            int want = Math.round(layoutShown().height() * scale()) + 1;
            if (want != h) {
                javax.swing.SwingUtilities.invokeLater(this::revalidate);
            }
        }
    }

    @Override
    public Dimension getPreferredSize() {
        if (isPreferredSizeSet() || chart == null) {
            return isPreferredSizeSet() ? super.getPreferredSize() : new Dimension(0, 0);
        }
        int w = preferredWidth();
        return new Dimension(w, heightFor(getWidth() > 0 ? getWidth() : w));
    }

    /** As wide as there is room for, never taller than the chart. */
    @Override
    public Dimension getMaximumSize() {
        return isMaximumSizeSet() ? super.getMaximumSize()
                : new Dimension(Integer.MAX_VALUE, getPreferredSize().height);
    }

    @Override
    public Dimension getMinimumSize() {
        if (chart == null) {
            return new Dimension(0, 0);
        }
        float sc = scale();
        return new Dimension(Math.round(ChartLayout.MIN_WIDTH * sc), Math.round(layoutShown().height() * sc) + 1);
    }

    /** @return the theme colour that stands for one of the layout's colour constants */
    public static Color colour(int rgb) {
        switch (rgb) {
            case ChartLayout.BAR: return Colors.get("Quire.chart.bar");
            case ChartLayout.GRID: return Colors.get("Quire.chart.grid");
            case ChartLayout.AXIS: return Colors.get("Quire.chart.axis");
            case ChartLayout.MARK: return Colors.get("Quire.chart.mark");
            case ChartLayout.TEXT: return Colors.get("Quire.chart.text");
            case ChartLayout.THIRD: return Colors.get("Quire.chart.third");
            case ChartLayout.FOURTH: return Colors.get("Quire.chart.fourth");
            default: return new Color(rgb);
        }
    }

    @Override
    protected void paintComponent(Graphics g0) {
        g0.setColor(Colors.get("Quire.chart.background"));
        g0.fillRect(0, 0, getWidth(), getHeight());
        ChartLayout.Layout layout = layoutShown();
        if (layout == null) {
            return;
        }
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        double scale = scale();
        g.scale(scale, scale);
        Font base = baseFont();
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
