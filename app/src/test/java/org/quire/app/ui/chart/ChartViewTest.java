package org.quire.app.ui.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.quire.app.report.Chart;
import org.quire.app.report.ChartLayout;
import org.quire.app.ui.Workbench;
import org.quire.app.ui.common.WorkbenchPrefs;

/**
 * The workbench draws the report's chart layout ({@link ChartLayout}) with its text never smaller than the UI
 * font: at any width the chart is laid out to fill it at that scale; every text stays inside the chart, and every
 * chart has its axis titles and a legend.
 */
class ChartViewTest {
    @Test
    void textIsNeverSmallerThanTheUiFontAndStaysInsideTheChart() {
        Workbench.installLookAndFeel(WorkbenchPrefs.Theme.LIGHT);
        for (int px : new int[] {300, 520, 1200}) {
            for (Chart c : ChartContrastTest.everyKind()) {
                ChartView v = new ChartView();
                v.setChart(c);
                v.setSize(px, 400);
                ChartLayout.Layout l = v.layoutShown();
                assertNotNull(l);
                float scale = v.scale();
                float ui = v.baseFont().getSize2D();
                assertEquals(Math.max(ChartLayout.MIN_WIDTH * scale, px), l.width() * scale, 1.0,
                        c.caption() + " at " + px + " px fills the width");
                List<String> labels = new ArrayList<>();
                for (ChartLayout.Shape s : l.shapes()) {
                    if (s instanceof ChartLayout.Label t) {
                        labels.add(t.text().plain());
                        assertTrue(t.size() * scale >= ui - 1e-3, c.caption() + ": '" + t.text().plain() + "' at "
                                + t.size() * scale + " px, below the UI font of " + ui);
                        float w = ChartLayout.estimateWidth(t.text(), t.size());
                        float x0 = t.anchor() == ChartLayout.Anchor.START ? t.x()
                                : t.anchor() == ChartLayout.Anchor.MIDDLE ? t.x() - w / 2 : t.x() - w;
                        assertTrue(x0 >= -0.5f && x0 + w <= l.width() + 0.5f, c.caption() + " at " + px + " px: '"
                                + t.text().plain() + "' runs from " + x0 + " to " + (x0 + w) + " of " + l.width());
                    }
                }
                assertTrue(v.getPreferredSize().height >= Math.round(l.height() * scale), "room for the whole chart");
                assertTrue(labels.size() >= 6, c.caption() + ": ticks, titles and legend: " + labels);
            }
        }
    }

    @Test
    void everyKindOfChartHasAxisTitlesAndALegendEntryForEachSeries() {
        for (Chart c : ChartContrastTest.everyKind()) {
            List<String> texts = new ArrayList<>();
            for (ChartLayout.Shape s : ChartLayout.of(c).shapes()) {
                if (s instanceof ChartLayout.Label t) {
                    texts.add(t.text().plain());
                }
            }
            if (c instanceof Chart.Plot p) {
                assertTrue(texts.contains("flow (m³/h)") && texts.contains("error (%)"), texts.toString());
                for (Chart.Series se : p.series()) {
                    assertTrue(texts.contains(se.legend()), "legend of " + se.legend() + ": " + texts);
                }
            } else if (c instanceof Chart.Histogram h) {
                assertTrue(texts.contains("trials per bin") && texts.contains("E (%)"), texts.toString());
                assertTrue(texts.contains("95 % interval") && texts.contains("GUM distribution"), texts.toString());
                for (Chart.Interval iv : h.intervals()) {
                    assertTrue(texts.contains(iv.legend()), "legend of " + iv.legend() + ": " + texts);
                }
            } else if (c instanceof Chart.Ranking) {
                assertTrue(texts.stream().anyMatch(t -> t.startsWith("contribution u")), "legend of the bars: " + texts);
                assertEquals(2, texts.stream().filter(t -> t.startsWith("cumulative share of u")).count(),
                        "the upper axis's title and the line's legend entry: " + texts);
                assertTrue(texts.stream().anyMatch(t -> t.startsWith("u") && t.endsWith("(%)")), texts.toString());
            } else {
                assertTrue(texts.stream().filter(t -> t.startsWith("share of")).count() >= 2,
                        "the bars' axis title and their legend entry: " + texts);
            }
        }
    }
}
