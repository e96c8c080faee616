package org.quire.engine.document;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.regex.Pattern;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;

/**
 * What makes a budget document a template: its identifier and version, the parameters the user supplies,
 * the fields the method locks, and guidance text per input. Stored in the {@code template} section of a
 * budget file.
 *
 * <p>A locked field is written as {@code model}, {@code outputs}, {@code settings}, {@code correlations}, an
 * input name (the whole input), or {@code INPUT.FIELD} with FIELD one of {@link #INPUT_FIELDS}.
 *
 * <p>Immutable and thread-safe.
 */
public final class TemplateSpec {
    /** The fields of an input that can be locked one by one. */
    public static final List<String> INPUT_FIELDS = List.of("evaluation", "estimate", "source", "unit",
            "description", "notes");
    /** The parts of a budget other than inputs that can be locked. */
    public static final List<String> BUDGET_PARTS = List.of("model", "outputs", "settings", "correlations");
    private static final Pattern ID = Pattern.compile("[a-z0-9][a-z0-9._-]{0,63}");

    private final String id;
    private final int version;
    private final String description;
    private final List<TemplateParameter> parameters;
    private final List<String> locked;
    private final Map<String, String> guidance;

    private TemplateSpec(String id, int version, String description, List<TemplateParameter> parameters,
            List<String> locked, Map<String, String> guidance) {
        this.id = id;
        this.version = version;
        this.description = description;
        this.parameters = List.copyOf(parameters);
        this.locked = List.copyOf(locked);
        this.guidance = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(guidance));
        Set<String> names = new HashSet<>();
        for (TemplateParameter p : this.parameters) {
            if (!names.add(p.name())) {
                throw new IllegalArgumentException("template parameter '" + p.name() + "' is listed twice");
            }
        }
    }

    /** @throws IllegalArgumentException when {@code id} is not 1 to 64 of a-z, 0-9, '.', '_', '-' */
    public static void checkId(String id) {
        if (id == null || !ID.matcher(id).matches()) {
            throw new IllegalArgumentException("template id '" + id + "' must be 1 to 64 lowercase letters, digits, "
                    + "'.', '_' or '-', starting with a letter or digit");
        }
    }

    /**
     * @param id the identifier, e.g. {@code tvfl-gravimetric-water}
     * @param version at least 1; a changed template gets a higher version
     */
    public static TemplateSpec of(String id, int version) {
        checkId(id);
        if (version < 1) {
            throw new IllegalArgumentException("template version must be 1 or more, not " + version);
        }
        return new TemplateSpec(id, version, "", List.of(), List.of(), Map.of());
    }

    public TemplateSpec withVersion(int v) {
        return of(id, v).withDescription(description).withParameters(parameters).withLocked(locked)
                .withGuidance(guidance);
    }

    public TemplateSpec withDescription(String v) {
        return new TemplateSpec(id, version, v == null ? "" : v, parameters, locked, guidance);
    }

    public TemplateSpec withParameters(List<TemplateParameter> v) {
        return new TemplateSpec(id, version, description, Objects.requireNonNull(v, "parameters"), locked, guidance);
    }

    public TemplateSpec withLocked(List<String> v) {
        return new TemplateSpec(id, version, description, parameters, Objects.requireNonNull(v, "locked"), guidance);
    }

    /** @param v guidance text per input name */
    public TemplateSpec withGuidance(Map<String, String> v) {
        return new TemplateSpec(id, version, description, parameters, locked, Objects.requireNonNull(v, "guidance"));
    }

    public String id() { return id; }
    public int version() { return version; }
    public String description() { return description; }
    public List<TemplateParameter> parameters() { return parameters; }
    public List<String> locked() { return locked; }
    /** @return guidance text per input name, in entry order */
    public Map<String, String> guidance() { return guidance; }

    /** @return the parameter of that name, or null */
    public TemplateParameter parameter(String name) {
        for (TemplateParameter p : parameters) {
            if (p.name().equals(name)) {
                return p;
            }
        }
        return null;
    }

    /** @return whether the field ({@code model}, {@code INPUT} or {@code INPUT.FIELD}) is locked */
    public boolean isLocked(String input, String field) {
        return isLocked(locked, input, field);
    }

    /**
     * The one rule of what a list of locked fields covers: the whole input, the field itself, or, for the
     * estimate, the evaluation it belongs to.
     *
     * @param locked locked fields as in {@link #locked()}
     * @param input an input name
     * @param field one of {@link #INPUT_FIELDS}
     * @return whether {@code locked} covers that field of that input
     */
    public static boolean isLocked(List<String> locked, String input, String field) {
        return locked.contains(input) || locked.contains(input + "." + field)
                || (field.equals("estimate") && locked.contains(input + ".evaluation"));
    }

    /**
     * Checks the template against its budget: every parameter, lock and guidance names an input the budget has,
     * each parameter's default can be applied, and no parameter sets a locked field.
     *
     * @return the problems found, each a sentence; empty when the template is consistent
     */
    public List<String> problems(Budget b) {
        List<String> out = new ArrayList<>();
        for (TemplateParameter p : parameters) {
            try {
                if (p.isReadings()) {
                    p.readingsIn(b);
                    String f = "evaluation";
                    if (isLocked(p.input(), f)) {
                        out.add("parameter '" + p.name() + "' sets the readings of input '" + p.input()
                                + "', which the template locks");
                    }
                    continue;
                }
                p.valueIn(b);
                if (p.hasDefault()) {
                    p.applyTo(b, p.defaultValue());
                }
            } catch (IllegalArgumentException e) {
                out.add(e.getMessage());
                continue;
            }
            String f = p.field().equals("estimate") ? "estimate" : "evaluation";
            if (isLocked(p.input(), f) || locked.contains(p.input() + ".evaluation")) {
                out.add("parameter '" + p.name() + "' sets a field of input '" + p.input() + "' that the template "
                        + "locks");
            }
        }
        for (String l : locked) {
            if (BUDGET_PARTS.contains(l)) {
                continue;
            }
            int dot = l.indexOf('.');
            String input = dot < 0 ? l : l.substring(0, dot);
            if (b.input(input) == null) {
                out.add("locked field '" + l + "' names input '" + input + "', which the budget does not have");
            } else if (dot >= 0 && !INPUT_FIELDS.contains(l.substring(dot + 1))) {
                out.add("locked field '" + l + "': '" + l.substring(dot + 1) + "' is not one of "
                        + String.join(", ", INPUT_FIELDS));
            }
        }
        for (String g : guidance.keySet()) {
            if (b.input(g) == null) {
                out.add("guidance is given for input '" + g + "', which the budget does not have");
            }
        }
        return out;
    }

    /**
     * The values of the template's example that a budget made from it would keep without the user's word: every
     * input must either be set by at least one parameter (a value of the measurement, which the user gives) or be
     * locked whole or in its evaluation (a value of the method, which the template fixes and
     * {@link TemplateConformance} enforces). The readings of a Type A evaluation, or the mean, s and n of a Type A
     * summary, always belong to one measurement: each needs its parameter (a pooled standard deviation is the
     * method's).
     *
     * @param b the template's budget
     * @return one sentence per input whose example value would be carried over; empty when none would
     */
    public List<String> carriedValues(Budget b) {
        List<String> out = new ArrayList<>();
        for (InputQuantity q : b.inputs()) {
            String n = q.name();
            Set<String> set = new HashSet<>();
            for (TemplateParameter p : parameters) {
                if (p.input().equals(n)) {
                    set.add(p.field());
                }
            }
            boolean locked = this.locked.contains(n) || this.locked.contains(n + ".evaluation");
            if (q.evaluation() instanceof org.quire.engine.budget.TypeA) {
                org.quire.engine.budget.TypeA a = (org.quire.engine.budget.TypeA) q.evaluation();
                List<String> missing = new ArrayList<>();
                if (a.readings() != null) {
                    if (!set.contains("readings")) {
                        missing.add("readings");
                    }
                } else {
                    for (String f : a.isPooled() ? List.of("estimate", "count")
                            : List.of("estimate", "standardDeviation", "count")) {
                        if (!set.contains(f)) {
                            missing.add(f);
                        }
                    }
                }
                if (!missing.isEmpty()) {
                    out.add("input '" + n + "' is a Type A evaluation, the data of one measurement, but no parameter "
                            + "sets its " + String.join(", ", missing) + ": the example's values would be carried "
                            + "into the new budget");
                }
            } else if (set.isEmpty() && !locked) {
                out.add("input '" + n + "' is neither set by a parameter nor locked: its example value ("
                        + q.evaluation().basis() + ") would be carried into the new budget; make it a parameter "
                        + "or lock it as a value of the method");
            }
        }
        return out;
    }

    /**
     * @param template the template's budget
     * @param doc a budget made from it
     * @return each locked field whose value in {@code doc} differs from the template, as a sentence
     * @see TemplateConformance#deviations
     */
    public List<String> lockViolations(Budget template, Budget doc) {
        List<String> out = new ArrayList<>();
        for (TemplateConformance.Deviation d : TemplateConformance.deviations(this, template, doc)) {
            out.add(d.sentence());
        }
        return out;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof TemplateSpec)) {
            return false;
        }
        TemplateSpec t = (TemplateSpec) o;
        return id.equals(t.id) && version == t.version && description.equals(t.description)
                && parameters.equals(t.parameters) && locked.equals(t.locked) && guidance.equals(t.guidance);
    }

    @Override
    public int hashCode() {
        return Objects.hash(id, version, parameters, locked);
    }
}
