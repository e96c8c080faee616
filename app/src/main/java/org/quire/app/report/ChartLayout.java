package org.quire.app.report;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * Lays a {@link Chart} out as drawing primitives (rectangles, lines, text) in a box of points with the origin
 * at the top left, so that the SVG and PDF renderers draw the same picture.
 *
 * <p>References: axis ticks by P. S. Heckbert, "Nice numbers for graph labels", in Graphics Gems (1990),
 * pp. 61-63: a step of 1, 2 or 5 times a power of ten.
 *
 * <p>Stateless and thread-safe.
 */
final class ChartLayout {
    static final float WIDTH = 480f;
    static final float FONT = 7.5f;
    static final int BAR = 0x2f5d8a;
    static final int GRID = 0xd5dae1;
    static final int AXIS = 0x5a6472;
    static final int MARK = 0xb3261e;
    static final int TEXT = 0x1d2430;

    enum Anchor { START, MIDDLE, END }

    sealed interface Shape permits Rect, Line, Label {
    }

    record Rect(float x, float y, float w, float h, int rgb) implements Shape {
    }

    record Line(float x1, float y1, float x2, float y2, int rgb, float width, boolean dashed) implements Shape {
    }

    record Label(float x, float y, MathText text, float size, Anchor anchor, int rgb) implements Shape {
    }

    record Layout(float width, float height, List<Shape> shapes) {
    }

    private ChartLayout() {
    }

    static Layout of(Chart c) {
        return c instanceof Chart.Bars ? bars((Chart.Bars) c) : histogram((Chart.Histogram) c);
    }

    /** @return a rough width of {@code t} in points at {@code size}, for laying out label columns */
    static float estimateWidth(MathText t, float size) {
        float w = 0;
        for (MathText.Run r : t.runs()) {
            float s = r.shift() == MathText.Shift.BASE ? size : size * 0.7f;
            w += r.text().codePointCount(0, r.text().length()) * s * 0.6f;
        }
        return w;
    }

    private static Layout bars(Chart.Bars c) {
        List<Shape> s = new ArrayList<>();
        float row = 15f;
        float top = 6f;
        float labelWidth = 30f;
        for (MathText l : c.labels()) {
            labelWidth = Math.max(labelWidth, estimateWidth(l, FONT + 1) + 10f);
        }
        labelWidth = Math.min(labelWidth, 150f);
        float x0 = labelWidth;
        float x1 = WIDTH - 40f;
        double max = 0;
        for (double v : c.values()) {
            max = Math.max(max, v);
        }
        double[] ticks = ticks(0, max > 0 ? max : 1, 5);
        double top0 = ticks[ticks.length - 1];
        float plotBottom = top + row * c.labels().size();
        for (double t : ticks) {
            float x = (float) (x0 + (x1 - x0) * t / top0);
            s.add(new Line(x, top - 2, x, plotBottom, GRID, 0.5f, false));
            s.add(new Label(x, plotBottom + 10f, MathText.upright(tick(t, ticks)), FONT, Anchor.MIDDLE, AXIS));
        }
        for (int i = 0; i < c.labels().size(); i++) {
            float y = top + row * i;
            double v = c.values().get(i);
            float w = (float) ((x1 - x0) * v / top0);
            s.add(new Rect(x0, y + 2.5f, Math.max(w, 0.5f), row - 5f, BAR));
            s.add(new Label(x0 - 5f, y + row - 4.5f, c.labels().get(i), FONT + 1, Anchor.END, TEXT));
            s.add(new Label(x0 + w + 3f, y + row - 4.5f, MathText.upright(Figures.sig(v, 3)), FONT, Anchor.START, TEXT));
        }
        s.add(new Line(x0, top - 2, x0, plotBottom, AXIS, 0.8f, false));
        s.add(new Label((x0 + x1) / 2, plotBottom + 22f, Typesetter.label(c.axisLabel()), FONT + 0.5f, Anchor.MIDDLE, AXIS));
        return new Layout(WIDTH, plotBottom + 28f, s);
    }

