package org.quire.app.review;

import org.quire.engine.montecarlo.MonteCarloOutcome;

/**
 * What the checklist uses beyond the budget and its GUM result, when other parts of Quire provide it.
 *
 * @param monteCarlo the Monte Carlo summary with its comparison with the GUM result, or null when not run
 * @param units the unit checker, or null when none is available
 */
public record ReviewContext(MonteCarloOutcome monteCarlo, UnitChecker units) {

    /** @return a context with neither a Monte Carlo result nor a unit checker */
    public static ReviewContext none() {
        return new ReviewContext(null, null);
    }

    public ReviewContext withMonteCarlo(MonteCarloOutcome mc) {
        return new ReviewContext(mc, units);
    }

    public ReviewContext withUnits(UnitChecker u) {
        return new ReviewContext(monteCarlo, u);
    }
}
