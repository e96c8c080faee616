package org.quire.app.ui.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import javax.swing.UIManager;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.quire.app.report.Chart;
import org.quire.app.report.ChartLayout;
import org.quire.app.report.MathText;
import org.quire.app.ui.Workbench;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.WorkbenchPrefs;

/**
 * Every colour a chart draws with reads against the chart's background, in the light and the dark theme of the
 * workbench and on the report's white paper: text (tick labels, axis titles, legend) at least 4.5:1 (WCAG 2.1
 * success criterion 1.4.3, contrast minimum), series, bars, marks and axes at least 3:1 (WCAG 2.1 success
 * criterion 1.4.11, non-text contrast). The grid is decoration behind the data and exempt (1.4.11 asks contrast
 * only of what is needed to understand the content).
 *
 * <p>The contrast ratio is WCAG 2.1's definition (Understanding WCAG 2.1, "contrast ratio" and "relative
 * luminance"): (L1 + 0.05) / (L2 + 0.05), L1 the relative luminance of the lighter colour, with
 * L = 0.2126 R + 0.7152 G + 0.0722 B and each sRGB component c linearized as c / 12.92 when c &lt;= 0.03928,
 * otherwise ((c + 0.055) / 1.055)^2.4.
 */
class ChartContrastTest {
    /** WCAG 2.1 1.4.3: text against its background. */
    static final double TEXT = 4.5;
    /** WCAG 2.1 1.4.11: graphical objects against adjacent colours. */
    static final double GRAPHIC = 3.0;

    @AfterAll
    static void lightAgain() {
        Workbench.installLookAndFeel(WorkbenchPrefs.Theme.LIGHT);
    }

    static double luminance(Color c) {
        double[] v = {c.getRed() / 255.0, c.getGreen() / 255.0, c.getBlue() / 255.0};
        for (int i = 0; i < 3; i++) {
            v[i] = v[i] <= 0.03928 ? v[i] / 12.92 : Math.pow((v[i] + 0.055) / 1.055, 2.4);
        }
        return 0.2126 * v[0] + 0.7152 * v[1] + 0.0722 * v[2];
    }

    static double contrast(Color a, Color b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    @Test
    void theContrastRatioIsWcagsDefinition() {
        // black on white is the largest ratio, 21:1, by the definition (0 + 0.05 against 1 + 0.05)
        assertEquals(21.0, contrast(Color.BLACK, Color.WHITE), 1e-9);
        assertEquals(1.0, contrast(Color.RED, Color.RED), 1e-12);
        // #767676 on white is the commonly quoted lightest grey that passes 4.5:1, at about 4.54:1 (from memory);
        // #777777 just fails at about 4.48:1 (from memory)
        assertEquals(4.54, contrast(new Color(0x767676), Color.WHITE), 0.01);
        assertEquals(4.48, contrast(new Color(0x777777), Color.WHITE), 0.01);
    }

    /** Charts of every kind, with every tone and style, as the workbench and the reports draw them. */
    static List<Chart> everyKind() {
        double[] x = {1, 2, 3, 4};
        List<Chart.Series> series = new ArrayList<>();
        Chart.Style[] styles = Chart.Style.values();
        Chart.Tone[] tones = Chart.Tone.values();
        for (int i = 0; i < tones.length; i++) {
            series.add(new Chart.Series("series " + i, x, new double[] {i, i + 1, i, i + 2}, new double[] {.1, .1, .1, .1},
                    styles[i % styles.length], tones[i]));
        }
        List<Chart.Interval> intervals = new ArrayList<>();
        for (Chart.Tone t : tones) {
            intervals.add(new Chart.Interval("interval " + t, 1.5, 3.5, t));
        }
        return List.of(
                new Chart.Plot("plot", "flow (m^3/h)", "error (%)", false, series, List.of(0.0, 2.0)),
                new Chart.Histogram("histogram", "E (%)", new double[] {1, 2, 3, 4, 5}, new long[] {3, 9, 7, 2},
                        new double[] {2, 4}, "95 % interval", new double[] {1, 3, 5}, new double[] {1, 8, 1},
                        "GUM distribution", intervals),
                new Chart.Ranking("ranking", "u_i(y) (%)", List.of(MathText.upright("a"), MathText.upright("b")),
                        List.of(2.0, 1.0), List.of(80.0, 100.0)),
                new Chart.Bars("bars", "share of u_c^2(y) (%)", List.of(MathText.upright("a")), List.of(60.0)));
    }

    private static void check(String where, Color background, java.util.function.IntFunction<Color> colour) {
        List<String> poor = new ArrayList<>();
        int checked = 0;
        for (Chart c : everyKind()) {
            for (ChartLayout.Shape s : ChartLayout.of(c).shapes()) {
                int rgb;
                double need;
                if (s instanceof ChartLayout.Label l) {
                    rgb = l.rgb();
                    need = TEXT;
                } else if (s instanceof ChartLayout.Line l) {
                    rgb = l.rgb();
                    need = GRAPHIC;
                } else {
                    rgb = ((ChartLayout.Rect) s).rgb();
                    need = GRAPHIC;
                }
                if (rgb == ChartLayout.GRID) {
                    continue;
                }
                checked++;
                double ratio = contrast(colour.apply(rgb), background);
                if (ratio < need) {
                    poor.add(String.format("%s: #%06x in %s at %.2f:1, needs %.1f:1", c.caption(),
                            colour.apply(rgb).getRGB() & 0xffffff, s.getClass().getSimpleName(), ratio, need));
                }
            }
        }
        assertTrue(checked > 50, where + ": the shapes were checked (" + checked + ")");
        assertTrue(poor.isEmpty(), where + ", against #" + Integer.toHexString(background.getRGB() & 0xffffff)
                + ": " + String.join("; ", poor.stream().distinct().toList()));
    }

    @Test
    void everyChartColourOfTheReportReadsOnWhitePaper() {
        check("report", Color.WHITE, Color::new);
    }

    @Test
    void everyChartColourOfTheLightThemeReadsOnTheChartBackground() {
        Workbench.installLookAndFeel(WorkbenchPrefs.Theme.LIGHT);
        check("light theme", Colors.get("Quire.chart.background"), ChartView::colour);
    }

    @Test
    void everyChartColourOfTheDarkThemeReadsOnTheChartBackground() {
        Workbench.installLookAndFeel(WorkbenchPrefs.Theme.DARK);
        Color bg = Colors.get("Quire.chart.background");
        assertTrue(luminance(bg) < 0.1, "the dark theme's chart background is dark: " + bg);
        check("dark theme", bg, ChartView::colour);
        assertTrue(UIManager.getLookAndFeel().getName().toLowerCase(java.util.Locale.ROOT).contains("dark"));
    }
}
