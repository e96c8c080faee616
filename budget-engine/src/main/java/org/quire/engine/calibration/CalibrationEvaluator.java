package org.quire.engine.calibration;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeA;
import org.quire.engine.conformity.ConformityAssessment;
import org.quire.engine.conformity.MeasuredError;
import org.quire.engine.conformity.MpeLimits;
import org.quire.engine.conformity.MpeZone;
import org.quire.engine.conformity.PointDecision;
import org.quire.engine.document.Template;
import org.quire.engine.document.TemplateParameter;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.PointCovariance;
import org.quire.engine.line.CalibrationData;
import org.quire.engine.line.CalibrationPoint;
import org.quire.engine.line.LineFit;
import org.quire.engine.line.LineFitter;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.MonteCarloSettings;
import org.quire.engine.montecarlo.ProgressListener;
import org.quire.engine.units.Conversion;
import org.quire.engine.units.UnitException;
import org.quire.engine.units.Units;

/**
 * Evaluates calibrations made with one method: from the runs to the as-found and as-left results, the
 * adjustment, the CMC findings and the conformity decisions.
 *
 * <h2>Per run</h2>
 * The method template's parameters are the per-run quantities: every run gives each of them (a missing or
 * unknown reading is an error naming the run's source row). The method's compiled model, at the template's
 * estimates with the run's readings applied (as {@link Template#budgetFor} applies them), gives the run's error
 * E_j and flow q_j.
 *
 * <h2>Per point</h2>
 * The point's error is the mean of its runs' errors, E = (1/n) sum E_j, and its flow the mean of their flows.
 * The point's budget is the method at the mean readings plus one input R, the repeatability of the error, added
 * to the error: E_point = E(x_mean) + R. R is a Type A evaluation (JCGM 100:2008 4.2) whose observations are
 * d_j = E_j - E(x_mean), so that its estimate makes E_point the mean of the run errors exactly, its standard
 * deviation is that of the run errors, s (eq. 4), and nu = n - 1; its standard uncertainty is s / sqrt(n)
 * (eq. 5) when the point result is the mean of its runs, s when it stands for a single run (the method's
 * {@link RepeatabilityBasis}). A stated repeatability (a pooled s with its own nu, JCGM 100:2008 4.2.4) replaces
 * the runs' scatter where it is given; a point with one run needs one, since its own scatter is undefined. The
 * method's other inputs enter the point budget as they are for one run (a conservative choice, common practice:
 * a per-run effect such as the resolution also shows in the runs' scatter). The point's u_c, nu_eff
 * (Welch-Satterthwaite, G.4.1), k (G.3) and U = k u_c are its own.
 *
 * <h2>Between points</h2>
 * Every input of the method is declared shared, independent or correlated between points
 * ({@link InputDeclaration}); an input without a declaration is an error listing every input to declare. The
 * covariance of the point errors follows by {@link PointCovariance} (JCGM 102:2011 6.2.1.3); R is independent
 * between points.
 *
 * <h2>Adjustment and as left</h2>
 * The meter's indication is proportional to its calibration constant, so dialling C_new instead of C_old
 * scales every indication by the exact factor s = C_new / C_old, and an error E becomes
 * E' = 100 [(1 + E/100) s - 1].
 * <ul>
 * <li>Weighted mean error: E_w = sum w_p E_p / sum w_p with w_p = 1 / u^2(E_p) (the points' own u_c, not the
 *     CMC), u^2(E_w) = sum_pq w_p w_q cov(E_p, E_q) / (sum w)^2 with the full covariance, so that a shared
 *     reference does not average away; C_new = C_old / (1 + E_w/100).</li>
 * <li>Fitted slope: indicated flow y_p = q_p (1 + E_p/100) against reference flow x_p = q_p, by Gauss-Markov
 *     regression with U_y = diag(q) cov(E) diag(q) / 100^2 (ISO/TS 28037:2010 clause 8); C_new = C_old / b.</li>
 * <li>Chosen constant: C_new as the user gives it.</li>
 * </ul>
 * u(C_new) is reported with the constant: it says how well C_new realizes an error-free meter. It is not
 * added to the as-left results. A predicted as-left point is E'_p with u(E'_p) = s u(E_p), k and nu_eff of the
 * as-found point: the adjustment is the exactly known constant dialled into the meter, and the as-found
 * point's uncertainty, its repeatability included, is carried once. Adding u(C_new) as well would count the
 * as-found scatter twice, since C_new is computed from those same points. Measured as-left runs (made after
 * the adjustment) are evaluated like the as-found runs, and replace the prediction.
 *
 * <h2>CMC and conformity</h2>
 * A point whose U is below the laboratory's CMC at its flow is reported at the CMC, with a note (ILAC P14:2020;
 * clause from memory). Conformity is decided per point with the reported U, against an envelope or an
 * {@link MpeFormula}, under the decision rule of the specification (JCGM 106:2012, ILAC G8:2019); a point whose
 * reported U exceeds MPE / ratio gets a finding (common practice: ratio 3).
 *
 * <p>Immutable and thread-safe: one evaluator may evaluate many calibrations at once (a fleet).
 */
