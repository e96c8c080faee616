package org.quire.app.ui.inspector;

import java.awt.BasicStroke;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Path2D;
import javax.swing.JComponent;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.budget.Distribution;

/**
 * A small picture of an input's distribution: its shape drawn over estimate ± 4 u (or a little beyond its
 * limits), with the estimate marked. A drawing of the shape only; no figure of the budget comes from here.
 */
final class DistributionPlot extends JComponent {
    private Distribution d;

    DistributionPlot() {
        setPreferredSize(new Dimension(280, 110));
        setName("distributionPlot");
    }

    void show(Distribution d) {
        this.d = d;
        repaint();
    }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(Colors.get("Quire.plot.background"));
        g.fillRect(0, 0, getWidth(), getHeight());
        if (d == null) {
            g.dispose();
            return;
        }
        int left = 8;
        int right = getWidth() - 8;
        int top = 8;
        int bottom = getHeight() - 20;
        double mean = d.mean();
        double u = d.standardUncertainty();
        double lo;
        double hi;
        double[] lim = limits(d);
        if (lim != null) {
            double pad = 0.15 * (lim[1] - lim[0]);
            lo = lim[0] - pad;
            hi = lim[1] + pad;
        } else if (d instanceof Distribution.Exponential) {
            lo = -0.2 * mean;
            hi = 5 * mean;
        } else if (u > 0) {
            lo = mean - 4 * u;
            hi = mean + 4 * u;
        } else {
            lo = mean - 1;
            hi = mean + 1;
        }
        Path2D.Double path = new Path2D.Double();
        int n = 240;
        double[] ys = new double[n + 1];
        double max = 0;
        org.quire.engine.montecarlo.Marginal m = d instanceof Distribution.Constant ? null
                : org.quire.engine.montecarlo.Marginal.of(d);
        double h = (hi - lo) / n;
        for (int i = 0; i <= n && m != null; i++) {
            double x = lo + h * i;
            // probability of a pixel-wide bin around x, from the engine's distribution function
            ys[i] = m.cdf(x + 0.5 * h) - m.cdf(x - 0.5 * h);
            max = Math.max(max, ys[i]);
        }
        g.setColor(Colors.get("Quire.plot.axis"));
        g.drawLine(left, bottom, right, bottom);
        if (d instanceof Distribution.Constant || max == 0) {
            int x = (left + right) / 2;
            g.setColor(Colors.get("Quire.plot.line"));
            g.setStroke(new BasicStroke(2f));
            g.drawLine(x, top, x, bottom);
        } else {
            path.moveTo(left, bottom);
            for (int i = 0; i <= n; i++) {
                path.lineTo(left + (right - left) * (double) i / n, bottom - (bottom - top) * ys[i] / max);
            }
            path.lineTo(right, bottom);
            path.closePath();
            g.setColor(Colors.get("Quire.plot.fill"));
            g.fill(path);
            g.setColor(Colors.get("Quire.plot.line"));
            g.setStroke(new BasicStroke(1.5f));
            g.draw(path);
            int xm = left + (int) Math.round((right - left) * (mean - lo) / (hi - lo));
            g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10, new float[] {3, 3}, 0));
            g.drawLine(xm, top, xm, bottom);
        }
        g.setColor(Colors.get("Label.disabledForeground"));
        String label = (org.quire.engine.budget.TypeB.DISTRIBUTIONS.contains(d.shape()) ? org.quire.engine.budget.TypeB.screenName(d.shape()) : d.shape()) + "   x = " + Fmt.num(mean) + "   u = " + Fmt.working(u);
        g.drawString(label, left, getHeight() - 5);
        g.dispose();
    }

    private static double[] limits(Distribution d) {
        if (d instanceof Distribution.Rectangular) {
            return new double[] {((Distribution.Rectangular) d).lower(), ((Distribution.Rectangular) d).upper()};
        }
        if (d instanceof Distribution.Triangular) {
            return new double[] {((Distribution.Triangular) d).lower(), ((Distribution.Triangular) d).upper()};
        }
        if (d instanceof Distribution.Arcsine) {
            return new double[] {((Distribution.Arcsine) d).lower(), ((Distribution.Arcsine) d).upper()};
        }
        if (d instanceof Distribution.Trapezoidal) {
            return new double[] {((Distribution.Trapezoidal) d).lower(), ((Distribution.Trapezoidal) d).upper()};
        }
        if (d instanceof Distribution.CurvilinearTrapezoid) {
            Distribution.CurvilinearTrapezoid c = (Distribution.CurvilinearTrapezoid) d;
            return new double[] {c.lower() - c.d(), c.upper() + c.d()};
        }
        return null;
    }

}
