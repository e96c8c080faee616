package org.quire.app.report;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.quire.engine.gum.Figures;

/**
 * Lays a {@link Chart} out as drawing primitives (rectangles, lines, text) in a box of points with the origin
 * at the top left, so that the SVG and PDF renderers draw the same picture.
 *
 * <p>References: axis ticks by P. S. Heckbert, "Nice numbers for graph labels", in Graphics Gems (1990),
 * pp. 61-63: a step of 1, 2 or 5 times a power of ten.
 *
 * <p>Every chart has its axes with ticks and tick labels, a title on each axis and a legend naming every
 * series, bar and mark. The colours are the report's (on white paper); the workbench draws the same shapes and
 * replaces each of these colour constants by its theme colour ({@code Quire.chart.*}).
 *
 * <p>Stateless and thread-safe.
 */
public final class ChartLayout {
    /** The width of a chart in the reports, in points. */
    public static final float WIDTH = 480f;
    /** The narrowest a chart is laid out, in points. */
    public static final float MIN_WIDTH = 170f;
    /** The smallest text of a chart (tick labels, legend), in points; titles and names are a little larger. */
    public static final float FONT = 7.5f;
    public static final int BAR = 0x2f5d8a;
    public static final int GRID = 0xd5dae1;
    public static final int AXIS = 0x5a6472;
    public static final int MARK = 0xb3261e;
    public static final int TEXT = 0x1d2430;
    /** The colour of {@link Chart.Tone#THIRD}. */
    public static final int THIRD = 0x2e7d32;
    /** The colour of {@link Chart.Tone#FOURTH}. */
    public static final int FOURTH = 0xb36b00;

    public enum Anchor { START, MIDDLE, END }

    public sealed interface Shape permits Rect, Line, Label {
    }

    public record Rect(float x, float y, float w, float h, int rgb) implements Shape {
    }

    public record Line(float x1, float y1, float x2, float y2, int rgb, float width, boolean dashed) implements Shape {
    }

    public record Label(float x, float y, MathText text, float size, Anchor anchor, int rgb) implements Shape {
    }

    public record Layout(float width, float height, List<Shape> shapes) {
    }

    private ChartLayout() {
    }

    /** @return the shapes of a chart {@link #WIDTH} wide, in points from the top left */
    public static Layout of(Chart c) {
        return of(c, WIDTH);
    }

    /**
     * @param width the width to fill, in points; at least {@link #MIN_WIDTH} is used
     * @return the shapes of a chart, in points from the top left
     */
    public static Layout of(Chart c, float width) {
        return of(c, width, PLOT_HEIGHT);
    }

    /** The height of the data area of a plot or histogram in the reports, in points. */
    public static final float PLOT_HEIGHT = 160f;

    /**
     * @param width the width to fill, in points; at least {@link #MIN_WIDTH} is used
     * @param plotHeight the height of the data area of a plot or histogram, in points (at least 40); bars and
     *     rankings take a row per bar
     * @return the shapes of a chart, in points from the top left
     */
    public static Layout of(Chart c, float width, float plotHeight) {
        float w = Math.max(MIN_WIDTH, width);
        float h = Math.max(40f, plotHeight);
        if (c instanceof Chart.Bars) {
            return bars((Chart.Bars) c, w);
        }
        if (c instanceof Chart.Plot) {
            return plot((Chart.Plot) c, w, h);
        }
        if (c instanceof Chart.Ranking) {
            return ranking((Chart.Ranking) c, w);
        }
        return histogram((Chart.Histogram) c, w, h);
    }

    /** @return a rough width of {@code t} in points at {@code size}, for laying out label columns */
    public static float estimateWidth(MathText t, float size) {
        float w = 0;
        for (MathText.Run r : t.runs()) {
            float s = r.shift() == MathText.Shift.BASE ? size : size * 0.7f;
            w += r.text().codePointCount(0, r.text().length()) * s * 0.6f;
        }
        return w;
    }

