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
 */
public record ReviewContext(MonteCarloOutcome monteCarlo, UnitChecker units, TemplateConformance.Finding template) {

    /** A context without a template check. */
    public ReviewContext(MonteCarloOutcome monteCarlo, UnitChecker units) {
        this(monteCarlo, units, null);
    }

    /** @return a context with neither a Monte Carlo result nor a unit checker */
    public static ReviewContext none() {
        return new ReviewContext(null, null, null);
    }

    public ReviewContext withMonteCarlo(MonteCarloOutcome mc) {
        return new ReviewContext(mc, units, template);
    }

    public ReviewContext withUnits(UnitChecker u) {
        return new ReviewContext(monteCarlo, u, template);
    }

    /** @param f the template check of the budget's document */
    public ReviewContext withTemplate(TemplateConformance.Finding f) {
        return new ReviewContext(monteCarlo, units, f);
    }
}
