package org.quire.app.ui.notebook;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.quire.engine.budget.Evaluation;
import org.quire.engine.budget.InvalidParameterException;
import org.quire.engine.budget.TypeA;
import org.quire.engine.budget.TypeB;

/**
 * Turns a value the engineer typed into a new evaluation, by the engine's own checking factories. Nothing is
 * computed here: a value is put where it was entered, or the edit is refused with a message saying why.
 */
public final class EvaluationEdits {
    private EvaluationEdits() {
    }

    /** @return whether the estimate can be typed in the inputs table (it is a parameter of its own) */
    public static boolean estimateEditable(Evaluation e) {
        if (e instanceof TypeB) {
            return ((TypeB) e).parameters().containsKey("estimate");
        }
        return ((TypeA) e).readings() == null;
    }

    /** @return the evaluation with a new estimate */
    public static Evaluation withEstimate(Evaluation e, double x) {
        if (e instanceof TypeB) {
            TypeB b = (TypeB) e;
            if (!b.parameters().containsKey("estimate")) {
                throw new IllegalArgumentException("this input is given by its limits; change 'lower' and 'upper' "
                        + "in the inspector");
            }
            return b.with("estimate", x);
        }
        TypeA a = (TypeA) e;
        if (a.readings() != null) {
            throw new IllegalArgumentException("this estimate is the mean of the readings; change the readings "
                    + "in the inspector");
        }
        TypeA n = Double.isNaN(a.standardDeviation()) ? TypeA.ofMean(x, a.count())
                : TypeA.ofSummary(x, a.standardDeviation(), a.count());
        return a.isPooled() ? n.withPooled(a.pooledStandardDeviation(), a.dof()) : n;
    }

    /** @return whether u can be typed in the inputs table (it was entered as standardUncertainty) */
    public static boolean uncertaintyEditable(Evaluation e) {
        return e instanceof TypeB && ((TypeB) e).parameters().containsKey("standardUncertainty");
    }

    public static Evaluation withStandardUncertainty(Evaluation e, double u) {
        if (!uncertaintyEditable(e)) {
            throw new IllegalArgumentException("u is derived from the parameters of this input; change them in "
                    + "the inspector");
        }
        return ((TypeB) e).with("standardUncertainty", u);
    }

    /** @return whether the degrees of freedom can be typed (a Type B other than a constant) */
    public static boolean dofEditable(Evaluation e) {
        return e instanceof TypeB && !((TypeB) e).distributionName().equals("constant")
                && !((TypeB) e).distributionName().equals("exponential");
    }

    /** @param nu the degrees of freedom, infinite to remove them */
    public static Evaluation withDof(Evaluation e, double nu) {
        if (!dofEditable(e)) {
            throw new IllegalArgumentException("the degrees of freedom of a Type A evaluation follow from the "
                    + "number of readings, and a constant has none");
        }
        TypeB b = (TypeB) e;
        if (Double.isInfinite(nu) && b.parameters().containsKey("dof") && !b.distributionName().equals("student-t")) {
            return b.with("dof", null);
        }
        return b.with("dof", nu);
    }

    /**
     * Changes a Type B evaluation's distribution, keeping every parameter the new one accepts; when the new
     * distribution needs a parameter the old one lacks, the entered width or uncertainty is carried over as a
     * starting value to be checked.
     */
    public static TypeB withDistribution(TypeB b, String distribution) {
        Map<String, Double> p = new LinkedHashMap<>(b.parameters());
        IllegalArgumentException first = null;
        for (Map<String, Double> candidate : candidates(p, distribution)) {
            try {
                return TypeB.of(distribution, candidate);
            } catch (InvalidParameterException e) {
                first = first == null ? e : first;
            }
        }
        throw new IllegalArgumentException("cannot change to " + distribution + " directly: "
                + first.getMessage() + "; set the parameters in the inspector");
    }

    private static List<Map<String, Double>> candidates(Map<String, Double> p, String to) {
        Double width = p.getOrDefault("halfWidth", p.getOrDefault("standardUncertainty",
                p.getOrDefault("scale", p.get("expandedUncertainty"))));
        Map<String, Double> keep = new LinkedHashMap<>(p);
        Map<String, Double> basic = new LinkedHashMap<>();
        if (p.containsKey("estimate")) {
            basic.put("estimate", p.get("estimate"));
        }
        if (p.containsKey("lower")) {
            basic.put("lower", p.get("lower"));
            basic.put("upper", p.get("upper"));
        }
        Map<String, Double> reshaped = new LinkedHashMap<>(basic);
        switch (to) {
            case "normal":
                if (width != null) {
                    reshaped.remove("lower");
                    reshaped.remove("upper");
                    reshaped.put("standardUncertainty", width);
                }
                break;
            case "student-t":
                if (width != null) {
                    reshaped.put("scale", width);
                }
                if (p.containsKey("dof")) {
                    reshaped.put("dof", p.get("dof"));
                }
                break;
            case "exponential":
            case "constant":
                reshaped.remove("lower");
                reshaped.remove("upper");
                break;
            default:
                if (!basic.containsKey("lower") && width != null) {
                    reshaped.put("halfWidth", width);
                }
                if (to.equals("trapezoidal")) {
                    reshaped.put("beta", p.getOrDefault("beta", 0.5));
                }
                if (to.equals("curvilinear-trapezoid") && p.containsKey("halfWidthUncertainty")) {
                    reshaped.put("halfWidthUncertainty", p.get("halfWidthUncertainty"));
                }
        }
        Map<String, Double> withDof = new LinkedHashMap<>(reshaped);
        if (p.containsKey("dof") && !to.equals("constant") && !to.equals("exponential")) {
            withDof.put("dof", p.get("dof"));
        }
        return List.of(keep, withDof, reshaped, basic);
    }
}
