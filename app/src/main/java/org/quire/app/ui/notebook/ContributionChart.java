package org.quire.app.ui.notebook;

import org.quire.app.report.Chart;
import org.quire.app.ui.chart.ChartView;
import org.quire.engine.gum.OutputResult;

/** The ranking of an output's contributions beside its budget table: the report's own chart. */
final class ContributionChart extends ChartView {
    void show(OutputResult o) {
        Chart.Ranking r = Chart.Ranking.of(o, "Contributions u\u1d62(y) to the standard uncertainty of " + o.name()
                + ", largest first, with the cumulative share of u_c\u00b2(y)");
        setChart(r.labels().isEmpty() ? null : r);
    }
}