public final class CalibrationEvaluator {
    private final Template method;
    private final CompiledModel runModel;
    private final FunctionLibrary library;
    private final int monteCarloThreads;
    private final Map<String, PointModel> pointModels;

    /** The point model for one choice of outputs: its compiled form and the names added to the method. */
    private record PointModel(String text, CompiledModel model, String output, String repeatability) {
    }

    private CalibrationEvaluator(Template method, CompiledModel runModel, FunctionLibrary library, int threads,
            Map<String, PointModel> pointModels) {
        this.method = method;
        this.runModel = runModel;
        this.library = library;
        this.monteCarloThreads = threads;
        this.pointModels = pointModels;
    }

    /**
     * @param method the method template
     * @param library the functions its model may call
     * @throws ModelException when the method's model does not compile
     */
    public static CalibrationEvaluator of(Template method, FunctionLibrary library) throws ModelException {
        if (method == null) {
            throw new IllegalArgumentException(CalibrationMessages.missing("method template"));
        }
        CompiledModel m = method.document().budget().compile(library);
        return new CalibrationEvaluator(method, m, library, 0, new ConcurrentHashMap<>());
    }

    /**
     * @param threads the threads each point's Monte Carlo run may use (1 when many calibrations run in
     *     parallel; 0 for all processors)
     */
    public CalibrationEvaluator withMonteCarloThreads(int threads) {
        if (threads < 0) {
            throw new IllegalArgumentException(CalibrationMessages.negative("number of threads", threads));
        }
        return new CalibrationEvaluator(method, runModel, library, threads, pointModels);
    }

    /** @return the method template */
    public Template method() {
        return method;
    }

    /** Evaluates a calibration; see {@link #evaluate(Calibration, ProgressListener)}. */
    public CalibrationResult evaluate(Calibration c) throws ModelException {
        return evaluate(c, ProgressListener.NONE);
    }

