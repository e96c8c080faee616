package org.quire.engine.document;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;

/**
 * A budget document that carries a {@link TemplateSpec}: the starting point for budgets of one method. Its
 * identity is its id, version and content hash ({@link #origin()}), which every document made from it
 * records.
 *
 * <p>Immutable and thread-safe.
 */
public final class Template {
    private final BudgetDocument document;

    private Template(BudgetDocument document) {
        this.document = document;
    }

    /**
     * @param document a document with a template section
     * @throws IllegalArgumentException when it has none
     */
    public static Template of(BudgetDocument document) {
        Objects.requireNonNull(document, "document");
        if (document.template() == null) {
            throw new IllegalArgumentException("'" + document.title() + "' is a budget, not a template: it has no "
                    + "template section");
        }
        return new Template(document);
    }

    public BudgetDocument document() { return document; }
    public TemplateSpec spec() { return document.template(); }
    public String id() { return spec().id(); }
    public int version() { return spec().version(); }
    public String title() { return document.title(); }
    public String contentHash() { return document.contentHash(); }

    /** @return the provenance a document made from this template records */
    public TemplateOrigin origin() {
        return new TemplateOrigin(id(), version(), contentHash(), spec().locked());
    }

    /**
     * @param values a value for every parameter without a default; others may be given to replace the default
     * @return the template's budget with the parameters applied
     * @throws IllegalArgumentException listing every unknown, missing or out-of-range parameter
     * @see #budgetFor(TemplateValues)
     */
    public Budget budgetFor(Map<String, Double> values) {
        return budgetFor(TemplateValues.of(values));
    }

    /**
     * The template's budget with the user's values applied. Refused when the template would carry a value of its
     * example into the budget ({@link TemplateSpec#carriedValues}), so that a budget made from a template has no
     * value the user did not give or the method does not fix.
     *
     * @param values a value for every numeric parameter without a default and the readings of every readings
     *     parameter
     * @return the template's budget with the parameters applied
     * @throws IllegalArgumentException listing every unknown, missing or out-of-range parameter, and every input
     *     whose example value would be carried over
     */
    public Budget budgetFor(TemplateValues values) {
        return substitute(document.budget(), values, carriedProblems());
    }

    /** @return the refusals of {@link TemplateSpec#carriedValues}, each naming this template */
    List<String> carriedProblems() {
        List<String> problems = new ArrayList<>();
        for (String c : spec().carriedValues(document.budget())) {
            problems.add("template " + id() + " v" + version() + ": " + c);
        }
        return problems;
    }

    /**
     * The rule of {@link #budgetFor(TemplateValues)}, on a budget with this template's inputs: every parameter
     * sets its input's evaluation ({@link TemplateParameter#evaluationFor}, {@link
     * TemplateParameter#readingsEvaluationFor}) and the budget is made once with the changed inputs.
     *
     * @param b this template's budget (its settings may differ)
     * @param problems the problems found before (the carried values), to which the values' own are added
     * @throws IllegalArgumentException listing every problem
     */
    Budget substitute(Budget b, TemplateValues values, List<String> problems) {
        Map<String, Double> numbers = values.numbers();
        Map<String, double[]> readings = values.readings();
        for (String k : numbers.keySet()) {
            TemplateParameter p = spec().parameter(k);
            if (p == null) {
                problems.add("'" + k + "' is not a parameter of template " + id() + " (its parameters: "
                        + String.join(", ", parameterNames()) + ")");
            } else if (p.isReadings()) {
                problems.add("parameter '" + k + "' takes the readings of input '" + p.input() + "', a list of "
                        + "numbers, not one value");
            }
        }
        for (String k : readings.keySet()) {
            TemplateParameter p = spec().parameter(k);
            if (p == null) {
                problems.add("'" + k + "' is not a parameter of template " + id() + " (its parameters: "
                        + String.join(", ", parameterNames()) + ")");
            } else if (!p.isReadings()) {
                problems.add("parameter '" + k + "' takes one value, not a list of readings");
            }
        }
        List<InputQuantity> inputs = new ArrayList<>(b.inputs());
        for (TemplateParameter p : spec().parameters()) {
            try {
                if (p.isReadings()) {
                    double[] r = readings.get(p.name());
                    if (r == null) {
                        problems.add("parameter '" + p.name() + "' (the readings of input '" + p.input()
                                + "') must be given: the template's example readings are not carried over");
                    } else {
                        int i = indexOf(inputs, p);
                        InputQuantity q = inputs.get(i);
                        inputs.set(i, q.withEvaluation(p.readingsEvaluationFor(q.evaluation(), r)));
                    }
                    continue;
                }
                Double v = numbers.get(p.name());
                if (v == null) {
                    if (!p.hasDefault()) {
                        problems.add("parameter '" + p.name() + "' has no default and must be given");
                        continue;
                    }
                    v = p.defaultValue();
                }
                p.checkNumber(v);
                int i = indexOf(inputs, p);
                InputQuantity q = inputs.get(i);
                inputs.set(i, q.withEvaluation(p.evaluationFor(q.evaluation(), v)));
            } catch (IllegalArgumentException e) {
                problems.add(e.getMessage());
            }
        }
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException(String.join("; ", problems));
        }
        return b.withInputs(inputs);
    }

    /** @throws IllegalArgumentException when the budget has no input of the parameter */
    private static int indexOf(List<InputQuantity> inputs, TemplateParameter p) {
        for (int i = 0; i < inputs.size(); i++) {
            if (inputs.get(i).name().equals(p.input())) {
                return i;
            }
        }
        throw p.noSuchInput();
    }

    /** @return the parameter names in order */
    public List<String> parameterNames() {
        List<String> n = new ArrayList<>();
        for (TemplateParameter p : spec().parameters()) {
            n.add(p.name());
        }
        return n;
    }

    /** @see #instantiate(TemplateValues, String, Instant) */
    public BudgetDocument instantiate(Map<String, Double> values, String author, Instant now) {
        return instantiate(TemplateValues.of(values), author, now);
    }

    /**
     * @return a new draft document (revision 1) from this template with the values applied
     *     ({@link #budgetFor(TemplateValues)}): the laboratory and device under test of {@code values} (empty
     *     when not given; the template's own are never carried over), the given author, no template section, and
     *     the template's {@link #origin()} with its locked fields
     */
    public BudgetDocument instantiate(TemplateValues values, String author, Instant now) {
        Budget b = budgetFor(values);
        return new BudgetDocument(b, values.laboratory(), values.deviceUnderTest(), author, now, now, 1,
                DocumentStatus.DRAFT, null, List.of(), origin(), null, 0);
    }
}
