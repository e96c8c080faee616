package org.quire.engine.line;

import java.util.List;

/**
 * The result of fitting a straight line y = a + b (x - x0) to a calibration data set: intercept a (the value
 * at x = x0), slope b, their standard uncertainties and covariance, residuals, and the chi-squared check.
 * Built by {@link LineFitter#fit}; immutable and thread-safe (arrays are copied out).
 *
 * <p>Residuals are r_i = y_i - a - b (x_i - x0). Standardized residuals are, per method: r_i / s (ordinary
 * least squares; zero when s = 0); r_i / u(y_i) (weighted least squares); r_i / sqrt(u^2(y_i) + b^2 u^2(x_i))
 * (generalized distance regression); the components of L^-1 r with U_y = L L^T (Gauss-Markov). For the last
 * three their sum of squares is the observed chi-squared value.
 *
 * <p>References: ISO/TS 28037:2010 6.3, 6.6, 7.3, 8.3 (estimates, uncertainties, validation, use of the
 * line); JCGM 100:2008 H.3 (the ordinary least-squares line, equations H.13 to H.16, and its use at t).
 */
public final class LineFit {
    private final CalibrationData data;
    private final LineMethod method;
    private final double referenceX;
    private final double intercept;
    private final double slope;
    private final double uIntercept;
    private final double uSlope;
    private final double covariance;
    private final double[] residuals;
    private final double[] standardizedResiduals;
    private final double chiSquared;
    private final double chiSquaredQuantile;
    private final double consistencyProbability;
    private final double residualStandardDeviation;
    private final int iterations;
    private final List<String> notes;

    LineFit(CalibrationData data, LineMethod method, double referenceX, double intercept, double slope,
            double uIntercept, double uSlope, double covariance, double[] residuals, double[] standardizedResiduals,
            double chiSquared, double chiSquaredQuantile, double consistencyProbability,
            double residualStandardDeviation, int iterations, List<String> notes) {
        this.data = data;
        this.method = method;
        this.referenceX = referenceX;
        this.intercept = intercept;
        this.slope = slope;
        this.uIntercept = uIntercept;
        this.uSlope = uSlope;
        this.covariance = covariance;
        this.residuals = residuals;
        this.standardizedResiduals = standardizedResiduals;
        this.chiSquared = chiSquared;
        this.chiSquaredQuantile = chiSquaredQuantile;
        this.consistencyProbability = consistencyProbability;
        this.residualStandardDeviation = residualStandardDeviation;
        this.iterations = iterations;
        this.notes = List.copyOf(notes);
    }

    /** @return the data set the line was fitted to */
    public CalibrationData data() {
        return data;
    }

    /** @return the fitting method */
    public LineMethod method() {
        return method;
    }

    /** @return the reference x0 of y = a + b (x - x0); 0 unless chosen */
    public double referenceX() {
        return referenceX;
    }

    /** @return the intercept a, the line's value at x = x0 */
    public double intercept() {
        return intercept;
    }

    /** @return the slope b (for a flow meter, the calibration constant in units of y per unit of x) */
    public double slope() {
        return slope;
    }

    /** @return u(a) */
    public double interceptUncertainty() {
        return uIntercept;
    }

    /** @return u(b) */
    public double slopeUncertainty() {
        return uSlope;
    }

    /** @return cov(a, b) */
    public double covariance() {
        return covariance;
    }

    /** @return r(a, b) = cov(a, b) / (u(a) u(b)); zero when either uncertainty is zero */
    public double correlation() {
        double d = uIntercept * uSlope;
        return d > 0 ? covariance / d : 0.0;
    }

    /** @return the residuals r_i = y_i - a - b (x_i - x0), in the order of the points */
    public double[] residuals() {
        return residuals.clone();
    }

    /** @return the standardized residuals (see the class description for their definition per method) */
    public double[] standardizedResiduals() {
        return standardizedResiduals.clone();
    }

    /**
     * @return the observed chi-squared value; for ordinary least squares it is sum (r_i / u(y_i))^2 when every
     *     point states u(y), otherwise NaN
     */
    public double chiSquared() {
        return chiSquared;
    }

    /** @return nu = n - 2: the degrees of freedom of the chi-squared check and of s */
    public int dof() {
        return residuals.length - 2;
    }

    /** @return the quantile of chi-squared(nu) at {@link #consistencyProbability()} (95 % by default) */
    public double chiSquaredQuantile() {
        return chiSquaredQuantile;
    }

    /** @return the probability of the chi-squared quantile, 0.95 unless chosen */
    public double consistencyProbability() {
        return consistencyProbability;
    }

    /** @return the verdict of the chi-squared check */
    public Consistency consistency() {
        if (Double.isNaN(chiSquared)) {
            return Consistency.NOT_ASSESSED;
        }
        return chiSquared <= chiSquaredQuantile ? Consistency.CONSISTENT : Consistency.INCONSISTENT;
    }

