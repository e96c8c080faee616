package org.quire.app.compare;

import jakarta.json.JsonValue;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.Evaluation;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;

/**
 * Compares two budgets: inputs added, removed and changed (estimate, evaluation, standard uncertainty, degrees
 * of freedom, source, unit, description, notes), outputs, the model line by line, correlations, settings and
 * other fields; then evaluates both with the GUM ({@link GumEvaluator}) to show the effect on each output's
 * expanded uncertainty. Inputs, outputs and correlations are matched by name.
 *
 * <p>Stateless and thread-safe.
 */
public final class BudgetComparison {
    private BudgetComparison() {
    }

    /** @return what differs from {@code a} to {@code b} and the effect on U */
    public static Comparison compare(Budget a, Budget b, FunctionLibrary library) {
        List<FieldChange> budget = new ArrayList<>();
        field(budget, "title", a.title(), b.title());
        field(budget, "notes", a.notes(), b.notes());

        List<InputQuantity> added = new ArrayList<>();
        List<InputQuantity> removed = new ArrayList<>();
        List<QuantityChange> changed = new ArrayList<>();
        for (InputQuantity qa : a.inputs()) {
            InputQuantity qb = b.input(qa.name());
            if (qb == null) {
                removed.add(qa);
            } else if (!qa.equals(qb)) {
                changed.add(new QuantityChange(qa.name(), inputChanges(qa, qb)));
            }
        }
        for (InputQuantity qb : b.inputs()) {
            if (a.input(qb.name()) == null) {
                added.add(qb);
            }
        }

        List<String> outsAdded = new ArrayList<>();
        List<String> outsRemoved = new ArrayList<>();
        List<QuantityChange> outsChanged = new ArrayList<>();
        Map<String, OutputQuantity> outB = new LinkedHashMap<>();
        b.outputs().forEach(o -> outB.put(o.name(), o));
        Set<String> outA = new LinkedHashSet<>();
        for (OutputQuantity oa : a.outputs()) {
            outA.add(oa.name());
            OutputQuantity ob = outB.get(oa.name());
            if (ob == null) {
                outsRemoved.add(oa.name());
            } else if (!oa.equals(ob)) {
                List<FieldChange> f = new ArrayList<>();
                field(f, "unit", oa.unit(), ob.unit());
                field(f, "description", oa.description(), ob.description());
                outsChanged.add(new QuantityChange(oa.name(), f));
            }
        }
        for (String n : outB.keySet()) {
            if (!outA.contains(n)) {
                outsAdded.add(n);
            }
        }

        List<LineEdit> model = LineDiff.diff(lines(a.model()), lines(b.model()));

        List<FieldChange> corr = correlations(a.correlations(), b.correlations());
        List<FieldChange> settings = settings(a.settings(), b.settings());
        List<FieldChange> other = new ArrayList<>();
        Set<String> keys = new LinkedHashSet<>(a.extensions().keySet());
        keys.addAll(b.extensions().keySet());
        for (String k : keys) {
            JsonValue va = a.extensions().get(k);
            JsonValue vb = b.extensions().get(k);
            if (va == null || !va.equals(vb)) {
                other.add(new FieldChange(k, va == null ? "" : "present", vb == null ? "" : "present"
                        + (va != null ? " (changed)" : "")));
            }
        }

        String problemA = "";
        String problemB = "";
        GumResult ra = null;
        GumResult rb = null;
        try {
            ra = GumEvaluator.evaluate(a, library);
        } catch (ModelException | IllegalArgumentException e) {
            problemA = e.getMessage();
        }
        try {
            rb = GumEvaluator.evaluate(b, library);
        } catch (ModelException | IllegalArgumentException e) {
            problemB = e.getMessage();
        }
        List<OutputEffect> effects = new ArrayList<>();
        Set<String> names = new LinkedHashSet<>(a.outputNames());
        names.addAll(b.outputNames());
        for (String n : names) {
            OutputResult oa = ra == null ? null : ra.output(n);
            OutputResult ob = rb == null ? null : rb.output(n);
            String unit = ob != null ? ob.unit() : oa != null ? oa.unit() : "";
            effects.add(new OutputEffect(n, unit, oa == null ? Double.NaN : oa.estimate(),
                    ob == null ? Double.NaN : ob.estimate(), oa == null ? Double.NaN : oa.expandedUncertainty(),
                    ob == null ? Double.NaN : ob.expandedUncertainty(), oa == null ? Double.NaN : oa.coverageFactor(),
                    ob == null ? Double.NaN : ob.coverageFactor()));
        }
        return new Comparison(a.title(), b.title(), budget, added, removed, changed, outsAdded, outsRemoved,
                outsChanged, model, corr, settings, other, effects, problemA, problemB);
    }