    private static Layout histogram(Chart.Histogram c) {
        List<Shape> s = new ArrayList<>();
        double[] e = c.edges();
        long[] n = c.counts();
        float left = 14f;
        float right = WIDTH - 14f;
        float top = 14f;
        float bottom = 170f;
        long max = 1;
        for (long k : n) {
            max = Math.max(max, k);
        }
        double lo = e[0];
        double hi = e[e.length - 1];
        for (int i = 0; i < n.length; i++) {
            float xa = (float) (left + (right - left) * (e[i] - lo) / (hi - lo));
            float xb = (float) (left + (right - left) * (e[i + 1] - lo) / (hi - lo));
            float h = (float) ((bottom - top) * n[i] / (double) max);
            if (h > 0) {
                s.add(new Rect(xa, bottom - h, Math.max(xb - xa, 0.3f), h, BAR));
            }
        }
        s.add(new Line(left, bottom, right, bottom, AXIS, 0.8f, false));
        double[] ticks = ticks(lo, hi, 6);
        for (double t : ticks) {
            if (t < lo || t > hi) {
                continue;
            }
            float x = (float) (left + (right - left) * (t - lo) / (hi - lo));
            s.add(new Line(x, bottom, x, bottom + 3f, AXIS, 0.6f, false));
            s.add(new Label(x, bottom + 12f, MathText.upright(tick(t, ticks)), FONT, Anchor.MIDDLE, AXIS));
        }
        for (double m : c.markers()) {
            float x = (float) (left + (right - left) * (m - lo) / (hi - lo));
            s.add(new Line(x, top - 6f, x, bottom, MARK, 1f, true));
        }
        if (!c.markerLegend().isEmpty() && c.markers().length > 0) {
            s.add(new Line(left, bottom + 23f, left + 14f, bottom + 23f, MARK, 1f, true));
            s.add(new Label(left + 18f, bottom + 25.5f, MathText.upright(c.markerLegend()), FONT, Anchor.START, TEXT));
        }
        s.add(new Label((left + right) / 2, bottom + 26f, Typesetter.label(c.axisLabel()), FONT + 0.5f, Anchor.MIDDLE, AXIS));
        return new Layout(WIDTH, bottom + 32f, s);
    }

    /** @return tick positions covering [lo, hi] with a step of 1, 2 or 5 times a power of ten (Heckbert 1990) */
    static double[] ticks(double lo, double hi, int wanted) {
        double range = nice(hi - lo, false);
        double step = nice(range / Math.max(1, wanted - 1), true);
        double first = Math.floor(lo / step) * step;
        double last = Math.ceil(hi / step) * step;
        int count = (int) Math.round((last - first) / step) + 1;
        double[] t = new double[Math.max(2, Math.min(count, 50))];
        for (int i = 0; i < t.length; i++) {
            t[i] = first + i * step;
        }
        return t;
    }

    private static double nice(double x, boolean round) {
        if (!(x > 0)) {
            return 1;
        }
        double exp = Math.floor(Math.log10(x));
        double f = x / Math.pow(10, exp);
        double nf;
        if (round) {
            nf = f < 1.5 ? 1 : f < 3 ? 2 : f < 7 ? 5 : 10;
        } else {
            nf = f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10;
        }
        return nf * Math.pow(10, exp);
    }

    /** @return a tick value with as many decimals as the step needs */
    static String tick(double v, double[] ticks) {
        double step = ticks.length > 1 ? ticks[1] - ticks[0] : 1;
        int decimals = Math.max(0, (int) -Math.floor(Math.log10(step) + 1e-9));
        if (decimals > 6 || Math.abs(v) >= 1e6) {
            return Figures.sig(v, 3);
        }
        BigDecimal b = new BigDecimal(v).setScale(decimals, java.math.RoundingMode.HALF_EVEN);
        String s = b.toPlainString();
        return s.startsWith("-") ? "−" + s.substring(1) : s;
    }
}
