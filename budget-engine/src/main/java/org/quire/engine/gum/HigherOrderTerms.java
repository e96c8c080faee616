package org.quire.engine.gum;

/**
 * Whether the higher-order terms of the law of propagation of uncertainty are in an output's u_c(y).
 *
 * <p>References: JCGM 100:2008 5.1.2 note (the terms of next highest order for normal inputs).
 */
public enum HigherOrderTerms {
    /** The settings did not ask for them: u_c(y) is the first-order law of propagation. */
    NOT_REQUESTED("not requested"),
    /**
     * Included: JCGM 100:2008 5.1.2 note for uncorrelated inputs; for correlated normal inputs its general form
     * with the covariance matrix V, (1/2) tr(H V H V) + sum g_l V_li f_ijk V_jk (summed over repeated indices).
     */
    INCLUDED("included"),
    /**
     * Asked for but not included: some correlated inputs are not normal, for which the higher moments the terms
     * need are not given by the covariance alone. u_c(y) is then the first-order law of propagation.
     */
    NOT_INCLUDED("not included: correlated inputs that are not normal");

    private final String text;

    HigherOrderTerms(String text) {
        this.text = text;
    }

    /** @return the words shown in tables, reports and JSON, e.g. "included" */
    public String text() {
        return text;
    }
}
