package org.quire.engine.gum;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.CoverageFactor;
import org.quire.engine.budget.CorrelationMatrix;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.budget.Evaluation;
import org.quire.engine.budget.FitParameter;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;
import org.quire.engine.model.ModelProblem;
import org.quire.engine.units.Conversion;
import org.quire.engine.units.UnitException;
import org.quire.engine.units.Units;

/**
 * The GUM evaluation of a budget: the law of propagation of uncertainty with exact sensitivity coefficients.
 *
 * <p>References:
 * <ul>
 * <li>JCGM 100:2008 5.1.2, eq. (10), and 5.2.2, eq. (16): u_c^2(y) = sum c_i^2 u^2(x_i)
 *     + 2 sum_{i&lt;j} c_i c_j u(x_i) u(x_j) r(x_i, x_j), with c_i = df/dx_i (5.1.3).</li>
 * <li>JCGM 100:2008 5.1.2 note: for uncorrelated inputs with symmetric distributions the higher-order terms
 *     sum_i sum_j [ (1/2) (d2f/dx_i dx_j)^2 + (df/dx_i)(d3f/dx_i dx_j^2) ] u^2(x_i) u^2(x_j).</li>
 * <li>JCGM 100:2008 G.4.1, eq. (G.2b): nu_eff = u_c^4(y) / sum (u_i^4(y) / nu_i); G.4.1 note 1 and G.6.4
 *     (truncate to the next lower integer); G.3 and Table G.2 (k = t_p(nu_eff)).</li>
 * <li>JCGM 102:2011 6.2.1.3: covariance of several outputs U_y = C U_x C^T.</li>
 * <li>JCGM 100:2008 H.3.4: the intercept and slope of one line fitted by least squares share the residual
 *     scatter, so in nu_eff their joint contribution is one component with nu = n - 2.</li>
 * </ul>
 * Derivatives are exact, by forward-mode automatic differentiation through the whole model. The model computes
 * in the units stated for its inputs and outputs; an output with a display unit is then converted
 * ({@link OutputResult#inUnit}), and so are the rows of its covariance ({@link GumResult#quantities()} stays in
 * the model's units).
 *
 * <p>Stateless and thread-safe.
 */
public final class GumEvaluator {
    private GumEvaluator() {
    }

    /**
     * Compiles and evaluates a budget.
     *
     * @throws ModelException for a model that does not compile or leaves a function's domain at the estimates
     * @throws IllegalArgumentException for a correlation that cannot be used (its message names the inputs)
     */
    public static GumResult evaluate(Budget budget, FunctionLibrary library) throws ModelException {
        CompiledModel model = budget.compile(library);
        return evaluate(budget, model, budget.correlationMatrix(), budget.settings());
    }