    /**
     * Evaluates a calibration made with this evaluator's method.
     *
     * @param listener progress and cancellation of the Monte Carlo runs
     * @throws IllegalArgumentException naming the point, run (with its source row), input or field at fault:
     *     another method, an undeclared input, a missing reading, a point with one run and no stated
     *     repeatability, a flow outside the CMC table or the limits
     * @throws ModelException when the model leaves a function's domain at a run's readings
     */
    public CalibrationResult evaluate(Calibration c, ProgressListener listener) throws ModelException {
        if (c == null) {
            throw new IllegalArgumentException(CalibrationMessages.missing("calibration"));
        }
        if (!c.method().sameTemplate(method.origin())) {
            throw new CalibrationException("method", CalibrationMessages.otherMethod(c.method(), method.origin()));
        }
        Budget base = method.document().budget();
        OutputQuantity errorQ = output(base, c.errorOutput(), "error", "errorOutput");
        OutputQuantity flowQ = output(base, c.flowOutput(), "flow", "flowOutput");
        if (!errorQ.shownUnit().strip().equals("%")) {
            throw new CalibrationException("errorOutput", CalibrationMessages.errorNotPercent(errorQ.name(), errorQ.shownUnit()));
        }
        String flowUnit = flowQ.shownUnit().strip();
        double[] between = declarations(c, base);
        PointModel pm = pointModel(base, c.errorOutput(), c.flowOutput());
        List<String> findings = new ArrayList<>();

        List<PointResult> found = new ArrayList<>();
        for (int p = 0; p < c.asFound().size(); p++) {
            found.add(point(c, c.asFound().get(p), "as-found point " + (p + 1), "asFound[" + p + "]", pm, flowUnit, listener));
        }
        SeriesResult asFound = series(c, SeriesResult.Phase.AS_FOUND, found, between, flowUnit, findings);

        AdjustmentResult adj = c.adjustment().changesConstant() ? adjust(c, asFound, flowUnit) : null;
        if (adj != null && adj.fit() != null && adj.fit().consistency() == org.quire.engine.line.Consistency.INCONSISTENT) {
            findings.add(CalibrationMessages.slopeInconsistent(adj.fit()));
        }
        SeriesResult asLeft = null;
        if (!c.asLeft().isEmpty()) {
            List<PointResult> left = new ArrayList<>();
            for (int p = 0; p < c.asLeft().size(); p++) {
                left.add(point(c, c.asLeft().get(p), "as-left point " + (p + 1), "asLeft[" + p + "]", pm, flowUnit, listener));
            }
            asLeft = series(c, SeriesResult.Phase.AS_LEFT_MEASURED, left, between, flowUnit, findings);
        } else if (adj != null) {
            asLeft = predicted(c, asFound, adj, flowUnit, findings);
            findings.add(CalibrationMessages.predictedNote());
        }
        return new CalibrationResult(c, method.title(), "%", flowUnit, asFound, adj, asLeft, findings);
    }

    private static OutputQuantity output(Budget b, String name, String role, String field) {
        for (OutputQuantity o : b.outputs()) {
            if (o.name().equals(name)) {
                return o;
            }
        }
        throw new CalibrationException(field, CalibrationMessages.noOutput(role, name, b.outputNames()));
    }

    /** @return rho per input of the point budget (the method's inputs, then R) */
    private static double[] declarations(Calibration c, Budget base) {
        List<String> missing = new ArrayList<>();
        for (String n : base.inputNames()) {
            if (!c.declarations().containsKey(n)) {
                missing.add(n);
            }
        }
        if (!missing.isEmpty()) {
            throw new CalibrationException("declarations", CalibrationMessages.undeclared(missing));
        }
        for (String n : c.declarations().keySet()) {
            if (base.input(n) == null) {
                throw new CalibrationException("declarations." + n, CalibrationMessages.declaredUnknown(n, base.inputNames()));
            }
        }
        for (Correlation r : base.correlations()) {
            InputDeclaration a = c.declarations().get(r.first());
            InputDeclaration b = c.declarations().get(r.second());
            if (a.coefficient() != b.coefficient()) {
                throw new CalibrationException("declarations", CalibrationMessages.mixedCorrelation(r.first(), r.second()));
            }
        }
        double[] between = new double[base.inputs().size() + 1];
        for (int i = 0; i < base.inputs().size(); i++) {
            between[i] = c.declarations().get(base.inputs().get(i).name()).coefficient();
        }
        between[between.length - 1] = 0;
        return between;
    }

