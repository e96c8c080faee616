package org.quire.app.review;

import java.util.List;
import org.quire.engine.budget.Budget;

/**
 * Checks that a budget's units are consistent with its model: each equation's sides of one dimension, each
 * unit known. This is the seam to org.quire.engine.units; until it is wired the checklist reports the item
 * as not run. Implementations must be thread-safe.
 */
@FunctionalInterface
public interface UnitChecker {

    /** @return one sentence per inconsistency, naming the equation or input; empty when the units agree */
    List<String> problems(Budget budget);
}