    private static Layout bars(Chart.Bars c, float width) {
        List<Shape> s = new ArrayList<>();
        float row = 15f;
        float top = 6f;
        float labelWidth = 30f;
        for (MathText l : c.labels()) {
            labelWidth = Math.max(labelWidth, estimateWidth(l, FONT + 1) + 10f);
        }
        labelWidth = Math.min(labelWidth, 150f);
        float x0 = labelWidth;
        float x1 = width - 40f;
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
            s.add(new Line(x, plotBottom, x, plotBottom + 3f, AXIS, 0.8f, false));
            s.add(new Label(x, plotBottom + 11f, MathText.upright(tick(t, ticks)), FONT, Anchor.MIDDLE, AXIS));
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
        s.add(new Line(x0, plotBottom, x1, plotBottom, AXIS, 0.8f, false));
        s.add(new Label((x0 + x1) / 2, plotBottom + 24f, Typesetter.labelWithUnit(c.axisLabel()), FONT + 0.5f, Anchor.MIDDLE, AXIS));
        float end = legend(s, List.of(new Entry(c.axisLabel(), BAR, false, true)), x0, x1, plotBottom + 38f);
        return new Layout(width, end + 7f, s);
    }

    /**
     * Bars of u_i(y) against the lower axis, the cumulative share of u_c^2(y) as a line with points against the
     * upper axis (0 to 100 %), the inputs' names on the left, both axis titles and a legend.
     */
    private static Layout ranking(Chart.Ranking c, float width) {
        List<Shape> s = new ArrayList<>();
        float row = 15f;
        float top = 30f;
        float labelWidth = 30f;
        for (MathText l : c.labels()) {
            labelWidth = Math.max(labelWidth, estimateWidth(l, FONT + 1) + 10f);
        }
        float x0 = Math.min(labelWidth, 150f);
        float x1 = width - 20f;
        double max = 0;
        for (double v : c.contributions()) {
            max = Math.max(max, v);
        }
        int n = c.labels().size();
        float bottom = top + row * Math.max(1, n);
        double[] ticks = ticks(0, max > 0 ? max : 1, 5);
        double end = ticks[ticks.length - 1];
        for (double t : ticks) {
            float x = (float) (x0 + (x1 - x0) * t / end);
            s.add(new Line(x, top, x, bottom, GRID, 0.5f, false));
            s.add(new Line(x, bottom, x, bottom + 3f, AXIS, 0.8f, false));
            s.add(new Label(x, bottom + 11f, MathText.upright(tick(t, ticks)), FONT, Anchor.MIDDLE, AXIS));
        }
        double[] pct = {0, 20, 40, 60, 80, 100};
        for (double t : pct) {
            float x = (float) (x0 + (x1 - x0) * t / 100);
            s.add(new Line(x, top - 3f, x, top, MARK, 0.8f, false));
            s.add(new Label(x, top - 5f, MathText.upright(tick(t, pct)), FONT, Anchor.MIDDLE, MARK));
        }
        for (int i = 0; i < n; i++) {
            float y = top + row * i;
            double v = c.contributions().get(i);
            float w = (float) ((x1 - x0) * v / end);
            s.add(new Rect(x0, y + 2.5f, Math.max(w, 0.5f), row - 5f, BAR));
            s.add(new Label(x0 - 5f, y + row - 4.5f, c.labels().get(i), FONT + 1, Anchor.END, TEXT));
        }
        float px = 0;
        float py = 0;
        for (int i = 0; i < n; i++) {
            float x = (float) (x0 + (x1 - x0) * Math.min(100, c.cumulativeShare().get(i)) / 100);
            float y = top + row * i + row / 2;
            if (i > 0) {
                s.add(new Line(px, py, x, y, MARK, 1.2f, false));
            }
            s.add(new Rect(x - 2f, y - 2f, 4f, 4f, MARK));
            px = x;
            py = y;
        }
        s.add(new Line(x0, top, x0, bottom, AXIS, 0.8f, false));
        s.add(new Line(x0, bottom, x1, bottom, AXIS, 0.8f, false));
        s.add(new Line(x0, top, x1, top, MARK, 0.8f, false));
        s.add(new Label((x0 + x1) / 2, top - 16f, Typesetter.labelWithUnit("cumulative share of u_c^2(y) (%)"),
                FONT + 0.5f, Anchor.MIDDLE, MARK));
        s.add(new Label((x0 + x1) / 2, bottom + 24f, Typesetter.labelWithUnit(c.axisLabel()), FONT + 0.5f,
                Anchor.MIDDLE, AXIS));
        float endY = legend(s, List.of(new Entry("contribution u_i(y)", BAR, false, true),
                new Entry("cumulative share of u_c^2(y)", MARK, false, false)), x0, x1, bottom + 38f);
        return new Layout(width, endY + 7f, s);
    }

