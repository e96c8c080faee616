package org.quire.app.report;

import java.util.List;
import java.util.Objects;

/**
 * A chart of a report, drawn as vector graphics by the HTML (SVG) and PDF renderers.
 *
 * <p>Implementations are immutable and thread-safe.
 */
public sealed interface Chart permits Chart.Bars, Chart.Histogram {

    /** @return the caption shown under the chart */
    String caption();

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
     */
    record Histogram(String caption, String axisLabel, double[] edges, long[] counts, double[] markers,
            String markerLegend) implements Chart {
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
        }

        @Override public double[] edges() { return edges.clone(); }
        @Override public long[] counts() { return counts.clone(); }
        @Override public double[] markers() { return markers.clone(); }
    }
}
