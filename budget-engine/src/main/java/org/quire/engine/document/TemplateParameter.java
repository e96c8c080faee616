package org.quire.engine.document;

import java.util.Locale;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Evaluation;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.InvalidParameterException;
import org.quire.engine.budget.TypeA;
import org.quire.engine.budget.TypeB;

/**
 * A value the user of a template must supply: it sets one field of one input of the budget, for example the
 * estimate of the input {@code T_tank}.
 *
 * <p>The field is {@code estimate} (for a Type B evaluation given by limits the interval is moved so that its
 * midpoint is the value; for a Type A evaluation given as a summary the mean is replaced), or the name of a
 * parameter of the input's Type B evaluation, e.g. {@code standardUncertainty} or {@code halfWidth}.
 *
 * @param name the parameter's name, also the column name in {@code quire batch} files; {@code id} is reserved
 * @param description what to enter
 * @param unit the unit of the value
 * @param input the input it sets
 * @param field the field of that input it sets
 * @param defaultValue the value used when none is given, NaN for none (the value is then required)
 * @param minimum the smallest allowed value, {@link Double#NEGATIVE_INFINITY} for no limit
 * @param maximum the largest allowed value, {@link Double#POSITIVE_INFINITY} for no limit
 */
public record TemplateParameter(String name, String description, String unit, String input, String field,
        double defaultValue, double minimum, double maximum) {

    /** Checks the parameter on its own; {@link TemplateSpec} checks it against the budget. */
    public TemplateParameter {
        try {
            InputQuantity.checkName(name);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("template parameter name '" + name + "' is not a valid name: use a "
                    + "letter or '_' followed by letters, digits or '_'");
        }
        if (name.equals("id")) {
            throw new IllegalArgumentException("'id' is reserved for the row identifier of batch files; choose "
                    + "another parameter name");
        }
        description = description == null ? "" : description;
        unit = unit == null ? "" : unit;
        InputQuantity.checkName(input);
        if (field == null || !(field.equals("estimate") || TypeB.parameterNames().contains(field))) {
            throw new IllegalArgumentException("parameter '" + name + "' sets field '" + field + "', which is neither "
                    + "'estimate' nor a parameter of a Type B evaluation");
        }
        if (Double.isNaN(minimum) || Double.isNaN(maximum) || !(minimum <= maximum)) {
            throw new IllegalArgumentException("parameter '" + name + "': minimum " + minimum
                    + " must not exceed maximum " + maximum);
        }
        if (!Double.isNaN(defaultValue)) {
            check(name, defaultValue, minimum, maximum);
        }
    }

    /** @return a required parameter without limits */
    public static TemplateParameter of(String name, String input, String field) {
        return new TemplateParameter(name, "", "", input, field, Double.NaN, Double.NEGATIVE_INFINITY,
                Double.POSITIVE_INFINITY);
    }

    public TemplateParameter withDescription(String v) {
        return new TemplateParameter(name, v, unit, input, field, defaultValue, minimum, maximum);
    }

    public TemplateParameter withUnit(String v) {
        return new TemplateParameter(name, description, v, input, field, defaultValue, minimum, maximum);
    }

    /** @param v the default, NaN for none */
    public TemplateParameter withDefault(double v) {
        return new TemplateParameter(name, description, unit, input, field, v, minimum, maximum);
    }

    public TemplateParameter withRange(double min, double max) {
        return new TemplateParameter(name, description, unit, input, field, defaultValue, min, max);
    }

    /** @return whether a default value is given */
    public boolean hasDefault() {
        return !Double.isNaN(defaultValue);
    }

    private static void check(String name, double v, double min, double max) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("parameter '" + name + "' must be a finite number, not " + v);
        }
        if (v < min || v > max) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "parameter '%s' = %s lies outside its allowed range [%s, %s]", name, v, min, max));
        }
    }

    /** @throws IllegalArgumentException when {@code v} is not finite or outside [minimum, maximum] */
    public void checkValue(double v) {
        check(name, v, minimum, maximum);
    }

    /**
     * @return the value of the field in {@code b}
     * @throws IllegalArgumentException when {@code b} has no such input or field
     */
    public double valueIn(Budget b) {
        Evaluation e = target(b).evaluation();
        if (field.equals("estimate")) {
            return e.estimate();
        }
        if (e instanceof TypeB && ((TypeB) e).parameters().containsKey(field)) {
            return ((TypeB) e).parameters().get(field);
        }
        throw new IllegalArgumentException("parameter '" + name + "': input '" + input + "' has no field '" + field
                + "'");
    }

    private InputQuantity target(Budget b) {
        InputQuantity q = b.input(input);
        if (q == null) {
            throw new IllegalArgumentException("parameter '" + name + "' sets input '" + input
                    + "', which the budget does not have");
        }
        return q;
    }

    /**
     * @param b the budget
     * @param v the value, checked against the range
     * @return {@code b} with the field set to {@code v}
     * @throws IllegalArgumentException naming the parameter when the value is out of range or the evaluation
     *     it gives is invalid
     */
    public Budget applyTo(Budget b, double v) {
        checkValue(v);
        InputQuantity q = target(b);
        Evaluation e = q.evaluation();
        Evaluation changed;
        try {
            if (e instanceof TypeA) {
                changed = setTypeA((TypeA) e, v);
            } else {
                changed = setTypeB((TypeB) e, v);
            }
        } catch (InvalidParameterException x) {
            throw new IllegalArgumentException("parameter '" + name + "' = " + v + ": " + x.getMessage(), x);
        }
        return b.withInput(input, q.withEvaluation(changed));
    }

    private Evaluation setTypeA(TypeA a, double v) {
        if (!field.equals("estimate")) {
            throw new IllegalArgumentException("parameter '" + name + "' sets '" + field + "' of input '" + input
                    + "', whose evaluation is Type A; only its estimate can be set");
        }
        if (a.readings() != null) {
            throw new IllegalArgumentException("parameter '" + name + "' sets the estimate of input '" + input
                    + "', which is the mean of its readings; give the input as a summary (mean, s, n) instead");
        }
        TypeA r = Double.isNaN(a.standardDeviation()) ? TypeA.ofMean(v, a.count())
                : TypeA.ofSummary(v, a.standardDeviation(), a.count());
        return a.isPooled() ? r.withPooled(a.pooledStandardDeviation(), a.dof()) : r;
    }

    private Evaluation setTypeB(TypeB t, double v) {
        java.util.Map<String, Double> p = t.parameters();
        if (field.equals("estimate") && p.containsKey("lower") && p.containsKey("upper")) {
            double shift = v - 0.5 * (p.get("lower") + p.get("upper"));
            java.util.Map<String, Double> q = new java.util.LinkedHashMap<>(p);
            q.put("lower", p.get("lower") + shift);
            q.put("upper", p.get("upper") + shift);
            if (q.containsKey("estimate")) {
                q.put("estimate", v);
            }
            return TypeB.of(t.distributionName(), q);
        }
        if (!field.equals("estimate") && !p.containsKey(field)) {
            throw new IllegalArgumentException("parameter '" + name + "' sets '" + field + "' of input '" + input
                    + "', whose " + t.distributionName() + " evaluation does not use it; it uses "
                    + String.join(", ", p.keySet()));
        }
        return t.with(field, v);
    }
}