    private PointModel pointModel(Budget base, String error, String flow) throws ModelException {
        String key = error + "\u0000" + flow;
        PointModel pm = pointModels.get(key);
        if (pm != null) {
            return pm;
        }
        java.util.Set<String> taken = new java.util.HashSet<>(runModel.quantityNames());
        taken.addAll(base.inputNames());
        taken.addAll(base.outputNames());
        String out = fresh(error + "_point", taken);
        taken.add(out);
        String rep = fresh("R_" + error, taken);
        String text = base.model() + "\n" + out + " = " + error + " + " + rep;
        List<String> inputs = new ArrayList<>(base.inputNames());
        inputs.add(rep);
        Budget probe = pointBudgetShape(base, text, out, error, flow, rep);
        CompiledModel m = probe.compile(library);
        pm = new PointModel(text, m, out, rep);
        pointModels.put(key, pm);
        return pm;
    }

    private static String fresh(String name, java.util.Set<String> taken) {
        String n = name;
        while (taken.contains(n)) {
            n = n + "_";
        }
        return n;
    }

    /** The point budget's shape, with a placeholder repeatability (for compiling). */
    private static Budget pointBudgetShape(Budget base, String text, String out, String error, String flow, String rep) {
        List<InputQuantity> inputs = new ArrayList<>(base.inputs());
        inputs.add(InputQuantity.of(rep, TypeA.ofReadings(0, 1)).withUnit(outputUnit(base, error)));
        return withPointOutputs(base, text, out, error, flow).withInputs(inputs);
    }

    private static Budget withPointOutputs(Budget base, String text, String out, String error, String flow) {
        OutputQuantity e = null;
        OutputQuantity q = null;
        for (OutputQuantity o : base.outputs()) {
            if (o.name().equals(error)) {
                e = o;
            }
            if (o.name().equals(flow)) {
                q = o;
            }
        }
        OutputQuantity point = new OutputQuantity(out, e.unit(), "error of the meter at the flow point: the mean of "
                + "the runs' errors", e.displayUnit());
        return base.withModel(text).withOutputs(List.of(point, q));
    }

    private static String outputUnit(Budget base, String name) {
        for (OutputQuantity o : base.outputs()) {
            if (o.name().equals(name)) {
                return o.unit();
            }
        }
        return "";
    }

    private int errorIndex(Calibration c) {
        return runModel.outputNames().indexOf(c.errorOutput());
    }

    /**
     * The input estimates of the method with a run's readings applied: for parameters that set an estimate,
     * the reading itself (range-checked, as {@link Template#budgetFor} does); otherwise through
     * {@link Template#budgetFor}.
     */
    private double[] runVector(Map<String, Double> x) {
        Budget base = method.document().budget();
        boolean direct = true;
        for (TemplateParameter tp : method.spec().parameters()) {
            direct &= tp.field().equals("estimate");
        }
        Budget b = direct ? base : method.budgetFor(x);
        double[] v = new double[b.inputs().size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = b.inputs().get(i).evaluation().estimate();
        }
        if (direct) {
            for (TemplateParameter tp : method.spec().parameters()) {
                double value = x.get(tp.name());
                tp.checkValue(value);
                v[base.inputNames().indexOf(tp.input())] = value;
            }
        }
        return v;
    }

    /** Checks a run's readings against the method's parameters. */
    private Map<String, Double> readings(Run r, String where, String loc) {
        List<String> missing = new ArrayList<>();
        for (TemplateParameter tp : method.spec().parameters()) {
            if (r.reading(tp.name()) == null) {
                missing.add(tp.name());
            }
        }
        if (!missing.isEmpty()) {
            throw new CalibrationException(loc, CalibrationMessages.missingReadings(where, r.sourceRow(), missing));
        }
        for (String k : r.readings().keySet()) {
            if (method.spec().parameter(k) == null) {
                throw new CalibrationException(loc + ".readings." + k, CalibrationMessages.unknownReading(where, r.sourceRow(), k,
                        method.id(), method.parameterNames()));
            }
        }
        return r.readings();
    }

