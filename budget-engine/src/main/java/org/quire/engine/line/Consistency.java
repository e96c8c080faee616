package org.quire.engine.line;

/**
 * The verdict of the chi-squared check of a fitted line: are the residuals consistent with the stated
 * uncertainties?
 *
 * <p>References: ISO/TS 28037:2010 6.3 (and 7, 8): the model is accepted when the observed chi-squared value
 * does not exceed the 95 % quantile of the chi-squared distribution with nu = n - 2 degrees of freedom.
 */
public enum Consistency {
    /** The observed chi-squared value does not exceed the quantile. */
    CONSISTENT("consistent"),
    /** The observed chi-squared value exceeds the quantile: line or uncertainties in doubt. */
    INCONSISTENT("inconsistent"),
    /** No uncertainties to check against (ordinary least squares without stated u(y)). */
    NOT_ASSESSED("not assessed");

    private final String label;

    Consistency(String label) {
        this.label = label;
    }

    /** @return the word for reports */
    public String label() {
        return label;
    }
}
