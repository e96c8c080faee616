package org.quire.engine.document;

import jakarta.json.JsonObject;
import jakarta.json.JsonValue;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.io.BudgetJson;

/**
 * Whether a budget made from a template keeps what the template locks: the one deviation check that
 * {@code quire template check}, {@code quire review} and {@code quire evaluate} all use. A locked field is a
 * value of the method (see {@link TemplateSpec}); a budget that changed one does not follow its template, and
 * each changed field is a {@link Deviation} naming the field, the template's value and the budget's value.
 *
 * <p>The budget is compared with the version of the template it records in its {@link TemplateOrigin}, as the
 * library holds it; the locks are the template's own (not a copy the budget may carry), so a budget cannot
 * escape a lock by editing its record of them.
 *
 * <p>Stateless and thread-safe.
 */
public final class TemplateConformance {
    private TemplateConformance() {
    }

    /**
     * One locked field whose value in the budget differs from the template's.
     *
     * @param templateId the template's id
     * @param templateVersion the template's version
     * @param field the field: {@code model}, {@code outputs}, {@code settings}, {@code correlations},
     *     {@code INPUT} (a removed input), {@code INPUT.evaluation.KEY} (one key of the evaluation, e.g.
     *     {@code dI_res.evaluation.halfWidth}), or {@code INPUT.source|unit|description|notes}
     * @param templateValue the template's value as text (numbers as in the budget file; absent: empty)
     * @param budgetValue the budget's value as text (absent: empty)
     */
    public record Deviation(String templateId, int templateVersion, String field, String templateValue,
            String budgetValue) {
        public Deviation {
            Objects.requireNonNull(templateId, "templateId");
            Objects.requireNonNull(field, "field");
            templateValue = templateValue == null ? "" : templateValue;
            budgetValue = budgetValue == null ? "" : budgetValue;
        }

        /** @return e.g. "locked field 'dI_res.evaluation.halfWidth' (template t v1): template value 0.02, budget value 0.0007" */
        public String sentence() {
            return "locked field '" + field + "' (locked by template " + templateId + " v" + templateVersion
                    + ") was changed: template value " + shown(templateValue) + ", budget value " + shown(budgetValue);
        }

        private static String shown(String v) {
            return v.isEmpty() ? "(none)" : v;
        }
    }

    /** What the check found. */
    public enum State {
        /** The budget records no template origin: nothing to check. */
        NOT_FROM_TEMPLATE,
        /** The template version the budget was made from is not in the library: its locks cannot be checked. */
        TEMPLATE_NOT_FOUND,
        /** Every locked field keeps the template's value. */
        FOLLOWS,
        /** At least one locked field was changed. */
        DEVIATES
    }

    /**
     * The outcome of {@link #check}.
     *
     * @param state what was found
     * @param origin the budget's template origin, or null
     * @param deviations the changed locked fields (empty unless {@link State#DEVIATES})
     */
    public record Finding(State state, TemplateOrigin origin, List<Deviation> deviations) {
        public Finding {
            Objects.requireNonNull(state, "state");
            deviations = List.copyOf(deviations);
        }

        /** @return whether the finding needs the user's attention: a deviation, or locks that cannot be checked */
        public boolean isFinding() {
            return state == State.DEVIATES || state == State.TEMPLATE_NOT_FOUND;
        }

        /** @return one sentence per deviation, or the sentence saying the locks cannot be checked; else empty */
        public List<String> messages() {
            if (state == State.TEMPLATE_NOT_FOUND) {
                return List.of("template " + origin.id() + " version " + origin.version() + ", which this budget "
                        + "was made from, is not in the template library: its locked fields cannot be checked");
            }
            List<String> out = new ArrayList<>();
            deviations.forEach(d -> out.add(d.sentence()));
            return out;
        }
    }

    /**
     * The finding for a template evaluated as it is: its figures are those of its example values, which a budget
     * made from it never carries over ({@link TemplateSpec#carriedValues}), so they are not a measurement's.
     *
     * @return the sentence, or empty when {@code doc} is not a template
     */
    public static Optional<String> exampleFigures(BudgetDocument doc) {
        TemplateSpec t = doc.template();
        if (t == null) {
            return Optional.empty();
        }
        return Optional.of("this file is template " + t.id() + " version " + t.version() + ": " + EXAMPLE_FIGURES
                + "; make a budget from the template and give the measurement's values");
    }

    /** The words of {@link #exampleFigures} that say what a template's figures are. */
    public static final String EXAMPLE_FIGURES = "its figures are those of the template's example values, not of a "
            + "measurement";