    private static List<String> lines(String model) {
        List<String> out = new ArrayList<>();
        for (String l : model.split("\n", -1)) {
            out.add(l.stripTrailing());
        }
        while (!out.isEmpty() && out.get(out.size() - 1).isEmpty()) {
            out.remove(out.size() - 1);
        }
        return out;
    }

    private static List<FieldChange> inputChanges(InputQuantity a, InputQuantity b) {
        List<FieldChange> f = new ArrayList<>();
        field(f, "description", a.description(), b.description());
        field(f, "unit", a.unit(), b.unit());
        field(f, "source", a.source(), b.source());
        field(f, "notes", a.notes(), b.notes());
        Evaluation ea = a.evaluation();
        Evaluation eb = b.evaluation();
        if (!ea.equals(eb)) {
            int before = f.size();
            field(f, "evaluation type", ea.type(), eb.type());
            field(f, "distribution", ea.distribution().shape(), eb.distribution().shape());
            field(f, "estimate", Figures.estimate(ea.estimate()), Figures.estimate(eb.estimate()));
            field(f, "standard uncertainty", Figures.estimate(ea.standardUncertainty()),
                    Figures.estimate(eb.standardUncertainty()));
            field(f, "degrees of freedom", Figures.dof(ea.dof()), Figures.dof(eb.dof()));
            field(f, "basis", ea.basis(), eb.basis());
            if (f.size() == before) {
                field(f, "evaluation as entered", BudgetJson.evaluationJson(ea).toString(),
                        BudgetJson.evaluationJson(eb).toString());
            }
        }
        return f;
    }

    private static List<FieldChange> correlations(List<Correlation> a, List<Correlation> b) {
        Map<String, Correlation> ma = new LinkedHashMap<>();
        a.forEach(c -> ma.put(pair(c), c));
        Map<String, Correlation> mb = new LinkedHashMap<>();
        b.forEach(c -> mb.put(pair(c), c));
        Set<String> keys = new LinkedHashSet<>(ma.keySet());
        keys.addAll(mb.keySet());
        List<FieldChange> out = new ArrayList<>();
        for (String k : keys) {
            Correlation ca = ma.get(k);
            Correlation cb = mb.get(k);
            if (ca == null || cb == null || !same(ca, cb)) {
                out.add(new FieldChange(k, describe(ca), describe(cb)));
            }
        }
        return out;
    }

    private static boolean same(Correlation a, Correlation b) {
        return a.fromReadings() == b.fromReadings() && (a.fromReadings() || Double.compare(a.r(), b.r()) == 0)
                && a.justification().equals(b.justification());
    }

    private static String pair(Correlation c) {
        String[] n = {c.first(), c.second()};
        Arrays.sort(n);
        return "r(" + n[0] + ", " + n[1] + ")";
    }

    private static String describe(Correlation c) {
        if (c == null) {
            return "";
        }
        String r = c.fromReadings() ? "from readings" : "r = " + Figures.estimate(c.r());
        return c.justification().isEmpty() ? r : r + "; " + c.justification();
    }

    private static List<FieldChange> settings(EvaluationSettings a, EvaluationSettings b) {
        List<FieldChange> f = new ArrayList<>();
        field(f, "coverage", coverage(a), coverage(b));
        field(f, "higher-order terms", a.higherOrder() ? "added" : "not added", b.higherOrder() ? "added" : "not added");
        field(f, "effective degrees of freedom", a.dofRounding().name().toLowerCase(java.util.Locale.ROOT),
                b.dofRounding().name().toLowerCase(java.util.Locale.ROOT));
        field(f, "significant digits", Integer.toString(a.significantDigits()), Integer.toString(b.significantDigits()));
        field(f, "Monte Carlo trials", Long.toString(a.trials()), Long.toString(b.trials()));
        field(f, "Monte Carlo seed", Long.toString(a.seed()), Long.toString(b.seed()));
        field(f, "adaptive Monte Carlo", Boolean.toString(a.adaptive()), Boolean.toString(b.adaptive()));
        return f;
    }

    private static String coverage(EvaluationSettings s) {
        return s.hasFixedCoverageFactor() ? "k = " + Figures.estimate(s.coverageFactor())
                : "p = " + Figures.probability(s.coverageProbability()) + " %";
    }

    private static void field(List<FieldChange> out, String name, String a, String b) {
        if (!a.equals(b)) {
            out.add(new FieldChange(name, a, b));
        }
    }
}
