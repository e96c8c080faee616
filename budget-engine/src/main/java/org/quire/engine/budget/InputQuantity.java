package org.quire.engine.budget;

import java.util.Objects;
import java.util.regex.Pattern;

/**
 * An input quantity X_i of a measurement model: its name in the model, what it is, its unit, where its value
 * comes from, and how its estimate and standard uncertainty were evaluated.
 *
 * <p>Immutable and thread-safe; change with the {@code with...} methods.
 */
public final class InputQuantity {
    private static final Pattern NAME = Pattern.compile("[\\p{L}_][\\p{L}\\p{N}_]*");

    private final String name;
    private final String description;
    private final String unit;
    private final String source;
    private final String notes;
    private final Evaluation evaluation;

    private InputQuantity(String name, String description, String unit, String source, String notes,
            Evaluation evaluation) {
        this.name = name;
        this.description = description;
        this.unit = unit;
        this.source = source;
        this.notes = notes;
        this.evaluation = evaluation;
    }

    /**
     * @param name the name used in the model: a letter or underscore followed by letters, digits, underscores
     * @param evaluation its Type A or Type B evaluation
     */
    public static InputQuantity of(String name, Evaluation evaluation) {
        checkName(name);
        Objects.requireNonNull(evaluation, "evaluation");
        if (evaluation instanceof TypeA) {
            ((TypeA) evaluation).validated();
        }
        return new InputQuantity(name, "", "", "", "", evaluation);
    }

    /** @throws IllegalArgumentException when {@code name} cannot be used in a model */
    public static void checkName(String name) {
        if (name == null || !NAME.matcher(name).matches()) {
            throw new IllegalArgumentException("input name '" + name + "' is not a valid name: use a letter or '_' "
                    + "followed by letters, digits or '_'");
        }
        if (name.equals("pi")) {
            throw new IllegalArgumentException("'pi' is the constant 3.14159...; choose another input name");
        }
    }

    public InputQuantity withDescription(String v) { return new InputQuantity(name, text(v), unit, source, notes, evaluation); }
    public InputQuantity withUnit(String v) { return new InputQuantity(name, description, text(v), source, notes, evaluation); }
    public InputQuantity withSource(String v) { return new InputQuantity(name, description, unit, text(v), notes, evaluation); }
    public InputQuantity withNotes(String v) { return new InputQuantity(name, description, unit, source, text(v), evaluation); }
    /** @return a copy with the evaluation replaced (checked as {@link #of} checks it; the name is already valid) */
    public InputQuantity withEvaluation(Evaluation v) {
        Objects.requireNonNull(v, "evaluation");
        if (v instanceof TypeA) {
            ((TypeA) v).validated();
        }
        return new InputQuantity(name, description, unit, source, notes, v);
    }
    public InputQuantity withName(String v) { checkName(v); return new InputQuantity(v, description, unit, source, notes, evaluation); }

    private static String text(String v) {
        return v == null ? "" : v;
    }

    public String name() { return name; }
    public String description() { return description; }
    public String unit() { return unit; }
    /** @return where the value comes from: certificate, handbook, study, specification */
    public String source() { return source; }
    public String notes() { return notes; }
    public Evaluation evaluation() { return evaluation; }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof InputQuantity)) {
            return false;
        }
        InputQuantity q = (InputQuantity) o;
        return name.equals(q.name) && description.equals(q.description) && unit.equals(q.unit)
                && source.equals(q.source) && notes.equals(q.notes) && evaluation.equals(q.evaluation);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, description, unit, source, notes, evaluation);
    }

    @Override
    public String toString() {
        return name + " (" + evaluation + ")";
    }
}
