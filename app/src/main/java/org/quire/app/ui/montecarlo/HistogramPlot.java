package org.quire.app.ui.montecarlo;

import java.awt.BasicStroke;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import javax.swing.JComponent;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.montecarlo.MonteCarloOutcome;

/**
 * Draws the engine's histogram of an output's model values with the GUM distribution over it (the engine's
 * expected count per bin), both Monte Carlo coverage intervals (solid: the probabilistically symmetric one, which
 * the GUM interval is compared with; dotted: the shortest) and the GUM interval y ± U (dashed) marked. Drawing
 * only: bins, curve and intervals come from the engine.
 */
final class HistogramPlot extends JComponent {
    private MonteCarloOutcome.Output outcome;

    HistogramPlot() {
        setPreferredSize(new Dimension(420, 170));
    }

    void show(MonteCarloOutcome.Output o) {
        this.outcome = o;
        repaint();
    }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(Colors.get("Quire.plot.background"));
        g.fillRect(0, 0, getWidth(), getHeight());
        if (outcome == null) {
            g.dispose();
            return;
        }
        org.quire.engine.montecarlo.Histogram h = outcome.histogram();
        double[] edges = h.edges();
        double lower = edges[0];
        double upper = edges[edges.length - 1];
        long[] counts = h.counts();
        long max = 1;
        for (long c : counts) {
            max = Math.max(max, c);
        }
        double[] curve = outcome.gumExpectedCounts();
        if (curve != null && curve.length == counts.length) {
            for (double c : curve) {
                max = Math.max(max, (long) Math.ceil(c));
            }
        }
        int left = 10;
        int right = getWidth() - 10;
        int top = 10;
        int bottom = getHeight() - 22;
        double span = upper > lower ? upper - lower : 1;
        g.setColor(Colors.get("Quire.plot.fill"));
        for (int i = 0; i < counts.length; i++) {
            int x0 = left + (int) Math.round((right - left) * (double) i / counts.length);
            int x1 = left + (int) Math.round((right - left) * (double) (i + 1) / counts.length);
            int y = bottom - (int) Math.round((bottom - top) * (double) counts[i] / max);
            g.fillRect(x0, y, Math.max(1, x1 - x0), bottom - y);
        }
        g.setColor(Colors.get("Quire.plot.axis"));
        g.drawLine(left, bottom, right, bottom);
        g.drawString(Fmt.working(lower), left, bottom + 15);
        String hi = Fmt.working(upper);
        g.drawString(hi, right - g.getFontMetrics().stringWidth(hi), bottom + 15);
        if (curve != null && curve.length == counts.length) {
            g.setColor(Colors.get("Quire.plot.gumInterval"));
            g.setStroke(new BasicStroke(1.5f));
            int px = -1;
            int py = -1;
            for (int i = 0; i < curve.length; i++) {
                int x = left + (int) Math.round((right - left) * (i + 0.5) / counts.length);
                int y = bottom - (int) Math.round((bottom - top) * curve[i] / max);
                if (px >= 0) {
                    g.drawLine(px, py, x, y);
                }
                px = x;
                py = y;
            }
        }
        markDotted(g, outcome.shortestInterval().lower(), lower, span, left, right, top, bottom);
        markDotted(g, outcome.shortestInterval().upper(), lower, span, left, right, top, bottom);
        mark(g, outcome.symmetricInterval().lower(), lower, span, left, right, top, bottom, "Quire.plot.mcInterval",
                false);
        mark(g, outcome.symmetricInterval().upper(), lower, span, left, right, top, bottom, "Quire.plot.mcInterval",
                false);
        mark(g, outcome.gumInterval().lower(), lower, span, left, right, top, bottom, "Quire.plot.gumInterval", true);
        mark(g, outcome.gumInterval().upper(), lower, span, left, right, top, bottom, "Quire.plot.gumInterval", true);
        g.dispose();
    }

    private void markDotted(Graphics2D g, double v, double lo, double span, int left, int right, int top, int bottom) {
        if (Double.isNaN(v)) {
            return;
        }
        int x = left + (int) Math.round((right - left) * (v - lo) / span);
        g.setColor(Colors.get("Quire.plot.mcInterval"));
        g.setStroke(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10, new float[] {1.5f, 3}, 0));
        g.drawLine(x, top, x, bottom);
    }

    private void mark(Graphics2D g, double v, double lo, double span, int left, int right, int top, int bottom,
            String colour, boolean dashed) {
        if (Double.isNaN(v)) {
            return;
        }
        int x = left + (int) Math.round((right - left) * (v - lo) / span);
        g.setColor(Colors.get(colour));
        g.setStroke(dashed ? new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10,
                new float[] {5, 4}, 0) : new BasicStroke(1.5f));
        g.drawLine(x, top, x, bottom);
    }
}