    private PointResult point(Calibration c, FlowPoint fp, String where, String loc, PointModel pm, String flowUnit,
            ProgressListener listener) throws ModelException {
        String at = where + " '" + fp.label() + "'";
        int n = fp.runs().size();
        List<RunResult> runs = new ArrayList<>();
        Map<String, Double> sums = new LinkedHashMap<>();
        double sumE = 0;
        double sumQ = 0;
        for (int j = 0; j < n; j++) {
            Run r = fp.runs().get(j);
            String runAt = at + ", run " + (j + 1);
            String runLoc = loc + ".runs[" + j + "]";
            Map<String, Double> x = readings(r, runAt, runLoc);
            double[] y;
            try {
                y = runModel.evaluate(runVector(x));
            } catch (IllegalArgumentException | ModelException e) {
                throw new CalibrationException(runLoc, CalibrationMessages.at(runAt, r.sourceRow(), e.getMessage()), e);
            }
            double e = y[errorIndex(c)];
            double q = y[runModel.outputNames().indexOf(c.flowOutput())];
            runs.add(new RunResult(r.sourceRow(), x, e, q));
            sumE += e;
            sumQ += q;
            for (Map.Entry<String, Double> v : x.entrySet()) {
                sums.merge(v.getKey(), v.getValue(), Double::sum);
            }
        }
        double meanE = sumE / n;
        double flow = sumQ / n;
        Map<String, Double> means = new LinkedHashMap<>();
        for (Map.Entry<String, Double> v : sums.entrySet()) {
            means.put(v.getKey(), v.getValue() / n);
        }
        Budget mean;
        double errorAtMean;
        try {
            mean = method.budgetFor(means);
            double[] xm = new double[mean.inputs().size()];
            for (int i = 0; i < xm.length; i++) {
                xm[i] = mean.inputs().get(i).evaluation().estimate();
            }
            errorAtMean = runModel.evaluate(xm)[runModel.outputNames().indexOf(c.errorOutput())];
        } catch (IllegalArgumentException | ModelException e) {
            throw new CalibrationException(loc, CalibrationMessages.at(at + " at the mean readings", 0, e.getMessage()), e);
        }
        double[] d = new double[n];
        double sumD = 0;
        for (int j = 0; j < n; j++) {
            d[j] = runs.get(j).error() - errorAtMean;
            sumD += d[j];
        }
        double meanD = sumD / n;
        double s = Double.NaN;
        if (n >= 2) {
            double ss = 0;
            for (double v : d) {
                ss += (v - meanD) * (v - meanD);
            }
            s = Math.sqrt(ss / (n - 1));
        }
        List<String> notes = new ArrayList<>();
        StatedRepeatability stated = fp.statedRepeatability();
        TypeA rep;
        String basisText;
        if (stated != null) {
            int m = c.repeatability() == RepeatabilityBasis.MEAN_OF_RUNS ? n : 1;
            rep = TypeA.ofMean(meanD, m).withPooled(stated.standardDeviation(), stated.dof());
            basisText = CalibrationMessages.statedBasis(stated, c.repeatability(), n);
            notes.add(CalibrationMessages.statedNote(fp.label(), stated, n, s));
        } else {
            if (n < 2) {
                throw new CalibrationException(loc, CalibrationMessages.oneRun(at, fp.runs().get(0).sourceRow()));
            }
            if (!(s > 0)) {
                throw new CalibrationException(loc, CalibrationMessages.noScatter(at, n));
            }
            rep = c.repeatability() == RepeatabilityBasis.MEAN_OF_RUNS ? TypeA.ofReadings(d)
                    : TypeA.ofMean(meanD, 1).withPooled(s, n - 1);
            basisText = CalibrationMessages.ownBasis(c.repeatability(), n);
        }
        InputQuantity r = InputQuantity.of(pm.repeatability(), rep).withUnit(outputUnit(method.document().budget(),
                c.errorOutput())).withDescription(CalibrationMessages.repeatabilityDescription(c.errorOutput()))
                .withSource(basisText);
        List<InputQuantity> inputs = new ArrayList<>(mean.inputs());
        inputs.add(r);
        Budget pb = withPointOutputs(mean, pm.text(), pm.output(), c.errorOutput(), c.flowOutput()).withInputs(inputs)
                .withTitle(method.title() + " - " + fp.label());
        GumResult g;
        try {
            g = GumEvaluator.evaluate(pb, pm.model(), pb.correlationMatrix(), pb.settings());
        } catch (ModelException e) {
            throw new CalibrationException(loc, CalibrationMessages.at(at, 0, e.getMessage()), e);
        }
        OutputResult res = g.output(pm.output());
        org.quire.engine.montecarlo.MonteCarloOutcome mc = null;
        if (c.monteCarlo() != null) {
            MonteCarloSettings ms = MonteCarloSettings.defaults().withTrials(c.monteCarlo().trials())
                    .withSeed(c.monteCarlo().seed()).withCoverageProbability(res.coverageProbability())
                    .withSignificantDigits(pb.settings().significantDigits());
            if (monteCarloThreads > 0) {
                ms = ms.withThreads(monteCarloThreads);
            }
            mc = BudgetSimulation.run(pb, pm.model(), g, ms, listener);
        }
        double cmc = Double.NaN;
        double reported = res.expandedUncertainty();
        boolean raised = false;
        if (c.cmc() != null) {
            try {
                cmc = c.cmc().at(convert(flow, flowUnit, c.cmc().flowUnit(), "CMC table"));
            } catch (IllegalArgumentException e) {
                throw new CalibrationException("cmc", at + ": " + e.getMessage(), e);
            }
            if (reported < cmc) {
                notes.add(CalibrationMessages.raisedToCmc(fp.label(), reported, cmc, flow, flowUnit));
                reported = cmc;
                raised = true;
            }
        }
        return new PointResult(fp.label(), flow, runs, res.estimate(), s, rep.standardUncertainty(), rep.dof(),
                stated != null, pb, res, res.standardUncertainty(), res.effectiveDof(), res.coverageFactor(),
                res.expandedUncertainty(), cmc, reported, raised, notes, mc);
    }

