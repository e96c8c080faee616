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
 * midpoint is the value; for a Type A evaluation given as a summary the mean is replaced), the name of a
 * parameter of the input's Type B evaluation, e.g. {@code standardUncertainty} or {@code halfWidth}, or one of
 * the {@link #TYPE_A_FIELDS} of a Type A evaluation: {@code readings} (the observations themselves, a list of
 * numbers, see {@link #applyReadings}), {@code standardDeviation} (s of a summary) or {@code count} (n of a
 * summary, a whole number). A readings parameter has no default: readings belong to one measurement.
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
    /** The fields of a Type A evaluation a parameter can set besides {@code estimate}. */
    public static final java.util.List<String> TYPE_A_FIELDS = java.util.List.of("readings", "standardDeviation",
            "count");

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
        if (field == null || !(field.equals("estimate") || TypeB.parameterNames().contains(field)
                || TYPE_A_FIELDS.contains(field))) {
            throw new IllegalArgumentException("parameter '" + name + "' sets field '" + field + "', which is neither "
                    + "'estimate', a parameter of a Type B evaluation nor one of " + String.join(", ", TYPE_A_FIELDS)
                    + " of a Type A evaluation");
        }
        if (field.equals("readings") && !Double.isNaN(defaultValue)) {
            throw new IllegalArgumentException("parameter '" + name + "' sets readings, which have no default: "
                    + "they belong to one measurement");
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

    /** @return whether the parameter gives the readings of a Type A evaluation (a list, not one number) */
    public boolean isReadings() {
        return field.equals("readings");
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
        if (isReadings()) {
            throw new IllegalArgumentException("parameter '" + name + "' gives the readings of input '" + input
                    + "', a list, not one value");
        }
        if (field.equals("estimate")) {
            return e.estimate();
        }
        if (e instanceof TypeB && ((TypeB) e).parameters().containsKey(field)) {
            return ((TypeB) e).parameters().get(field);
        }
        if (e instanceof TypeA && field.equals("standardDeviation") && !Double.isNaN(((TypeA) e).standardDeviation())) {
            return ((TypeA) e).standardDeviation();
        }
        if (e instanceof TypeA && field.equals("count")) {
            return ((TypeA) e).count();
        }
        throw new IllegalArgumentException("parameter '" + name + "': input '" + input + "' has no field '" + field
                + "'");
    }

    /**
     * @return the readings the field holds in {@code b}
     * @throws IllegalArgumentException when this is not a readings parameter or the input has no readings
     */
    public double[] readingsIn(Budget b) {
        Evaluation e = target(b).evaluation();
        if (isReadings() && e instanceof TypeA && ((TypeA) e).readings() != null) {
            return ((TypeA) e).readings();
        }
        throw new IllegalArgumentException("parameter '" + name + "' sets the readings of input '" + input
                + "', which has " + (e instanceof TypeA ? "no readings (it is given as a summary)" : "a Type B evaluation"));
    }

    private InputQuantity target(Budget b) {
        InputQuantity q = b.input(input);
        if (q == null) {
            throw noSuchInput();
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
        checkNumber(v);
        InputQuantity q = target(b);
        return b.withInput(input, q.withEvaluation(evaluationFor(q.evaluation(), v)));
    }

    /**
     * The rule of {@link #applyTo}, on the evaluation of the input alone (a batch changes all the inputs of a
     * budget at once, {@link PreparedTemplate}).
     *
     * @param e the evaluation of this parameter's input
     * @param v the value, checked against the range
     * @return {@code e} with the field set to {@code v}
     * @throws IllegalArgumentException as {@link #applyTo}
     */
    Evaluation evaluationFor(Evaluation e, double v) {
        checkNumber(v);
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
        return changed;
    }

    /**
     * @throws IllegalArgumentException when this parameter takes readings, or {@code v} is not finite or outside
     *     [minimum, maximum]
     */
    void checkNumber(double v) {
        if (isReadings()) {
            throw new IllegalArgumentException("parameter '" + name + "' takes the readings of input '" + input
                    + "', a list of numbers, not one value");
        }
        checkValue(v);
    }

    /** @return the refusal of a parameter whose input the budget does not have */
    IllegalArgumentException noSuchInput() {
        return new IllegalArgumentException("parameter '" + name + "' sets input '" + input
                + "', which the budget does not have");
    }

    private Evaluation setTypeA(TypeA a, double v) {
        if (!field.equals("estimate") && !field.equals("standardDeviation") && !field.equals("count")) {
            throw new IllegalArgumentException("parameter '" + name + "' sets '" + field + "' of input '" + input
                    + "', whose evaluation is Type A; a parameter sets its readings, or the estimate, "
                    + "standardDeviation and count of a summary");
        }
        if (a.readings() != null) {
            throw new IllegalArgumentException("parameter '" + name + "' sets the " + field + " of input '" + input
                    + "', which is given by its readings; set the readings (field 'readings') or give the input "
                    + "as a summary (mean, s, n) instead");
        }
        double mean = field.equals("estimate") ? v : a.estimate();
        double s = field.equals("standardDeviation") ? v : a.standardDeviation();
        int n = a.count();
        if (field.equals("count")) {
            if (v != Math.rint(v) || v < 1 || v > Integer.MAX_VALUE) {
                throw new IllegalArgumentException("parameter '" + name + "' = " + v + ": the number of "
                        + "observations must be a whole number of 1 or more");
            }
            n = (int) v;
        }
        if (field.equals("standardDeviation") && a.isPooled()) {
            throw new IllegalArgumentException("parameter '" + name + "' sets s of input '" + input
                    + "', which uses a pooled standard deviation");
        }
        TypeA r = Double.isNaN(s) ? TypeA.ofMean(mean, n) : TypeA.ofSummary(mean, s, n);
        return a.isPooled() ? r.withPooled(a.pooledStandardDeviation(), a.dof()) : r;
    }

    /**
     * Replaces the readings of the input's Type A evaluation (a pooled standard deviation, when the template
     * gives one, is kept: it belongs to the method).
     *
     * @param b the budget
     * @param readings the observations, each checked against the range
     * @return {@code b} with the input's readings replaced
     * @throws IllegalArgumentException naming the parameter and the reading when one is out of range, too few
     *     are given, or the input is not a Type A evaluation
     */
    public Budget applyReadings(Budget b, double[] readings) {
        if (!isReadings()) {
            throw new IllegalArgumentException("parameter '" + name + "' takes one value, not a list of readings");
        }
        InputQuantity q = target(b);
        return b.withInput(input, q.withEvaluation(readingsEvaluationFor(q.evaluation(), readings)));
    }

    /**
     * The rule of {@link #applyReadings}, on the evaluation of the input alone ({@link PreparedTemplate}).
     *
     * @throws IllegalArgumentException as {@link #applyReadings}
     */
    Evaluation readingsEvaluationFor(Evaluation e, double[] readings) {
        if (!isReadings()) {
            throw new IllegalArgumentException("parameter '" + name + "' takes one value, not a list of readings");
        }
        if (!(e instanceof TypeA)) {
            throw new IllegalArgumentException("parameter '" + name + "' sets the readings of input '" + input
                    + "', whose evaluation is not Type A");
        }
        TypeA a = (TypeA) e;
        for (int i = 0; i < readings.length; i++) {
            try {
                checkValue(readings[i]);
            } catch (IllegalArgumentException x) {
                throw new IllegalArgumentException("reading " + (i + 1) + " of " + x.getMessage(), x);
            }
        }
        int least = a.isPooled() ? 1 : 2;
        if (readings.length < least) {
            throw new IllegalArgumentException("parameter '" + name + "' needs at least " + least + " readings, not "
                    + readings.length);
        }
        TypeA r = TypeA.ofReadings(readings);
        if (a.isPooled()) {
            r = r.withPooled(a.pooledStandardDeviation(), a.dof());
        }
        return r;
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