    /**
     * Evaluates a budget whose model is compiled and whose correlation matrix is checked.
     *
     * @throws ModelException when a value leaves a function's domain at the estimates
     */
    public static GumResult evaluate(Budget budget, CompiledModel model, CorrelationMatrix r,
            EvaluationSettings settings) throws ModelException {
        List<InputQuantity> inputs = budget.inputs();
        int n = inputs.size();
        double[] x = new double[n];
        double[] u = new double[n];
        double[] nu = new double[n];
        for (int i = 0; i < n; i++) {
            Evaluation e = inputs.get(i).evaluation();
            x[i] = e.estimate();
            u[i] = e.standardUncertainty();
            nu[i] = e.dof();
        }
        double[] quantities = model.evaluateQuantities(x);
        double[] y = model.evaluate(x);
        int[] active = java.util.stream.IntStream.range(0, n).filter(i -> u[i] > 0).toArray();
        boolean correlated = !r.isIdentity();
        boolean higher = settings.higherOrder() && !(correlated && correlatedNonNormal(inputs, r));
        HigherOrderTerms higherTerms = !settings.higherOrder() ? HigherOrderTerms.NOT_REQUESTED
                : higher ? HigherOrderTerms.INCLUDED : HigherOrderTerms.NOT_INCLUDED;
        List<String> globalWarnings = new ArrayList<>();
        for (ModelProblem w : model.warnings()) {
            globalWarnings.add(w.toString().replaceFirst("^warning: ", ""));
        }
        if (higherTerms == HigherOrderTerms.NOT_INCLUDED) {
            globalWarnings.add("higher-order terms were not included: some correlated inputs are not normal, and "
                    + "the terms of JCGM 100:2008 5.1.2 note need the higher moments of a normal distribution");
        }
        DerivativeStructure[] ds = higher ? model.derivatives(x, active, 3) : null;
        double[][] firstOrder = higher ? null : model.sensitivities(x, active);
        int m = y.length;
        Conversion[] shown = displayConversions(budget, model);
        double[][] c = new double[m][n];
        for (int k = 0; k < m; k++) {
            for (int a = 0; a < active.length; a++) {
                c[k][active[a]] = higher ? partial(ds[k], active.length, a, -1, -1) : firstOrder[k][a];
                if (!Double.isFinite(c[k][active[a]])) {
                    throw new ModelException(new ModelProblem(0, 0, 0, ModelProblem.Severity.ERROR,
                            "the sensitivity coefficient of output '" + model.outputNames().get(k) + "' to input '"
                                    + inputs.get(active[a]).name() + "' is not finite at the estimates; the model "
                                    + "is not differentiable there"));
                }
            }
        }
        // only the inputs correlated with another enter the off-diagonal terms, so the cost stays linear in the
        // number of inputs (quadratic in the number of correlated ones only)
        int[] members = r.correlated();
        double[][] cov = new double[m][m];
        for (int k = 0; k < m; k++) {
            for (int l = 0; l < m; l++) {
                double s = 0;
                for (int i : active) {
                    s += c[k][i] * c[l][i] * u[i] * u[i];
                }
                for (int i : members) {
                    for (int j : members) {
                        double rij = r.get(i, j);
                        if (i != j && rij != 0) {
                            s += c[k][i] * c[l][j] * u[i] * u[j] * rij;
                        }
                    }
                }
                cov[k][l] = s;
            }
        }
        List<OutputResult> outs = new ArrayList<>();
        for (int k = 0; k < m; k++) {
            String name = model.outputNames().get(k);
            List<String> warnings = new ArrayList<>();
            double higherVar = 0;
            if (higher) {
                higherVar = correlated ? higherOrderVariance(ds[k], active, u, r) : higherOrderVariance(ds[k], active, u);
            }
            double variance = cov[k][k] + higherVar;
            if (!Double.isFinite(y[k]) || !Double.isFinite(variance)) {
                throw new ModelException(new ModelProblem(0, 0, 0, ModelProblem.Severity.ERROR, Double.isFinite(y[k])
                        ? "the variance u_c^2 of output '" + name + "' overflows: the inputs' standard uncertainties "
                                + "times their sensitivity coefficients are too large to square (beyond about 1e154)"
                        : "the estimate of output '" + name + "' is not a finite number (" + y[k] + ") at the inputs' "
                                + "estimates: a value overflows"));
            }
            double uc = Math.sqrt(Math.max(0, variance));
            cov[k][k] = variance;
            double corrVar = 0;
            List<CorrelationTerm> terms = new ArrayList<>();
            if (correlated) {
                for (int ia = 0; ia < members.length; ia++) {
                    for (int ja = ia + 1; ja < members.length; ja++) {
                        int i = members[ia];
                        int j = members[ja];
                        if (r.get(i, j) != 0 && u[i] > 0 && u[j] > 0) {
                            double t = 2 * c[k][i] * c[k][j] * u[i] * u[j] * r.get(i, j);
                            corrVar += t;
                            if (t != 0) {
                                terms.add(new CorrelationTerm(inputs.get(i).name(), inputs.get(j).name(), r.get(i, j), t));
                            }
                        }
                    }
                }
            }
            List<Contribution> rows = new ArrayList<>();
            double wsDenominator = 0;
            for (int i = 0; i < n; i++) {
                double ui = Math.abs(c[k][i]) * u[i];
                double share = variance > 0 ? ui * ui / variance : 0;
                InputQuantity q = inputs.get(i);
                rows.add(new Contribution(q.name(), q.unit(), x[i], u[i], c[k][i], ui, nu[i], share,
                        q.evaluation().type(), q.evaluation().distribution().shape()));
                if (ui > 0 && !Double.isInfinite(nu[i]) && !(q.evaluation() instanceof FitParameter)) {
                    // JCGM 100 G.2b, written as sum of (u_i/u_c)^4 / nu_i so that neither overflows nor underflows
                    wsDenominator += Math.pow(ui / uc, 4) / nu[i];
                }
            }
            if (uc > 0) {
                wsDenominator += fittedLineTerms(inputs, c[k], u, nu, r, uc * uc);
            }
            double nuEff = wsDenominator > 0 ? 1 / wsDenominator : Double.POSITIVE_INFINITY;
            if (correlated && !terms.isEmpty() && !Double.isInfinite(nuEff)) {
                warnings.add("inputs are correlated; the Welch–Satterthwaite formula assumes independent inputs, "
                        + "so the effective degrees of freedom are approximate");
            }
            boolean anySensitive = false;
            for (int i : active) {
                anySensitive |= c[k][i] != 0;
            }
            if (uc == 0 && active.length > 0 && !anySensitive) {
                warnings.add(firstOrderZero(name, higher));
            } else if (uc == 0 && active.length > 0) {
                warnings.add("the combined standard uncertainty of " + name + " is zero: the correlated contributions cancel "
                        + "exactly");
            } else if (uc == 0) {
                warnings.add("the combined standard uncertainty of " + name + " is zero: no input has an uncertainty");
            }
            double dofUsed = nuEff;
            if (settings.dofRounding() == EvaluationSettings.DofRounding.TRUNCATE && !Double.isInfinite(nuEff)) {
                dofUsed = Math.max(1, Math.floor(nuEff + 1e-9));
            }
            double kFactor;
            double p;
            if (settings.hasFixedCoverageFactor()) {
                kFactor = settings.coverageFactor();
                p = CoverageFactor.probability(kFactor, dofUsed);
            } else {
                p = settings.coverageProbability();
                kFactor = CoverageFactor.of(p, dofUsed);
            }
            OutputResult result = new OutputResult(name, unitOf(budget, name), y[k], uc, corrVar, higherVar, higherTerms, nuEff,
                    dofUsed, kFactor, p, kFactor * uc, rows, terms, warnings);
            outs.add(shown[k] == null ? result : result.inUnit(shown[k].to().symbol(), shown[k]));
        }
        double[][] corr = new double[m][m];
        for (int k = 0; k < m; k++) {
            for (int l = 0; l < m; l++) {
                double d = Math.sqrt(cov[k][k] * cov[l][l]);
                corr[k][l] = k == l ? 1 : d > 0 ? cov[k][l] / d : Double.NaN;
            }
        }
        for (int k = 0; k < m; k++) {
            for (int l = 0; l < m; l++) {
                cov[k][l] *= (shown[k] == null ? 1 : shown[k].factor()) * (shown[l] == null ? 1 : shown[l].factor());
            }
        }
        Map<String, Double> q = new LinkedHashMap<>();
        for (int j = 0; j < quantities.length; j++) {
            q.put(model.quantityNames().get(j), quantities[j]);
        }
        return new GumResult(outs, cov, corr, q, globalWarnings, settings);
    }