    private static double convert(double flow, String from, String to, String what) {
        if (from.equals(to)) {
            return flow;
        }
        try {
            return Conversion.of(Units.parse(from), Units.parse(to)).point(flow);
        } catch (UnitException e) {
            throw new IllegalArgumentException(CalibrationMessages.flowUnitMismatch(what, from, to, e.getMessage()));
        }
    }

    private SeriesResult series(Calibration c, SeriesResult.Phase phase, List<PointResult> points, double[] between,
            String flowUnit, List<String> findings) {
        List<OutputResult> results = new ArrayList<>();
        for (PointResult p : points) {
            results.add(p.result());
        }
        double[][] cov = PointCovariance.of(results, points.get(0).budget().correlationMatrix(), between);
        for (PointResult p : points) {
            for (String note : p.notes()) {
                findings.add(phase.label() + ": " + note);
            }
            if (p.monteCarlo() != null && !p.monteCarlo().output(0).comparison().validated()) {
                findings.add(CalibrationMessages.monteCarloNotValidated(phase.label(), p.label(),
                        p.monteCarlo().output(0).comparison()));
            }
        }
        return new SeriesResult(phase, points, cov, PointCovariance.correlation(cov),
                conformity(c, phase, points, flowUnit, findings));
    }

    private AdjustmentResult adjust(Calibration c, SeriesResult found, String flowUnit) {
        List<PointResult> pts = found.points();
        int m = pts.size();
        double[][] v = found.covariance();
        double old = c.constant().asFound();
        List<String> notes = new ArrayList<>();
        switch (c.adjustment().kind()) {
            case WEIGHTED_MEAN: {
                double[] w = new double[m];
                double sw = 0;
                for (int p = 0; p < m; p++) {
                    w[p] = 1 / (pts.get(p).standardUncertainty() * pts.get(p).standardUncertainty());
                    sw += w[p];
                }
                double ew = 0;
                double var = 0;
                List<Double> norm = new ArrayList<>();
                for (int p = 0; p < m; p++) {
                    ew += w[p] * pts.get(p).error() / sw;
                    norm.add(w[p] / sw);
                    for (int q = 0; q < m; q++) {
                        var += w[p] * w[q] * v[p][q];
                    }
                }
                double uew = Math.sqrt(var) / sw;
                double f = 1 + ew / 100;
                double cNew = old / f;
                double uNew = old / (f * f) * uew / 100;
                notes.add(CalibrationMessages.weightedMeanNote(m));
                notes.add(CalibrationMessages.noDoubleCounting());
                return new AdjustmentResult(Adjustment.Kind.WEIGHTED_MEAN, c.constant().name(), c.constant().unit(), old,
                        cNew, uNew, cNew / old, ew, uew, norm, null, notes);
            }
            case FITTED_SLOPE: {
                if (m < 3) {
                    throw new CalibrationException("adjustment", CalibrationMessages.slopeNeedsPoints(m));
                }
                List<CalibrationPoint> cp = new ArrayList<>();
                double[][] uy = new double[m][m];
                for (int p = 0; p < m; p++) {
                    double q = pts.get(p).flow();
                    cp.add(CalibrationPoint.of(q, q * (1 + pts.get(p).error() / 100), 0,
                            q * pts.get(p).standardUncertainty() / 100));
                    for (int r = 0; r < m; r++) {
                        uy[p][r] = q * pts.get(r).flow() * v[p][r] / 1e4;
                    }
                }
                LineFit fit = LineFitter.of(Adjustment.lineMethod()).fit(CalibrationData.of(
                        "indicated against reference flow", flowUnit, flowUnit, cp).withCovariance(uy));
                double b = fit.slope();
                double cNew = old / b;
                double uNew = old * fit.slopeUncertainty() / (b * b);
                notes.add(CalibrationMessages.slopeNote(fit, flowUnit));
                notes.add(CalibrationMessages.noDoubleCounting());
                return new AdjustmentResult(Adjustment.Kind.FITTED_SLOPE, c.constant().name(), c.constant().unit(), old,
                        cNew, uNew, cNew / old, 100 * (b - 1), 100 * fit.slopeUncertainty(), List.of(), fit, notes);
            }
            case CHOSEN: {
                double cNew = c.adjustment().chosenConstant();
                notes.add(CalibrationMessages.chosenNote());
                return new AdjustmentResult(Adjustment.Kind.CHOSEN, c.constant().name(), c.constant().unit(), old, cNew, 0,
                        cNew / old, 100 * (old / cNew - 1), Double.NaN, List.of(), null, notes);
            }
            default:
                throw new IllegalStateException(c.adjustment().kind().name());
        }
    }

