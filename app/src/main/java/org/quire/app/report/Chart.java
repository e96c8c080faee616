package org.quire.app.report;

import java.util.List;
import java.util.Objects;

/**
 * A chart of a report, drawn as vector graphics by the HTML (SVG) and PDF renderers.
 *
 * <p>Implementations are immutable and thread-safe.
 */
public sealed interface Chart permits Chart.Bars, Chart.Histogram, Chart.Plot, Chart.Ranking {

    /** @return the caption shown under the chart */
    String caption();

    /** The colours a chart draws its series, curves and intervals in, told apart in the legend. */
    enum Tone {
        /** Dark blue: the main data. */
        FIRST,
        /** Red: the first marked quantity (e.g. a Monte Carlo interval). */
        SECOND,
        /** Green: the second (e.g. the GUM distribution and interval). */
        THIRD,
        /** Orange: the third (e.g. a second Monte Carlo interval, or limits). */
        FOURTH
    }

    /**
     * A coverage interval or pair of limits marked on a histogram by two vertical lines.
     *
     * @param legend what it is, e.g. "Monte Carlo 95 % interval, probabilistically symmetric"
     * @param low the lower end
     * @param high the upper end
     * @param tone its colour
     */
    record Interval(String legend, double low, double high, Tone tone) {
        public Interval {
            Objects.requireNonNull(legend, "legend");
            Objects.requireNonNull(tone, "tone");
            if (!Double.isFinite(low) || !Double.isFinite(high) || high < low) {
                throw new IllegalArgumentException("interval '" + legend + "' needs finite ends with low <= high, not ["
                        + low + ", " + high + "]");
            }
        }
    }

    /** How a series of a {@link Plot} is drawn. */
    enum Style {
        /** Points joined by straight lines. */
        LINE_POINTS,
        /** A solid line without points (a density curve). */
        LINE,
        /** Points only, with error bars when given. */
        POINTS,
        /** A dashed line without points (limits, envelopes). */
        DASHED
    }