    /**
     * Checks a document against the template version it was made from, as found in {@code library}.
     *
     * @throws IOException when a folder of the library cannot be read
     */
    public static Finding check(BudgetDocument doc, TemplateLibrary library) throws IOException {
        TemplateOrigin o = doc.templateOrigin();
        if (o == null) {
            return new Finding(State.NOT_FROM_TEMPLATE, null, List.of());
        }
        Optional<TemplateLibrary.Entry> e = library.find(o.id(), o.version());
        if (e.isEmpty()) {
            return new Finding(State.TEMPLATE_NOT_FOUND, o, List.of());
        }
        List<Deviation> d = deviations(e.get().template(), doc.budget());
        return new Finding(d.isEmpty() ? State.FOLLOWS : State.DEVIATES, o, d);
    }

    /** @return the locked fields of {@code template} that {@code doc} changed, in budget order */
    public static List<Deviation> deviations(Template template, Budget doc) {
        return deviations(template.spec(), template.document().budget(), doc);
    }

    /**
     * @param spec the template's section (its id, version and locks)
     * @param template the template's budget
     * @param doc a budget made from it
     * @return the locked fields whose value in {@code doc} differs from {@code template}: model, outputs,
     *     settings, correlations, then input by input
     */
    public static List<Deviation> deviations(TemplateSpec spec, Budget template, Budget doc) {
        List<Deviation> out = new ArrayList<>();
        List<String> locked = spec.locked();
        String id = spec.id();
        int v = spec.version();
        if (locked.contains("model") && !template.model().equals(doc.model())) {
            out.add(new Deviation(id, v, "model", template.model(), doc.model()));
        }
        JsonObject tj = BudgetJson.toJson(template);
        JsonObject dj = BudgetJson.toJson(doc);
        for (String part : List.of("outputs", "settings", "correlations")) {
            if (!locked.contains(part)) {
                continue;
            }
            String a = text(tj.get(part));
            String b = text(dj.get(part));
            if (!a.equals(b)) {
                out.add(new Deviation(id, v, part, a, b));
            }
        }
        for (InputQuantity t : template.inputs()) {
            String n = t.name();
            boolean all = locked.contains(n);
            boolean any = all || locked.stream().anyMatch(l -> l.startsWith(n + "."));
            if (!any) {
                continue;
            }
            InputQuantity d = doc.input(n);
            if (d == null) {
                out.add(new Deviation(id, v, n, text(BudgetJson.evaluationJson(t.evaluation())), ""));
                continue;
            }
            if (all || locked.contains(n + ".evaluation")) {
                evaluation(out, id, v, n, t, d, null);
            } else if (locked.contains(n + ".estimate")) {
                evaluation(out, id, v, n, t, d, Set.of("estimate", "mean"));
            }
            text(out, id, v, n, "source", all, locked, t.source(), d.source());
            text(out, id, v, n, "unit", all, locked, t.unit(), d.unit());
            text(out, id, v, n, "description", all, locked, t.description(), d.description());
            text(out, id, v, n, "notes", all, locked, t.notes(), d.notes());
        }
        return out;
    }

    /** Adds one deviation per key of the evaluation that differs ({@code only}: just these keys, null: all). */
    private static void evaluation(List<Deviation> out, String id, int v, String n, InputQuantity t,
            InputQuantity d, Set<String> only) {
        JsonObject a = BudgetJson.evaluationJson(t.evaluation());
        JsonObject b = BudgetJson.evaluationJson(d.evaluation());
        if (a.equals(b)) {
            return;
        }
        Set<String> keys = new LinkedHashSet<>(a.keySet());
        keys.addAll(b.keySet());
        for (String k : keys) {
            if (only != null && !only.contains(k)) {
                continue;
            }
            String x = a.containsKey(k) ? text(a.get(k)) : "";
            String y = b.containsKey(k) ? text(b.get(k)) : "";
            if (!x.equals(y)) {
                out.add(new Deviation(id, v, n + ".evaluation." + k, x, y));
            }
        }
    }

    private static void text(List<Deviation> out, String id, int v, String n, String field, boolean all,
            List<String> locked, String a, String b) {
        if ((all || locked.contains(n + "." + field)) && !a.equals(b)) {
            out.add(new Deviation(id, v, n + "." + field, a, b));
        }
    }

    private static String text(JsonValue v) {
        if (v == null) {
            return "";
        }
        if (v.getValueType() == JsonValue.ValueType.STRING) {
            return ((jakarta.json.JsonString) v).getString();
        }
        if (v.getValueType() == JsonValue.ValueType.NUMBER) {
            return ((jakarta.json.JsonNumber) v).bigDecimalValue().stripTrailingZeros().toPlainString();
        }
        return CanonicalJson.write(v);
    }
}
