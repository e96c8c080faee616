package org.quire.engine.gum;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.CorrelationMatrix;
import org.quire.engine.budget.Evaluation;
import org.quire.engine.budget.FitParameter;
import org.quire.engine.budget.FlowPoints;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.TypeB;
import org.quire.engine.conformity.ConformityAssessment;
import org.quire.engine.conformity.MeasuredError;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;

/**
 * The GUM evaluation of one budget at several flow points, with the covariance of the point results.
 *
 * <p>The point models are stacked: the outputs are y_p = f(x_p) for the points p = 1..m; an input with a
 * column in the {@link FlowPoints} table has its own value (and, with a {@code u(name)} column, its own
 * uncertainty) at each point and is independent between points; every other input is one quantity shared by
 * all points. With C the m x N matrix of sensitivity coefficients of the stacked model and U_x the covariance
 * matrix of its inputs, U_y = C U_x C^T (JCGM 102:2011 6.2.1.3), so
 * cov(y_p, y_q) = sum over shared i, j of c_pi c_qj u(x_i) u(x_j) r(x_i, x_j) for p != q, and u^2(y_p) is the
 * point's own GUM evaluation (JCGM 100:2008 5.1.2 and 5.2.2, eq. 16; nu_eff by G.4.1, eq. G.2b, and k by G.3).
 * A correlation between an input that varies and one that is shared is refused: it has no stacked
 * counterpart that is a valid covariance matrix for any number of points.
 *
 * <p>References: JCGM 102:2011 6.2.1.3 (U_y = C U_x C^T for a multivariate model); JCGM 100:2008 5.2 and F.1.2.3
 * (correlation of results that share an input, such as one reference standard); when conformity limits are
 * given, JCGM 106:2012 clauses 7 to 9 through {@link ConformityAssessment}.
 *
 * <p>Stateless and thread-safe.
 */
public final class FlowRange {
    /** Why a budget cannot be evaluated across a flow range: it lists no flow points. */
    public static final String NO_FLOW_POINTS = "the budget has no flow points: list them in the budget file's table "
            + "of flow points (\"flowPoints\"), one row per flow";

    private FlowRange() {
    }

    /**
     * Evaluates the budget at its own {@link Budget#flowPoints()}.
     *
     * @throws IllegalArgumentException when the budget has no flow points, or they cannot be used (the message
     *     names the point or column)
     * @throws ModelException for a model that does not compile or leaves a function's domain at a point
     */
    public static FlowRangeResult evaluate(Budget budget, FunctionLibrary library) throws ModelException {
        if (budget.flowPoints() == null) {
            throw new IllegalArgumentException(NO_FLOW_POINTS);
        }
        return evaluate(budget, budget.flowPoints(), library);
    }

    /**
     * Hears of the points evaluated and says when to stop: for a caller that shows progress and offers Cancel.
     * Called on the evaluating thread.
     */
    public interface Listener {
        /** A listener that hears nothing and never stops the evaluation. */
        Listener NONE = new Listener() {
            @Override
            public void pointDone(int done, int of) {
            }

            @Override
            public boolean cancelled() {
                return false;
            }
        };

        /** @param done the points evaluated so far, of {@code of} */
        void pointDone(int done, int of);

        /** @return whether to stop; the evaluation then ends with a {@link java.util.concurrent.CancellationException} */
        boolean cancelled();
    }

    /**
     * Evaluates the budget at its own {@link Budget#flowPoints()}, telling {@code listener} of each point done.
     *
     * @throws java.util.concurrent.CancellationException when the listener says to stop
     * @see #evaluate(Budget, FunctionLibrary)
     */
    public static FlowRangeResult evaluate(Budget budget, FunctionLibrary library, Listener listener)
            throws ModelException {
        if (budget.flowPoints() == null) {
            throw new IllegalArgumentException(NO_FLOW_POINTS);
        }
        return evaluate(budget, budget.flowPoints(), library, listener);
    }

    /**
     * Evaluates the budget at the given flow points.
     *
     * @throws IllegalArgumentException naming the point, column or input at fault
     * @throws ModelException for a model that does not compile or leaves a function's domain at a point
     */
    public static FlowRangeResult evaluate(Budget budget, FlowPoints points, FunctionLibrary library)
            throws ModelException {
        return evaluate(budget, points, library, Listener.NONE);
    }