    /**
     * One series of a {@link Plot}.
     *
     * @param legend what the series is
     * @param x the abscissae
     * @param y the ordinates, one per abscissa
     * @param yError half-lengths of vertical error bars, one per point, or null for none
     * @param style how it is drawn
     * @param tone its colour
     */
    record Series(String legend, double[] x, double[] y, double[] yError, Style style, Tone tone) {
        public Series {
            Objects.requireNonNull(legend, "legend");
            Objects.requireNonNull(style, "style");
            Objects.requireNonNull(tone, "tone");
            if (x == null || y == null || x.length != y.length || x.length == 0) {
                throw new IllegalArgumentException("series '" + legend + "' needs as many y values as x values, and "
                        + "at least one point");
            }
            if (yError != null && yError.length != x.length) {
                throw new IllegalArgumentException("series '" + legend + "' needs one error bar per point: "
                        + yError.length + " for " + x.length + " points");
            }
            for (int i = 0; i < x.length; i++) {
                if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])
                        || (yError != null && !(yError[i] >= 0 && Double.isFinite(yError[i])))) {
                    throw new IllegalArgumentException("series '" + legend + "': point " + (i + 1)
                            + " is not finite, or its error bar is negative");
                }
            }
            x = x.clone();
            y = y.clone();
            yError = yError == null ? null : yError.clone();
        }

        @Override public double[] x() { return x.clone(); }
        @Override public double[] y() { return y.clone(); }
        @Override public double[] yError() { return yError == null ? null : yError.clone(); }
    }

    /**
     * A plot of y against x with one or more series, such as the standardized residuals of a fitted line or the
     * expanded uncertainty across a flow range.
     *
     * @param caption the caption
     * @param xLabel the quantity and unit on the horizontal axis (label markup)
     * @param yLabel the quantity and unit on the vertical axis (label markup)
     * @param logX whether the horizontal axis is logarithmic (every x must then be positive)
     * @param series the series, drawn in order
     * @param yRules ordinates of horizontal reference lines (e.g. 0, or ±2 for standardized residuals)
     */
    record Plot(String caption, String xLabel, String yLabel, boolean logX, List<Series> series, List<Double> yRules)
            implements Chart {
        public Plot {
            Objects.requireNonNull(caption, "caption");
            Objects.requireNonNull(xLabel, "xLabel");
            Objects.requireNonNull(yLabel, "yLabel");
            series = List.copyOf(series);
            yRules = yRules == null ? List.of() : List.copyOf(yRules);
            if (series.isEmpty()) {
                throw new IllegalArgumentException("a plot needs at least one series");
            }
            if (logX) {
                for (Series s : series) {
                    for (double v : s.x) {
                        if (!(v > 0)) {
                            throw new IllegalArgumentException("a logarithmic axis needs positive x, but series '"
                                    + s.legend() + "' has " + v);
                        }
                    }
                }
            }
        }
    }

    /**
     * Horizontal bars, one per labelled value, longest first as given; values are non-negative.
     *
     * @param caption the caption
     * @param axisLabel what the values are, e.g. "share of u_c^2 (%)" (label markup, see {@link Typesetter#label})
     * @param labels the bar labels
     * @param values the values, parallel to {@code labels}
     */
    record Bars(String caption, String axisLabel, List<MathText> labels, List<Double> values) implements Chart {
        public Bars {
            Objects.requireNonNull(caption, "caption");
            Objects.requireNonNull(axisLabel, "axisLabel");
            labels = List.copyOf(labels);
            values = List.copyOf(values);
            if (labels.size() != values.size()) {
                throw new IllegalArgumentException("a bar chart needs one value per label: " + labels.size()
                        + " labels, " + values.size() + " values");
            }
            for (double v : values) {
                if (!(v >= 0) || Double.isInfinite(v)) {
                    throw new IllegalArgumentException("bar values must be finite and non-negative, not " + v);
                }
            }
        }
    }

    /**
     * A histogram of values, such as the Monte Carlo trials of an output (JCGM 101:2008 7.5 and 9.1), with
     * optional marked positions (the ends of a coverage interval).
     *
     * @param caption the caption
     * @param axisLabel the quantity and unit on the horizontal axis (label markup)
     * @param edges the bin edges, increasing, one more than {@code counts}
     * @param counts the number of values in each bin
     * @param markers positions to mark with vertical lines, each within the edges
     * @param markerLegend what the markers are, e.g. "95 % coverage interval"
     * @param curveX abscissae of a density curve drawn over the bars (e.g. the distribution the GUM assigns to the
     *     output), or null for none
     * @param curveY its ordinates, in the units of {@code counts} (expected count per bin)
     * @param curveLegend what the curve is
     * @param intervals intervals marked by pairs of vertical lines in their own colours; they may reach beyond the
     *     edges, and the axis then widens to show them
     */
    record Histogram(String caption, String axisLabel, double[] edges, long[] counts, double[] markers,
            String markerLegend, double[] curveX, double[] curveY, String curveLegend, List<Interval> intervals)
            implements Chart {

        /** A histogram without curve or intervals. */
        public Histogram(String caption, String axisLabel, double[] edges, long[] counts, double[] markers,
                String markerLegend) {
            this(caption, axisLabel, edges, counts, markers, markerLegend, null, null, "", List.of());
        }

        public Histogram {
            Objects.requireNonNull(caption, "caption");
            Objects.requireNonNull(axisLabel, "axisLabel");
            markerLegend = markerLegend == null ? "" : markerLegend;
            if (counts == null || counts.length == 0) {
                throw new IllegalArgumentException("a histogram needs at least one bin");
            }
            if (edges == null || edges.length != counts.length + 1) {
                throw new IllegalArgumentException("a histogram of " + counts.length + " bins needs "
                        + (counts.length + 1) + " edges, not " + (edges == null ? 0 : edges.length));
            }
            for (int i = 0; i < edges.length; i++) {
                if (!Double.isFinite(edges[i]) || (i > 0 && !(edges[i] > edges[i - 1]))) {
                    throw new IllegalArgumentException("histogram edges must be finite and increasing; edge " + (i + 1)
                            + " is " + edges[i]);
                }
            }
            for (long c : counts) {
                if (c < 0) {
                    throw new IllegalArgumentException("histogram counts must not be negative, not " + c);
                }
            }
            markers = markers == null ? new double[0] : markers.clone();
            for (double m : markers) {
                if (!(m >= edges[0] && m <= edges[edges.length - 1])) {
                    throw new IllegalArgumentException("marker " + m + " lies outside the histogram's range ["
                                    + edges[0] + ", " + edges[edges.length - 1] + "]");
                }
            }
            edges = edges.clone();
            counts = counts.clone();
            curveLegend = curveLegend == null ? "" : curveLegend;
            intervals = intervals == null ? List.of() : List.copyOf(intervals);
            if ((curveX == null) != (curveY == null) || (curveX != null && curveX.length != curveY.length)) {
                throw new IllegalArgumentException("a histogram's curve needs one y per x");
            }
            if (curveX != null) {
                for (int i = 0; i < curveX.length; i++) {
                    if (!Double.isFinite(curveX[i]) || !(curveY[i] >= 0) || Double.isInfinite(curveY[i])) {
                        throw new IllegalArgumentException("point " + (i + 1) + " of the histogram's curve is not finite "
                                + "and non-negative");
                    }
                }
                curveX = curveX.clone();
                curveY = curveY.clone();
            }
        }

        @Override public double[] curveX() { return curveX == null ? null : curveX.clone(); }
        @Override public double[] curveY() { return curveY == null ? null : curveY.clone(); }
        @Override public double[] edges() { return edges.clone(); }
        @Override public long[] counts() { return counts.clone(); }
        @Override public double[] markers() { return markers.clone(); }
    }

    /**
     * The ranking of an output's contributions: the inputs' contributions u_i(y) (JCGM 100:2008 5.1.3, eq. 11b) as
     * bars, largest first, with the cumulative share of the combined variance u_c^2(y) (the sum of the engine's
     * shares u_i^2(y)/u_c^2(y), largest first) as a line on a second axis; the workbench draws the same chart.
     * Correlation terms are not an input's and so are not in the ranking.
     *
     * @param caption the caption
     * @param axisLabel what the bars are, with the unit, e.g. "u_i(y) (%)"
     * @param labels the inputs, largest contribution first
     * @param contributions u_i(y), parallel to {@code labels}
     * @param cumulativeShare the cumulative share in percent after each input, parallel to {@code labels}
     */
    record Ranking(String caption, String axisLabel, List<MathText> labels, List<Double> contributions,
            List<Double> cumulativeShare) implements Chart {
        public Ranking {
            Objects.requireNonNull(caption, "caption");
            Objects.requireNonNull(axisLabel, "axisLabel");
            labels = List.copyOf(labels);
            contributions = List.copyOf(contributions);
            cumulativeShare = List.copyOf(cumulativeShare);
            if (labels.size() != contributions.size() || labels.size() != cumulativeShare.size()) {
                throw new IllegalArgumentException("a ranking needs one contribution and one cumulative share per "
                        + "label: " + labels.size() + " labels, " + contributions.size() + " contributions, "
                        + cumulativeShare.size() + " shares");
            }
        }

        /**
         * @param o the output's GUM result
         * @param caption the caption
         * @return the ranking of its inputs with a non-zero contribution
         */
        public static Ranking of(org.quire.engine.gum.OutputResult o, String caption) {
            List<org.quire.engine.gum.Contribution> sorted = o.contributions().stream().filter(c -> c.contribution() > 0)
                    .sorted(java.util.Comparator.comparingDouble(org.quire.engine.gum.Contribution::contribution)
                            .reversed()).toList();
            List<MathText> labels = new java.util.ArrayList<>();
            List<Double> values = new java.util.ArrayList<>();
            List<Double> cumulative = new java.util.ArrayList<>();
            double sum = 0;
            for (org.quire.engine.gum.Contribution c : sorted) {
                labels.add(Typesetter.name(c.input()));
                values.add(c.contribution());
                sum += c.share();
                cumulative.add(100 * sum);
            }
            String unit = o.unit() == null || o.unit().isBlank() ? "" : " (" + o.unit().strip().replace(' ', '*') + ")";
            return new Ranking(caption, "u_i(y)" + unit, labels, values, cumulative);
        }
    }
}