    private SeriesResult predicted(Calibration c, SeriesResult found, AdjustmentResult adj, String flowUnit,
            List<String> findings) {
        double s = adj.scale();
        List<PointResult> out = new ArrayList<>();
        for (PointResult p : found.points()) {
            List<RunResult> runs = new ArrayList<>();
            for (RunResult r : p.runs()) {
                runs.add(new RunResult(r.sourceRow(), r.readings(), scaled(r.error(), s), r.flow()));
            }
            double u = p.standardUncertainty() * s;
            double bigU = p.expandedUncertainty() * s;
            List<String> notes = new ArrayList<>();
            double reported = bigU;
            boolean raised = false;
            if (c.cmc() != null && bigU < p.cmc()) {
                notes.add(CalibrationMessages.raisedToCmc(p.label(), bigU, p.cmc(), p.flow(), flowUnit));
                reported = p.cmc();
                raised = true;
            }
            out.add(new PointResult(p.label(), p.flow(), runs, scaled(p.error(), s), p.runStandardDeviation() * s,
                    p.repeatabilityUncertainty() * s, p.repeatabilityDof(), p.statedRepeatability(), null, null, u,
                    p.effectiveDof(), p.coverageFactor(), bigU, p.cmc(), reported, raised, notes, null));
        }
        double[][] cov = found.covariance();
        for (double[] row : cov) {
            for (int q = 0; q < row.length; q++) {
                row[q] *= s * s;
            }
        }
        for (PointResult p : out) {
            for (String note : p.notes()) {
                findings.add(SeriesResult.Phase.AS_LEFT_PREDICTED.label() + ": " + note);
            }
        }
        return new SeriesResult(SeriesResult.Phase.AS_LEFT_PREDICTED, out, cov, PointCovariance.correlation(cov),
                conformity(c, SeriesResult.Phase.AS_LEFT_PREDICTED, out, flowUnit, findings));
    }

