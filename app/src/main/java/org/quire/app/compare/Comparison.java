package org.quire.app.compare;

import java.util.List;
import java.util.Objects;
import org.quire.engine.budget.InputQuantity;

/**
 * What differs between budget A and budget B, and the effect on each output's expanded uncertainty. The
 * command line prints it ({@link ComparisonText}), a report includes it ({@link ComparisonSection}), the
 * workbench can show it side by side (the model's {@link LineEdit}s carry both line numbers).
 *
 * @param titleA the title of A
 * @param titleB the title of B
 * @param budgetChanges title and notes
 * @param inputsAdded inputs only in B, in B's order
 * @param inputsRemoved inputs only in A, in A's order
 * @param inputsChanged inputs in both whose fields differ, in A's order
 * @param outputsAdded names of outputs only in B
 * @param outputsRemoved names of outputs only in A
 * @param outputsChanged outputs in both whose unit or description differ
 * @param model the model texts line by line
 * @param correlations correlations added, removed or changed, one change per pair
 * @param settings evaluation settings that differ
 * @param otherFields fields of the budget files this version does not interpret that differ
 * @param effects per output of A or B: y, U and k in each
 * @param problemA why A could not be evaluated, or "" when it was
 * @param problemB why B could not be evaluated, or ""
 *
 * <p>Immutable and thread-safe.
 */
public record Comparison(String titleA, String titleB, List<FieldChange> budgetChanges, List<InputQuantity> inputsAdded,
        List<InputQuantity> inputsRemoved, List<QuantityChange> inputsChanged, List<String> outputsAdded,
        List<String> outputsRemoved, List<QuantityChange> outputsChanged, List<LineEdit> model,
        List<FieldChange> correlations, List<FieldChange> settings, List<FieldChange> otherFields,
        List<OutputEffect> effects, String problemA, String problemB) {

    public Comparison {
        Objects.requireNonNull(titleA, "titleA");
        Objects.requireNonNull(titleB, "titleB");
        budgetChanges = List.copyOf(budgetChanges);
        inputsAdded = List.copyOf(inputsAdded);
        inputsRemoved = List.copyOf(inputsRemoved);
        inputsChanged = List.copyOf(inputsChanged);
        outputsAdded = List.copyOf(outputsAdded);
        outputsRemoved = List.copyOf(outputsRemoved);
        outputsChanged = List.copyOf(outputsChanged);
        model = List.copyOf(model);
        correlations = List.copyOf(correlations);
        settings = List.copyOf(settings);
        otherFields = List.copyOf(otherFields);
        effects = List.copyOf(effects);
        problemA = problemA == null ? "" : problemA;
        problemB = problemB == null ? "" : problemB;
    }

    /** @return whether the model texts differ */
    public boolean modelChanged() {
        return model.stream().anyMatch(e -> e.kind() != LineEdit.Kind.KEPT);
    }

    /** @return whether the two budgets have the same content */
    public boolean identical() {
        return budgetChanges.isEmpty() && inputsAdded.isEmpty() && inputsRemoved.isEmpty() && inputsChanged.isEmpty()
                && outputsAdded.isEmpty() && outputsRemoved.isEmpty() && outputsChanged.isEmpty() && !modelChanged()
                && correlations.isEmpty() && settings.isEmpty() && otherFields.isEmpty();
    }
}