    /** @return s = sqrt(sum r_i^2 / (n - 2)) for ordinary least squares, NaN for the other methods */
    public double residualStandardDeviation() {
        return residualStandardDeviation;
    }

    /**
     * @return the degrees of freedom of u(a), u(b) and cov(a, b): n - 2 for ordinary least squares (they come
     *     from s), infinite for the other methods (they come from stated uncertainties)
     */
    public double uncertaintyDof() {
        return method == LineMethod.ORDINARY_LEAST_SQUARES ? dof() : Double.POSITIVE_INFINITY;
    }

    /** @return the Gauss-Newton iterations used (generalized distance regression), 0 for the direct methods */
    public int iterations() {
        return iterations;
    }

    /** @return remarks on data the method did not use (e.g. stated u(x) with weighted least squares) */
    public List<String> notes() {
        return notes;
    }

    /**
     * Forward use: the line's value at x and its standard uncertainty from u(a), u(b) and cov(a, b),
     * u^2(y) = u^2(a) + (x - x0)^2 u^2(b) + 2 (x - x0) cov(a, b).
     *
     * <p>References: JCGM 100:2008 H.3.4 (equation H.16, the correction at t); ISO/TS 28037:2010 6.6.
     *
     * @param x the stimulus (a finite number)
     * @return y at x with degrees of freedom {@link #uncertaintyDof()}
     */
    public LineEstimate valueAt(double x) {
        if (!Double.isFinite(x)) {
            throw new IllegalArgumentException(LineMessages.notFinite("x", x));
        }
        double d = x - referenceX;
        double u2 = uIntercept * uIntercept + d * d * uSlope * uSlope + 2 * d * covariance;
        return LineEstimate.of(intercept + slope * d, Math.sqrt(Math.max(0.0, u2)), uncertaintyDof());
    }

    /**
     * Inverse use with an indication whose uncertainty is exactly known (infinite degrees of freedom).
     *
     * @see #inverse(double, double, double)
     */
    public LineEstimate inverse(double y0, double uy0) {
        return inverse(y0, uy0, Double.POSITIVE_INFINITY);
    }

    /**
     * Inverse use: the stimulus x for a new indication y0 with standard uncertainty u(y0),
     * x = x0 + (y0 - a) / b, with
     * u^2(x) = [u^2(y0) + u^2(a) + (x - x0)^2 u^2(b) + 2 (x - x0) cov(a, b)] / b^2.
     * The degrees of freedom combine those of the line and of u(y0) by the Welch-Satterthwaite formula.
     *
     * <p>References: ISO/TS 28037:2010 6.6 (prediction of x from a measured y); JCGM 100:2008 G.4.1
     * (Welch-Satterthwaite formula, equation G.2b).
     *
     * @param y0 the new indication
     * @param uy0 its standard uncertainty, not negative
     * @param dofY0 degrees of freedom of u(y0), positive (infinite when exactly known)
     * @return x with its uncertainty
     * @throws IllegalArgumentException for a non-finite y0, a negative u(y0) or non-positive degrees of freedom
     * @throws ArithmeticException when the slope is zero
     */
    public LineEstimate inverse(double y0, double uy0, double dofY0) {
        if (!Double.isFinite(y0)) {
            throw new IllegalArgumentException(LineMessages.notFinite("indication y0", y0));
        }
        if (!Double.isFinite(uy0) || uy0 < 0) {
            throw new IllegalArgumentException(
                    LineMessages.fmt("u(y0) must be finite and not negative, not %s", uy0));
        }
        if (!(dofY0 > 0)) {
            throw new IllegalArgumentException(
                    LineMessages.fmt("degrees of freedom of u(y0) must be positive, not %s", dofY0));
        }
        if (slope == 0) {
            throw new ArithmeticException(LineMessages.zeroSlope());
        }
        double d = (y0 - intercept) / slope;
        double b2 = slope * slope;
        double line2 = Math.max(0.0, uIntercept * uIntercept + d * d * uSlope * uSlope + 2 * d * covariance) / b2;
        double ind2 = uy0 * uy0 / b2;
        double u2 = line2 + ind2;
        double dofLine = uncertaintyDof();
        double denom = (Double.isInfinite(dofLine) ? 0 : line2 * line2 / dofLine)
                + (Double.isInfinite(dofY0) ? 0 : ind2 * ind2 / dofY0);
        double dof = denom > 0 ? u2 * u2 / denom : Double.POSITIVE_INFINITY;
        return LineEstimate.of(referenceX + d, Math.sqrt(u2), dof);
    }

    @Override
    public String toString() {
        return LineMessages.fmt("LineFit[%s, %s: a = %s (u %s), b = %s (u %s), r = %.3f, x0 = %s]",
                data.name(), method.abbreviation(), intercept, uIntercept, slope, uSlope, correlation(), referenceX);
    }
}
