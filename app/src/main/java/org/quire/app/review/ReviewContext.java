package org.quire.app.review;

import org.quire.engine.document.TemplateConformance;
import org.quire.engine.montecarlo.MonteCarloOutcome;

/**
 * What the checklist uses beyond the budget and its GUM result, when other parts of Quire provide it.
 *
 * @param monteCarlo the Monte Carlo summary with its comparison with the GUM result, or null when not run
 * @param units the unit checker, or null when none is available
 * @param template the engine's check of the budget against the template it was made from
 *     ({@link TemplateConformance#check}), or null when not checked
 * @param templateExample the engine's finding that the document is a template evaluated as it is
 *     ({@link TemplateConformance#exampleFigures}), or null when it is not one or was not looked at
 */
public record ReviewContext(MonteCarloOutcome monteCarlo, UnitChecker units, TemplateConformance.Finding template,
        String templateExample) {

    /** A context without a template check. */
    public ReviewContext(MonteCarloOutcome monteCarlo, UnitChecker units) {
        this(monteCarlo, units, null, null);
    }

    /** @return a context with neither a Monte Carlo result nor a unit checker */
    public static ReviewContext none() {
        return new ReviewContext(null, null, null, null);
    }

    public ReviewContext withMonteCarlo(MonteCarloOutcome mc) {
        return new ReviewContext(mc, units, template, templateExample);
    }

    public ReviewContext withUnits(UnitChecker u) {
        return new ReviewContext(monteCarlo, u, template, templateExample);
    }

    /** @param f the template check of the budget's document */
    public ReviewContext withTemplate(TemplateConformance.Finding f) {
        return new ReviewContext(monteCarlo, units, f, templateExample);
    }

    /**
     * @param doc the budget's document: when it is a template evaluated as it is, the checklist says its figures
     *     are the template's example values
     */
    public ReviewContext withDocument(org.quire.engine.document.BudgetDocument doc) {
        return new ReviewContext(monteCarlo, units, template, TemplateConformance.exampleFigures(doc).orElse(null));
    }
}