    static int rgb(Chart.Tone t) {
        switch (t) {
            case SECOND: return MARK;
            case THIRD: return THIRD;
            case FOURTH: return FOURTH;
            default: return BAR;
        }
    }

    /** One legend entry: a sample line (dashed or not) or a filled square, and its text. */
    private record Entry(String text, int rgb, boolean dashed, boolean square) {
    }

    /**
     * Lays legend entries out in rows from {@code y}, left to right; an entry wider than the chart is broken at
     * its spaces onto lines of its own. @return the y below the last row
     */
    private static float legend(List<Shape> s, List<Entry> entries, float left, float right, float y) {
        float x = left;
        float row = y;
        for (Entry e : entries) {
            List<MathText> lines = wrap(e.text(), right - left - 30f);
            float w = 18f;
            for (MathText l : lines) {
                w = Math.max(w, 18f + estimateWidth(l, FONT) + 12f);
            }
            if (x > left && (x + w > right || lines.size() > 1)) {
                x = left;
                row += 11f;
            }
            if (e.square()) {
                s.add(new Rect(x + 4f, row - 6f, 6f, 6f, e.rgb()));
            } else {
                s.add(new Line(x, row - 2.5f, x + 14f, row - 2.5f, e.rgb(), 1.2f, e.dashed()));
            }
            for (int i = 0; i < lines.size(); i++) {
                s.add(new Label(x + 18f, row + 10f * i, lines.get(i), FONT, Anchor.START, TEXT));
            }
            row += 10f * (lines.size() - 1);
            if (lines.size() > 1) {
                x = right; // the next entry starts a row of its own
            } else {
                x += w;
            }
        }
        return entries.isEmpty() ? y - 11f : row;
    }