    private static String unitOf(Budget budget, String output) {
        for (OutputQuantity o : budget.outputs()) {
            if (o.name().equals(output)) {
                return o.unit();
            }
        }
        return "";
    }

    /**
     * @return per output, the conversion from its unit to its display unit, or null when it has none
     * @throws ModelException naming the output and both units when a display unit cannot be used
     */
    public static Conversion[] displayConversions(Budget budget, CompiledModel model) throws ModelException {
        List<String> names = model.outputNames();
        Conversion[] c = new Conversion[names.size()];
        for (int k = 0; k < c.length; k++) {
            for (OutputQuantity o : budget.outputs()) {
                if (!o.name().equals(names.get(k)) || o.displayUnit().isEmpty()) {
                    continue;
                }
                try {
                    if (o.unit().isEmpty()) {
                        throw new UnitException("a display unit (" + o.displayUnit() + ") needs the unit the "
                                + "equation computes in; state it");
                    }
                    c[k] = Conversion.of(Units.parse(o.unit()), Units.parse(o.displayUnit()));
                } catch (UnitException e) {
                    throw new ModelException(new ModelProblem(0, 0, 0, ModelProblem.Severity.ERROR,
                            "output '" + o.name() + "' cannot be shown in " + o.displayUnit() + ": "
                                    + e.getMessage()));
                }
            }
        }
        return c;
    }

    /**
     * The Welch-Satterthwaite terms of fitted-line parameters: the intercept and slope of one line share one
     * residual scatter s, so their joint contribution u_L^2(y) = sum_ij c_i c_j u_i u_j r_ij is one component
     * with nu = n - 2 (JCGM 100:2008 H.3.4: b(t) from y1 and y2 has nu = n - 2; G.4.1, eq. G.2b). Returned
     * relative to u_c^4, as (u_L^2 / u_c^2)^2 / nu, so that it neither overflows nor underflows.
     */
    private static double fittedLineTerms(List<InputQuantity> inputs, double[] c, double[] u, double[] nu,
            CorrelationMatrix r, double ucSquared) {
        double sum = 0;
        boolean[] done = new boolean[inputs.size()];
        for (int i = 0; i < inputs.size(); i++) {
            if (done[i] || !(inputs.get(i).evaluation() instanceof FitParameter) || Double.isInfinite(nu[i])) {
                continue;
            }
            Object line = ((FitParameter) inputs.get(i).evaluation()).line();
            List<Integer> group = new ArrayList<>();
            for (int j = i; j < inputs.size(); j++) {
                if (inputs.get(j).evaluation() instanceof FitParameter
                        && ((FitParameter) inputs.get(j).evaluation()).line().equals(line)) {
                    group.add(j);
                    done[j] = true;
                }
            }
            double v = 0;
            for (int a : group) {
                for (int b : group) {
                    v += c[a] * c[b] * u[a] * u[b] * r.get(a, b);
                }
            }
            double share = v / ucSquared;
            sum += share * share / nu[i];
        }
        return sum;
    }

