package org.quire.engine.document;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.quire.engine.budget.Budget;

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
        return new TemplateOrigin(id(), version(), contentHash());
    }

    /**
     * @param values a value for every parameter without a default; others may be given to replace the default
     * @return the template's budget with the parameters applied
     * @throws IllegalArgumentException listing every unknown, missing or out-of-range parameter
     */
    public Budget budgetFor(Map<String, Double> values) {
        List<String> problems = new ArrayList<>();
        for (String k : values.keySet()) {
            if (spec().parameter(k) == null) {
                problems.add("'" + k + "' is not a parameter of template " + id() + " (its parameters: "
                        + String.join(", ", parameterNames()) + ")");
            }
        }
        Budget b = document.budget();
        for (TemplateParameter p : spec().parameters()) {
            Double v = values.get(p.name());
            if (v == null) {
                if (!p.hasDefault()) {
                    problems.add("parameter '" + p.name() + "' has no default and must be given");
                    continue;
                }
                v = p.defaultValue();
            }
            try {
                b = p.applyTo(b, v);
            } catch (IllegalArgumentException e) {
                problems.add(e.getMessage());
            }
        }
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException(String.join("; ", problems));
        }
        return b;
    }

    /** @return the parameter names in order */
    public List<String> parameterNames() {
        List<String> n = new ArrayList<>();
        for (TemplateParameter p : spec().parameters()) {
            n.add(p.name());
        }
        return n;
    }

    /**
     * @return a new draft document (revision 1) from this template with the parameters applied: the
     *     template's laboratory and data sets, the given author, no template section, and the template's
     *     {@link #origin()}
     */
    public BudgetDocument instantiate(Map<String, Double> values, String author, Instant now) {
        Budget b = budgetFor(values);
        return new BudgetDocument(b, document.laboratory(), "", author, now, now, 1, DocumentStatus.DRAFT, null, List.of(), origin(), null, 0);
    }
}