    /** @return label markup broken at spaces into lines no wider than {@code width} points (estimated) */
    static List<MathText> wrap(String markup, float width) {
        List<MathText> out = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        java.util.regex.Matcher words = java.util.regex.Pattern.compile("[^\\s(]*\\([^)]*\\)\\S*|\\S+")
                .matcher(markup);
        while (words.find()) {
            String word = words.group();
            String next = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && estimateWidth(Typesetter.labelWithUnit(next), FONT) > width) {
                out.add(Typesetter.labelWithUnit(line.toString()));
                line.setLength(0);
                line.append(word);
            } else {
                line.setLength(0);
                line.append(next);
            }
        }
        out.add(Typesetter.labelWithUnit(line.toString()));
        return out;
    }

    /** The title of a histogram's vertical axis. */
    static final String HISTOGRAM_COUNT = "trials per bin";

    private static Layout histogram(Chart.Histogram c, float width, float plotHeight) {
        List<Shape> s = new ArrayList<>();
        double[] e = c.edges();
        long[] n = c.counts();
        float right = width - 14f;
        float top = 24f;
        float bottom = top + plotHeight;
        double max = 1;
        for (long k : n) {
            max = Math.max(max, k);
        }
        double lo = e[0];
        double hi = e[e.length - 1];
        for (Chart.Interval iv : c.intervals()) {
            lo = Math.min(lo, iv.low());
            hi = Math.max(hi, iv.high());
        }
        double[] cx = c.curveX();
        double[] cy = c.curveY();
        if (cx != null) {
            for (double v : cy) {
                max = Math.max(max, v);
            }
        }
        double pad = (hi - lo) * 0.02;
        if (lo < e[0] || hi > e[e.length - 1]) {
            lo -= pad;
            hi += pad;
        }
        double[] yt = ticks(0, max, 5);
        max = yt[yt.length - 1];
        float left = 14f;
        for (double t : yt) {
            left = Math.max(left, estimateWidth(MathText.upright(tick(t, yt)), FONT) + 10f);
        }
        final float x0 = left;
        final double l0 = lo;
        final double span = hi - lo;
        java.util.function.DoubleUnaryOperator px = v -> x0 + (right - x0) * (v - l0) / span;
        for (double t : yt) {
            float y = (float) (bottom - (bottom - top) * t / max);
            s.add(new Line(left, y, right, y, GRID, 0.5f, false));
            s.add(new Line(left - 3f, y, left, y, AXIS, 0.8f, false));
            s.add(new Label(left - 5f, y + 2.5f, MathText.upright(tick(t, yt)), FONT, Anchor.END, AXIS));
        }
        for (int i = 0; i < n.length; i++) {
            float xa = (float) px.applyAsDouble(e[i]);
            float xb = (float) px.applyAsDouble(e[i + 1]);
            float h = (float) ((bottom - top) * n[i] / max);
            if (h > 0) {
                // a little overlap, so that rounding leaves no hairline gaps between neighbouring bars
                s.add(new Rect(xa, bottom - h, Math.max(xb - xa + 0.25f, 0.3f), h, BAR));
            }
        }
        List<Entry> legend = new ArrayList<>();
        legend.add(new Entry(HISTOGRAM_COUNT, BAR, false, true));
        if (cx != null && cx.length > 1) {
            int rgb = rgb(Chart.Tone.THIRD);
            for (int i = 1; i < cx.length; i++) {
                if (cx[i - 1] < lo || cx[i] > hi) {
                    continue;
                }
                s.add(new Line((float) px.applyAsDouble(cx[i - 1]), (float) (bottom - (bottom - top) * cy[i - 1] / max),
                        (float) px.applyAsDouble(cx[i]), (float) (bottom - (bottom - top) * cy[i] / max), rgb, 1.3f, false));
            }
            if (!c.curveLegend().isEmpty()) {
                legend.add(new Entry(c.curveLegend(), rgb, false, false));
            }
        }
        s.add(new Line(left, bottom, right, bottom, AXIS, 0.8f, false));
        s.add(new Line(left, top, left, bottom, AXIS, 0.8f, false));
        s.add(new Label(4f, top - 10f, MathText.upright(HISTOGRAM_COUNT), FONT + 0.5f, Anchor.START, AXIS));
        double[] ticks = inside(lo, hi, Math.max(3, Math.round((right - left) / 70f)));
        for (double t : ticks) {
            if (t < lo || t > hi) {
                continue;
            }
            float x = (float) px.applyAsDouble(t);
            s.add(new Line(x, bottom, x, bottom + 3f, AXIS, 0.6f, false));
            s.add(new Label(x, bottom + 12f, MathText.upright(tick(t, ticks)), FONT, Anchor.MIDDLE, AXIS));
        }
        for (double m : c.markers()) {
            float x = (float) px.applyAsDouble(m);
            s.add(new Line(x, top - 6f, x, bottom, MARK, 1f, true));
        }
        if (!c.markerLegend().isEmpty() && c.markers().length > 0) {
            legend.add(1, new Entry(c.markerLegend(), MARK, true, false));
        }
        int k = 0;
        for (Chart.Interval iv : c.intervals()) {
            int rgb = rgb(iv.tone());
            // intervals drawn later start a little lower, so that coinciding ends stay visible
            float y0 = top - 4f + 7f * k++;
            s.add(new Line((float) px.applyAsDouble(iv.low()), y0, (float) px.applyAsDouble(iv.low()), bottom, rgb, 1f, true));
            s.add(new Line((float) px.applyAsDouble(iv.high()), y0, (float) px.applyAsDouble(iv.high()), bottom, rgb, 1f, true));
            legend.add(new Entry(iv.legend(), rgb, true, false));
        }
        s.add(new Label((left + right) / 2, bottom + 25f, Typesetter.labelWithUnit(c.axisLabel()), FONT + 0.5f, Anchor.MIDDLE, AXIS));
        float end = legend(s, legend, left, right, bottom + 39f);
        return new Layout(width, end + 7f, s);
    }

    private static Layout plot(Chart.Plot c, float width, float plotHeight) {
        List<Shape> s = new ArrayList<>();
        float left = 48f;
        float right = width - 14f;
        float top = 20f;
        float bottom = top + plotHeight;
        boolean log = c.logX();
        double xlo = Double.POSITIVE_INFINITY;
        double xhi = Double.NEGATIVE_INFINITY;
        double ylo = Double.POSITIVE_INFINITY;
        double yhi = Double.NEGATIVE_INFINITY;
        for (Chart.Series se : c.series()) {
            double[] x = se.x();
            double[] y = se.y();
            double[] err = se.yError();
            for (int i = 0; i < x.length; i++) {
                double xv = log ? Math.log10(x[i]) : x[i];
                double eb = err == null || !Double.isFinite(err[i]) ? 0 : err[i];
                if (!Double.isFinite(xv) || !Double.isFinite(y[i] - eb) || !Double.isFinite(y[i] + eb)) {
                    continue; // a value that is not a finite number is not drawn (the tables state it)
                }
                xlo = Math.min(xlo, xv);
                xhi = Math.max(xhi, xv);
                ylo = Math.min(ylo, y[i] - eb);
                yhi = Math.max(yhi, y[i] + eb);
            }
        }
        for (double r : c.yRules()) {
            if (Double.isFinite(r)) {
                ylo = Math.min(ylo, r);
                yhi = Math.max(yhi, r);
            }
        }
        if (!Double.isFinite(xhi - xlo)) {
            xlo = 0;
            xhi = 1;
        }
        if (!Double.isFinite(yhi - ylo)) {
            ylo = 0;
            yhi = 1;
        }
        if (xhi <= xlo) {
            xlo -= 0.5;
            xhi += 0.5;
        }
        if (yhi <= ylo) {
            double d = ylo == 0 ? 1 : Math.abs(ylo) * 0.1;
            ylo -= d;
            yhi += d;
        }
        double[] yt = ticks(ylo, yhi, 6);
        ylo = Math.min(ylo, yt[0]);
        yhi = Math.max(yhi, yt[yt.length - 1]);
        double xpad = (xhi - xlo) * 0.04;
        xlo -= xpad;
        xhi += xpad;
        final double x0 = xlo;
        final double xs = xhi - xlo;
        final double y0 = ylo;
        final double ys = yhi - ylo;
        java.util.function.DoubleUnaryOperator px = v -> left + (right - left) * ((log ? Math.log10(v) : v) - x0) / xs;
        java.util.function.DoubleUnaryOperator py = v -> bottom - (bottom - top) * (v - y0) / ys;
        for (double t : yt) {
            float y = (float) py.applyAsDouble(t);
            s.add(new Line(left, y, right, y, GRID, 0.5f, false));
            s.add(new Line(left - 3f, y, left, y, AXIS, 0.8f, false));
            s.add(new Label(left - 5f, y + 2.5f, MathText.upright(tick(t, yt)), FONT, Anchor.END, AXIS));
        }
        List<double[]> xticks = new ArrayList<>();
        int xTicks = Math.max(3, Math.round((right - left) / 60f));
        if (log) {
            int d0 = (int) Math.floor(xlo);
            int d1 = (int) Math.ceil(xhi);
            boolean minor = d1 - d0 <= 4;
            for (int d = d0; d <= d1; d++) {
                for (int m : minor ? new int[] {1, 2, 5} : new int[] {1}) {
                    double v = m * Math.pow(10, d);
                    double lv = Math.log10(v);
                    if (lv >= xlo && lv <= xhi) {
                        xticks.add(new double[] {v, m == 1 ? 1 : 0});
                    }
                }
            }
        } else {
            for (double t : inside(xlo, xhi, xTicks)) {
                if (t >= xlo && t <= xhi) {
                    xticks.add(new double[] {t, 1});
                }
            }
        }
        for (double[] t : xticks) {
            float x = (float) px.applyAsDouble(t[0]);
            s.add(new Line(x, top, x, bottom, GRID, t[1] == 1 ? 0.5f : 0.3f, false));
            s.add(new Line(x, bottom, x, bottom + 3f, AXIS, 0.8f, false));
            String text = log ? Figures.compact(t[0], 3) : tick(t[0], inside(x0, x0 + xs, xTicks));
            s.add(new Label(x, bottom + 12f, MathText.upright(text), FONT, Anchor.MIDDLE, AXIS));
        }
        for (double r : c.yRules()) {
            float y = (float) py.applyAsDouble(r);
            if (!Float.isFinite(y)) {
                continue;
            }
            s.add(new Line(left, y, right, y, AXIS, 0.7f, r != 0));
        }
        s.add(new Line(left, top, left, bottom, AXIS, 0.8f, false));
        s.add(new Line(left, bottom, right, bottom, AXIS, 0.8f, false));
        List<Entry> legend = new ArrayList<>();
        for (Chart.Series se : c.series()) {
            int rgb = rgb(se.tone());
            double[] x = se.x();
            double[] y = se.y();
            double[] err = se.yError();
            if (se.style() != Chart.Style.POINTS) {
                for (int i = 1; i < x.length; i++) {
                    if (!drawable(px, py, x[i - 1], y[i - 1]) || !drawable(px, py, x[i], y[i])) {
                        continue;
                    }
                    s.add(new Line((float) px.applyAsDouble(x[i - 1]), (float) py.applyAsDouble(y[i - 1]),
                            (float) px.applyAsDouble(x[i]), (float) py.applyAsDouble(y[i]), rgb,
                            se.style() == Chart.Style.DASHED ? 1f : 1.2f, se.style() == Chart.Style.DASHED));
                }
            }
            if (se.style() == Chart.Style.POINTS || se.style() == Chart.Style.LINE_POINTS) {
                for (int i = 0; i < x.length; i++) {
                    if (!drawable(px, py, x[i], y[i])) {
                        continue;
                    }
                    float cx = (float) px.applyAsDouble(x[i]);
                    float cy = (float) py.applyAsDouble(y[i]);
                    if (err != null && err[i] > 0 && drawable(px, py, x[i], y[i] - err[i])
                            && drawable(px, py, x[i], y[i] + err[i])) {
                        float ya = (float) py.applyAsDouble(y[i] - err[i]);
                        float yb = (float) py.applyAsDouble(y[i] + err[i]);
                        s.add(new Line(cx, ya, cx, yb, rgb, 0.8f, false));
                        s.add(new Line(cx - 3f, ya, cx + 3f, ya, rgb, 0.8f, false));
                        s.add(new Line(cx - 3f, yb, cx + 3f, yb, rgb, 0.8f, false));
                    }
                    s.add(new Rect(cx - 2.2f, cy - 2.2f, 4.4f, 4.4f, rgb));
                }
            }
            legend.add(new Entry(se.legend(), rgb, se.style() == Chart.Style.DASHED, se.style() == Chart.Style.POINTS));
        }
        s.add(new Label(left - 40f, top - 8f, Typesetter.labelWithUnit(c.yLabel()), FONT + 0.5f, Anchor.START, AXIS));
        s.add(new Label((left + right) / 2, bottom + 25f, Typesetter.labelWithUnit(c.xLabel()), FONT + 0.5f, Anchor.MIDDLE, AXIS));
        float end = legend(s, legend, left, right, bottom + 39f);
        return new Layout(width, end + 7f, s);
    }

    private static boolean drawable(java.util.function.DoubleUnaryOperator px, java.util.function.DoubleUnaryOperator py,
            double x, double y) {
        float a = (float) px.applyAsDouble(x);
        float b = (float) py.applyAsDouble(y);
        return Float.isFinite(a) && Float.isFinite(b);
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

    /**
     * @return ticks as {@link #ticks}, asking for more until at least three fall inside [lo, hi] (a narrow range
     *     can otherwise keep a single tick inside), the step decimals fitting those inside
     */
    static double[] inside(double lo, double hi, int wanted) {
        double[] t = ticks(lo, hi, wanted);
        for (int w = wanted; w < 40; w++) {
            t = ticks(lo, hi, w);
            int in = 0;
            for (double v : t) {
                if (v >= lo && v <= hi) {
                    in++;
                }
            }
            if (in >= 3) {
                break;
            }
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
        if (!Double.isFinite(v)) {
            return "";
        }
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
