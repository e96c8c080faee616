package org.quire.engine.gum;

import java.util.ArrayList;
import java.util.List;
import org.quire.engine.units.Conversion;

/**
 * The GUM result for one output: estimate, combined standard uncertainty, effective degrees of freedom,
 * coverage factor and expanded uncertainty, with the budget rows behind them.
 *
 * @param name the output's name
 * @param unit the unit the numbers of this result are in, as text: the output's display unit when one is
 *     chosen, else its unit
 * @param estimate y = f(x_1, ..., x_N) (JCGM 100:2008 4.1.4)
 * @param standardUncertainty u_c(y), including correlation and (when chosen) higher-order terms
 * @param correlationVariance the sum of the correlation terms in u_c^2(y)
 * @param higherOrderVariance the higher-order terms added to u_c^2(y) (JCGM 100:2008 5.1.2 note), 0 if none
 * @param higherOrderTerms whether those terms are included, or why not
 * @param effectiveDof nu_eff by Welch–Satterthwaite (JCGM 100:2008 G.4.1, eq. G.2b); infinite when every nu_i is
 * @param dofUsed the degrees of freedom used for k (nu_eff truncated to an integer unless settings say otherwise)
 * @param coverageFactor k
 * @param coverageProbability p (the chosen one, or the one a fixed k gives at dofUsed)
 * @param expandedUncertainty U = k u_c(y) (JCGM 100:2008 6.2.1)
 * @param contributions one row per input, in budget order
 * @param correlationTerms one per correlated pair with a non-zero term
 * @param warnings sentences about limits of the result (correlated inputs and Welch–Satterthwaite, ...)
 */
public record OutputResult(String name, String unit, double estimate, double standardUncertainty,
        double correlationVariance, double higherOrderVariance, HigherOrderTerms higherOrderTerms, double effectiveDof, double dofUsed,
        double coverageFactor, double coverageProbability, double expandedUncertainty,
        List<Contribution> contributions, List<CorrelationTerm> correlationTerms, List<String> warnings) {

    public OutputResult {
        if (higherOrderTerms == null) {
            throw new IllegalArgumentException("higherOrderTerms must be given");
        }
        contributions = List.copyOf(contributions);
        correlationTerms = List.copyOf(correlationTerms);
        warnings = List.copyOf(warnings);
    }

    /** @return U / |y|, NaN when y = 0 */
    public double relativeExpandedUncertainty() {
        return estimate == 0 ? Double.NaN : expandedUncertainty / Math.abs(estimate);
    }

    /** @return u_c / |y|, NaN when y = 0 */
    public double relativeStandardUncertainty() {
        return estimate == 0 ? Double.NaN : standardUncertainty / Math.abs(estimate);
    }

    /**
     * Expresses this result in another unit of the same dimension: the estimate converts as a value (a
     * temperature point: 20 °C is 293.15 K), u_c, U, the contributions u_i(y) and the sensitivity coefficients'
     * numerators as differences (0.1 °C is 0.1 K), the variance terms with the factor squared; degrees of
     * freedom, k, p and shares do not change.
     *
     * <p>References: NIST SP 811 (2008) clause 4.2.1.1 (temperature points and intervals); JCGM 100:2008 5.1.3
     * (c_i = df/dx_i has the unit of y over that of x_i).
     *
     * @param shownUnit the unit's text, as it will be shown
     * @param c the conversion from this result's unit to {@code shownUnit}
     * @return the converted result
     */
    public OutputResult inUnit(String shownUnit, Conversion c) {
        List<Contribution> rows = new ArrayList<>();
        for (Contribution r : contributions) {
            rows.add(new Contribution(r.input(), r.unit(), r.estimate(), r.standardUncertainty(),
                    c.difference(r.sensitivity()), c.difference(r.contribution()), r.dof(), r.share(), r.type(),
                    r.distribution()));
        }
        List<CorrelationTerm> terms = new ArrayList<>();
        for (CorrelationTerm t : correlationTerms) {
            terms.add(new CorrelationTerm(t.first(), t.second(), t.r(), c.variance(t.variance())));
        }
        return new OutputResult(name, shownUnit, c.point(estimate), c.difference(standardUncertainty),
                c.variance(correlationVariance), c.variance(higherOrderVariance), higherOrderTerms, effectiveDof, dofUsed,
                coverageFactor, coverageProbability, c.difference(expandedUncertainty), rows, terms, warnings);
    }

    /** @return the row of the input named, or null */
    public Contribution contribution(String input) {
        for (Contribution c : contributions) {
            if (c.input().equals(input)) {
                return c;
            }
        }
        return null;
    }
}