    /** Partial derivative of {@code f} with orders at the given active-parameter indices (-1 for none). */
    private static double partial(DerivativeStructure f, int params, int a, int b, int c) {
        int[] orders = new int[params];
        orders[a]++;
        if (b >= 0) {
            orders[b]++;
        }
        if (c >= 0) {
            orders[c]++;
        }
        return f.getPartialDerivative(orders);
    }

    /**
     * The warning for an output whose u_c is zero although inputs are uncertain: every first-order sensitivity
     * coefficient vanishes at the estimates (a minimum or maximum of the model, as Y = X^2 at x = 0).
     */
    static String firstOrderZero(String output, boolean higherIncluded) {
        return "the combined standard uncertainty of " + output + " is zero: the first-order law of propagation gives "
                + "zero because every sensitivity "
                + "coefficient vanishes at the estimates, although the output does vary"
                + (higherIncluded ? "; the higher-order terms are zero too" : "; include the higher-order terms "
                        + "(JCGM 100:2008 5.1.2 note)") + " or use the Monte Carlo method (JCGM 101:2008), which "
                + "does not linearise the model";
    }

    /** @return true when a pair of correlated inputs has an input whose distribution is not normal */
    private static boolean correlatedNonNormal(List<InputQuantity> inputs, CorrelationMatrix r) {
        int[] members = r.correlated();
        for (int i : members) {
            for (int j : members) {
                if (i != j && r.get(i, j) != 0 && !(inputs.get(i).evaluation().distribution()
                        instanceof org.quire.engine.budget.Distribution.Normal)) {
                    return true;
                }
            }
        }
        return false;
    }

    /**
     * The higher-order terms for correlated normal inputs, the general form of JCGM 100:2008 5.1.2 note with the
     * covariance matrix V (V_ij = u_i u_j r_ij), from the Taylor series to third order and the moments of a
     * multivariate normal distribution (Isserlis' theorem: E[d_l d_i d_j d_k] = V_li V_jk + V_lj V_ik + V_lk V_ij):
     * (1/2) tr(H V H V) + sum over l, i, j, k of g_l V_li f_ijk V_jk, with g the gradient, H the Hessian and f_ijk
     * the third derivatives at the estimates. For a diagonal V it is the double sum of the note.
     */
    private static double higherOrderVariance(DerivativeStructure f, int[] active, double[] u, CorrelationMatrix r) {
        int p = active.length;
        double[][] v = new double[p][p];
        double[][] h = new double[p][p];
        double[] g = new double[p];
        for (int a = 0; a < p; a++) {
            g[a] = partial(f, p, a, -1, -1);
            for (int b = 0; b < p; b++) {
                v[a][b] = u[active[a]] * u[active[b]] * r.get(active[a], active[b]);
                h[a][b] = partial(f, p, a, b, -1);
            }
        }
        double[][] hv = new double[p][p];
        for (int a = 0; a < p; a++) {
            for (int c = 0; c < p; c++) {
                double s = 0;
                for (int b = 0; b < p; b++) {
                    s += h[a][b] * v[b][c];
                }
                hv[a][c] = s;
            }
        }
        double trace = 0;
        for (int a = 0; a < p; a++) {
            for (int b = 0; b < p; b++) {
                trace += hv[a][b] * hv[b][a];
            }
        }
        double[] gv = new double[p]; // (V g)_i
        for (int i = 0; i < p; i++) {
            double s = 0;
            for (int l = 0; l < p; l++) {
                s += v[i][l] * g[l];
            }
            gv[i] = s;
        }
        double third = 0;
        for (int i = 0; i < p; i++) {
            if (gv[i] == 0) {
                continue;
            }
            double w = 0;
            for (int j = 0; j < p; j++) {
                for (int k = 0; k < p; k++) {
                    if (v[j][k] != 0) {
                        w += partial(f, p, i, j, k) * v[j][k];
                    }
                }
            }
            third += gv[i] * w;
        }
        return 0.5 * trace + third;
    }

    /** JCGM 100:2008 5.1.2 note, the double sum over all i and j. */
    private static double higherOrderVariance(DerivativeStructure f, int[] active, double[] u) {
        int p = active.length;
        double s = 0;
        for (int a = 0; a < p; a++) {
            double fi = partial(f, p, a, -1, -1);
            for (int b = 0; b < p; b++) {
                double fij = partial(f, p, a, b, -1);
                double fijj = partial(f, p, a, b, b);
                double ui2 = u[active[a]] * u[active[a]];
                double uj2 = u[active[b]] * u[active[b]];
                s += (0.5 * fij * fij + fi * fijj) * ui2 * uj2;
            }
        }
        return s;
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
