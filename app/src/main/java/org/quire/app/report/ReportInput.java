package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;
import org.quire.engine.montecarlo.MonteCarloOutcome;

/**
 * Everything a report is built from: the budget, its GUM evaluation, the document facts, and what other parts
 * of Quire contribute when they have run: the engine's Monte Carlo outcome and further sections (calibration line and
 * conformity, flow-range table, comparison with another budget).
 *
 * @param budget the budget
 * @param gum its GUM evaluation
 * @param document header facts and revision history
 * @param monteCarlo the engine's Monte Carlo outcome, or null when the method was not run
 * @param sections further sections, in the order they are to appear
 * @param authorNotes whether the inputs' notes (the author's guidance, a template's instructions) are added as an
 *     appendix; they are never in the report's body
 * @param library the function set the budget was evaluated with (the report typesets the model compiled with it)
 *
 * <p>Immutable and thread-safe.
 */
public record ReportInput(Budget budget, GumResult gum, DocumentInfo document, MonteCarloOutcome monteCarlo,
        List<ReportSection> sections, boolean authorNotes, org.quire.engine.model.FunctionLibrary library) {
    public ReportInput {
        Objects.requireNonNull(library, "library");
        Objects.requireNonNull(budget, "budget");
        Objects.requireNonNull(gum, "gum");
        Objects.requireNonNull(document, "document");
        sections = List.copyOf(sections);
    }

    /** @param library the function set {@code gum} was evaluated with */
    public static ReportInput of(Budget budget, GumResult gum, DocumentInfo document,
            org.quire.engine.model.FunctionLibrary library) {
        return new ReportInput(budget, gum, document, null, List.of(), false, library);
    }

    public ReportInput withMonteCarlo(MonteCarloOutcome mc) {
        return new ReportInput(budget, gum, document, mc, sections, authorNotes, library);
    }

    public ReportInput withDocument(DocumentInfo d) {
        return new ReportInput(budget, gum, d, monteCarlo, sections, authorNotes, library);
    }

    /** @return a copy that adds, or does not add, the appendix of the inputs' notes */
    public ReportInput withAuthorNotes(boolean v) {
        return new ReportInput(budget, gum, document, monteCarlo, sections, v, library);
    }

    /** @return a copy with {@code section} added at the end */
    public ReportInput withSection(ReportSection section) {
        List<ReportSection> s = new ArrayList<>(sections);
        s.add(Objects.requireNonNull(section, "section"));
        return new ReportInput(budget, gum, document, monteCarlo, s, authorNotes, library);
    }
}