    /**
     * Evaluates the budget at the given flow points, telling {@code listener} of each point done.
     *
     * @throws IllegalArgumentException naming the point, column or input at fault
     * @throws ModelException for a model that does not compile or leaves a function's domain at a point
     * @throws java.util.concurrent.CancellationException when the listener says to stop
     */
    public static FlowRangeResult evaluate(Budget budget, FlowPoints points, FunctionLibrary library,
            Listener listener) throws ModelException {
        if (budget == null || points == null) {
            throw new IllegalArgumentException("a flow-range evaluation needs a budget and its flow points");
        }
        points.checkAgainst(budget.inputNames());
        CompiledModel model = budget.compile(library);
        String outName = points.output().isEmpty() ? budget.outputNames().get(0) : points.output();
        if (!budget.outputNames().contains(outName)) {
            throw new IllegalArgumentException("the flow points tabulate output '" + outName + "', which the budget "
                    + "does not name (outputs: " + String.join(", ", budget.outputNames()) + ")");
        }
        List<String> varying = points.varyingInputs();
        for (String v : varying) {
            if (budget.input(v).evaluation() instanceof FitParameter) {
                throw new IllegalArgumentException("input '" + v + "' is a parameter of a fitted line and cannot vary "
                        + "from flow point to flow point; remove its column");
            }
        }
        for (Correlation c : budget.correlations()) {
            if (varying.contains(c.first()) != varying.contains(c.second())) {
                throw new IllegalArgumentException("the correlation between '" + c.first() + "' and '" + c.second()
                        + "' joins an input that varies with the flow to one shared by all points; across several "
                        + "points no covariance matrix can hold it. Make both vary or both shared");
            }
        }
        List<FlowPoints.Row> rows = points.rows();
        int m = rows.size();
        List<OutputResult> results = new ArrayList<>();
        for (int p = 0; p < m; p++) {
            if (listener.cancelled()) {
                throw new java.util.concurrent.CancellationException("the flow-range evaluation was cancelled after "
                        + p + " of " + m + " points");
            }
            Budget bp = atPoint(budget, points, p);
            CorrelationMatrix r = bp.correlationMatrix();
            GumResult g;
            try {
                g = GumEvaluator.evaluate(bp, model, r, bp.settings());
            } catch (ModelException e) {
                throw new IllegalArgumentException("flow point " + (p + 1) + " (flow " + rows.get(p).flow() + "): "
                        + e.getMessage(), e);
            }
            results.add(g.output(outName));
            listener.pointDone(p + 1, m);
        }
        // cross-point covariance through the shared inputs (JCGM 102:2011 6.2.1.3)
        List<InputQuantity> inputs = budget.inputs();
        double[] between = new double[inputs.size()];
        for (int i = 0; i < between.length; i++) {
            between[i] = varying.contains(inputs.get(i).name()) ? 0 : 1;
        }
        double[][] cov = PointCovariance.of(results, budget.correlationMatrix(), between);
        double[][] corr = PointCovariance.correlation(cov);
        List<FlowRangeResult.Point> table = new ArrayList<>();
        for (int p = 0; p < m; p++) {
            table.add(new FlowRangeResult.Point(rows.get(p).flow(), results.get(p)));
        }
        ConformityAssessment assessment = null;
        if (points.envelope() != null) {
            String unit = budget.outputs().get(budget.outputNames().indexOf(outName)).unit().strip();
            if (!unit.equals("%")) {
                throw new IllegalArgumentException("conformity decisions need output '" + outName + "' to be an error in "
                        + "percent of the reading (unit \"%\"), but its unit is \"" + unit + "\"");
            }
            List<MeasuredError> errors = new ArrayList<>();
            for (FlowRangeResult.Point pt : table) {
                OutputResult o = pt.result();
                if (!(o.standardUncertainty() > 0)) {
                    throw new IllegalArgumentException("flow " + pt.flow() + ": the error has zero uncertainty; "
                            + "no conformity decision can be made");
                }
                errors.add(new MeasuredError(pt.flow(), points.temperature(), o.estimate(), o.standardUncertainty(),
                        o.coverageFactor(), o.dofUsed()));
            }
            assessment = ConformityAssessment.of(points.envelope(), points.rule(), errors);
        }
        return new FlowRangeResult(outName, budget.outputs().get(budget.outputNames().indexOf(outName)).unit(),
                points.flowUnit(), table, cov, corr, assessment);
    }

    /**
     * The budget of one of its own flow points, as {@link #evaluate(Budget, FunctionLibrary)} evaluates it there:
     * for a drill-down from a point of the flow range to its full budget.
     *
     * @param p the point, from 0 in table order
     * @throws IllegalArgumentException when the budget has no flow points or {@code p} is not one of them
     */
    public static Budget atPoint(Budget budget, int p) {
        if (budget == null || budget.flowPoints() == null) {
            throw new IllegalArgumentException(NO_FLOW_POINTS);
        }
        int m = budget.flowPoints().rows().size();
        if (p < 0 || p >= m) {
            throw new IllegalArgumentException("flow point " + (p + 1) + " does not exist: the budget has " + m
                    + " flow points");
        }
        return atPoint(budget, budget.flowPoints(), p);
    }

    /**
     * The budget with the varying inputs' estimates and uncertainties of point p: each input with a column becomes
     * a normal Type B evaluation with the point's estimate and standard uncertainty (its degrees of freedom kept),
     * or a constant when its uncertainty is zero; the result carries no flow points.
     */
    private static Budget atPoint(Budget budget, FlowPoints points, int p) {
        Map<String, Double> estimate = new HashMap<>();
        Map<String, Double> uncertainty = new HashMap<>();
        double[] values = points.rows().get(p).values();
        for (int col = 0; col < values.length; col++) {
            String column = points.columns().get(col);
            String u = FlowPoints.uncertaintyOf(column);
            if (u == null) {
                estimate.put(column.strip(), values[col]);
            } else {
                uncertainty.put(u, values[col]);
            }
        }
        List<InputQuantity> out = new ArrayList<>();
        for (InputQuantity q : budget.inputs()) {
            if (!estimate.containsKey(q.name()) && !uncertainty.containsKey(q.name())) {
                out.add(q);
                continue;
            }
            Evaluation e = q.evaluation();
            double x = estimate.getOrDefault(q.name(), e.estimate());
            double ux = uncertainty.getOrDefault(q.name(), e.standardUncertainty());
            Map<String, Double> par = new LinkedHashMap<>();
            par.put("estimate", x);
            Evaluation pe;
            if (ux > 0) {
                par.put("standardUncertainty", ux);
                if (!Double.isInfinite(e.dof())) {
                    par.put("dof", e.dof());
                }
                pe = TypeB.of("normal", par);
            } else {
                pe = TypeB.of("constant", par);
            }
            out.add(q.withEvaluation(pe));
        }
        return budget.withFlowPoints(null).withInputs(out);
    }
}