    /** @return E' = 100 [(1 + E/100) s - 1], the error after the indication is scaled by s */
    static double scaled(double error, double s) {
        return 100 * ((1 + error / 100) * s - 1);
    }

    private static ConformityResult conformity(Calibration c, SeriesResult.Phase phase, List<PointResult> points,
            String flowUnit, List<String> findings) {
        ConformitySpec spec = c.conformity();
        if (spec == null) {
            return null;
        }
        List<PointConformity> out = new ArrayList<>();
        List<PointDecision> decisions = new ArrayList<>();
        for (PointResult p : points) {
            MpeLimits limits;
            String zone = "";
            double flowInLimits;
            if (spec.envelope() != null) {
                MpeZone z;
                try {
                    flowInLimits = convert(p.flow(), flowUnit, spec.envelope().flowUnit(), "limits");
                    z = spec.envelope().zoneAt(flowInLimits);
                    limits = z.limitsAt(spec.temperature());
                } catch (IllegalArgumentException e) {
                    throw new CalibrationException("conformity", CalibrationMessages.pointLimits(phase.label(), p.label(),
                            e.getMessage()), e);
                }
                zone = z.name();
            } else {
                flowInLimits = p.flow();
                try {
                    limits = MpeLimits.symmetric(spec.formula().percentAt(p.flow(), flowUnit));
                } catch (IllegalArgumentException e) {
                    throw new CalibrationException("conformity.mpeFormula", CalibrationMessages.pointLimits(
                            phase.label(), p.label(), e.getMessage()), e);
                }
            }
            MeasuredError me = new MeasuredError(flowInLimits, spec.temperature(), p.error(),
                    p.reportedStandardUncertainty(), p.coverageFactor(), p.effectiveDof());
            PointDecision d = spec.envelope() != null ? spec.rule().decide(me, spec.envelope())
                    : spec.rule().decide(me, limits);
            decisions.add(d);
            double mpe = Math.min(Math.abs(limits.lowerPercent()), Math.abs(limits.upperPercent()));
            boolean met = p.reportedExpandedUncertainty() <= mpe / spec.uncertaintyRatio() * (1 + 1e-12);
            String finding = met ? "" : CalibrationMessages.ratioFailed(phase.label(), p.label(),
                    p.reportedExpandedUncertainty(), mpe, spec.uncertaintyRatio());
            if (!met) {
                findings.add(finding);
            }
            if (d.decision() != org.quire.engine.conformity.Decision.CONFORMS) {
                findings.add(CalibrationMessages.pointDecision(phase.label(), p.label(), d.decision().label()));
            }
            out.add(new PointConformity(p.label(), d, mpe, spec.uncertaintyRatio(), met, finding));
        }
        String source = spec.envelope() != null ? spec.envelope().source() : CalibrationMessages.formulaSource();
        return new ConformityResult(spec.limitsName(), source, spec.rule(), out, ConformityAssessment.overall(decisions),
                ConformityAssessment.statement(spec.rule(), spec.limitsName(), decisions));
    }
}
