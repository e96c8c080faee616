package org.quire.engine.line;

/**
 * How a straight line y = a + b (x - x0) is fitted to calibration data.
 *
 * <p>References:
 * <ul>
 *   <li>JCGM 100:2008 (GUM) H.3: ordinary least squares with the scatter estimated from the residuals,
 *   s^2 = sum r_i^2 / (n - 2), nu = n - 2 (equations H.13 to H.16).</li>
 *   <li>ISO/TS 28037:2010 clause 6: weighted least squares with known u(y_i), weights w_i = 1 / u(y_i).</li>
 *   <li>ISO/TS 28037:2010 clause 7: generalized distance regression (uncertainties in x and y), solved by the
 *   Gauss-Newton iteration of that clause.</li>
 *   <li>ISO/TS 28037:2010 clause 8: Gauss-Markov regression (correlated y values with covariance matrix U_y,
 *   exact x), via the Cholesky factor of U_y.</li>
 * </ul>
 */
public enum LineMethod {
    /** Ordinary least squares; u(a), u(b) from the residual scatter s with nu = n - 2. Uses no u(x), u(y). */
    ORDINARY_LEAST_SQUARES("ordinary least squares", "OLS", false, false, false),
    /** Weighted least squares with known u(y_i) &gt; 0; x exact. ISO/TS 28037 clause 6. */
    WEIGHTED_LEAST_SQUARES("weighted least squares", "WLS", true, false, false),
    /**
     * Generalized distance regression: u(y_i) &gt; 0 and u(x_i) &ge; 0, uncorrelated. ISO/TS 28037 clause 7.
     */
    GENERALIZED_DISTANCE("generalized distance regression", "GDR", true, true, false),
    /** Gauss-Markov regression: covariance matrix of the y values; x exact. ISO/TS 28037 clause 8. */
    GAUSS_MARKOV("Gauss-Markov regression", "GMR", false, false, true);

    private final String title;
    private final String abbreviation;
    private final boolean needsUy;
    private final boolean usesUx;
    private final boolean needsCovariance;

    LineMethod(String title, String abbreviation, boolean needsUy, boolean usesUx, boolean needsCovariance) {
        this.title = title;
        this.abbreviation = abbreviation;
        this.needsUy = needsUy;
        this.usesUx = usesUx;
        this.needsCovariance = needsCovariance;
    }

    /** @return the name for reports, e.g. "weighted least squares" */
    public String title() {
        return title;
    }

    /** @return the abbreviation of ISO/TS 28037 (OLS for ordinary least squares), e.g. "WLS" */
    public String abbreviation() {
        return abbreviation;
    }

    /** @return whether every point must state u(y) &gt; 0 */
    public boolean needsUy() {
        return needsUy;
    }

    /** @return whether the method uses u(x) */
    public boolean usesUx() {
        return usesUx;
    }

    /** @return whether the data set must carry a covariance matrix of the y values */
    public boolean needsCovariance() {
        return needsCovariance;
    }

    /**
     * @param text a method's abbreviation (OLS, WLS, GDR, GMR) or its enum name, case ignored
     * @return the method
     * @throws IllegalArgumentException listing the accepted names
     */
    public static LineMethod parse(String text) {
        if (text != null) {
            String t = text.strip();
            for (LineMethod m : values()) {
                if (m.abbreviation.equalsIgnoreCase(t) || m.name().equalsIgnoreCase(t)) {
                    return m;
                }
            }
        }
        throw new IllegalArgumentException("unknown line-fitting method '" + text
                + "'; expected one of OLS, WLS, GDR, GMR");
    }
}
