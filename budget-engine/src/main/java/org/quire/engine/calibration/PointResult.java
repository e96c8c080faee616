package org.quire.engine.calibration;

import java.util.List;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.OutputResult;

/**
 * The result at one flow point of one series (as found, or as left): the mean of the runs, their repeatability
 * as a Type A evaluation, the point's full budget with that repeatability, its expanded uncertainty with its
 * own coverage factor, the CMC at the point and the uncertainty reported, notes, and the Monte Carlo outcome
 * when asked for.
 *
 * @param label the point's label
 * @param flow the point's flow: the mean of the runs' flows, in the flow output's unit
 * @param runs the runs' results (for a predicted as-left point: the as-found runs rescaled by the adjustment)
 * @param error the point's error, the mean of the runs' errors, % of the reading
 * @param runStandardDeviation s of the runs' errors (JCGM 100:2008 4.2.2, eq. 4); NaN for one run
 * @param repeatabilityUncertainty the repeatability term: s / sqrt(n) or s (as the basis says), or the stated
 *     repeatability in its place
 * @param repeatabilityDof its degrees of freedom: n - 1, or those of the stated repeatability
 * @param statedRepeatability whether a stated repeatability was used instead of the runs' own scatter
 * @param budget the point's budget (the method at the mean readings plus the repeatability input); null for a
 *     predicted as-left point
 * @param result the GUM result of the point's error from that budget; null for a predicted as-left point
 * @param standardUncertainty u_c of the point's error
 * @param effectiveDof nu_eff (JCGM 100:2008 G.4.1)
 * @param coverageFactor k for the point's own nu_eff
 * @param expandedUncertainty the point's own U = k u_c
 * @param cmc the laboratory's CMC at the point, % of the reading; NaN when no CMC table is given
 * @param reportedExpandedUncertainty the U reported: the larger of U and the CMC
 * @param raisedToCmc whether U was below the CMC and is reported at the CMC
 * @param notes sentences about the point (CMC, stated repeatability, prediction), never empty strings
 * @param monteCarlo the Monte Carlo outcome (JCGM 101) of the point budget, or null
 */
public record PointResult(String label, double flow, List<RunResult> runs, double error, double runStandardDeviation,
        double repeatabilityUncertainty, double repeatabilityDof, boolean statedRepeatability, Budget budget,
        OutputResult result, double standardUncertainty, double effectiveDof, double coverageFactor,
        double expandedUncertainty, double cmc, double reportedExpandedUncertainty, boolean raisedToCmc,
        List<String> notes, org.quire.engine.montecarlo.MonteCarloOutcome monteCarlo) {

    public PointResult {
        runs = List.copyOf(runs);
        notes = List.copyOf(notes);
    }

    /** @return the number of runs n */
    public int runCount() {
        return runs.size();
    }

    /** @return the standard uncertainty matching the reported U: reported U / k */
    public double reportedStandardUncertainty() {
        return reportedExpandedUncertainty / coverageFactor;
    }
}
