package org.quire.engine.budget;

import java.util.Locale;
import java.util.Objects;
import org.quire.engine.line.CalibrationLine;
import org.quire.engine.line.LineFit;
import org.quire.engine.line.LineMethod;

/**
 * An input quantity that is a fitted parameter of a calibration line: the intercept a or the slope b of the
 * line y = a + b (x - x0) fitted to one of the budget's calibration data sets.
 *
 * <p>The estimate and standard uncertainty are those of the fit. How the uncertainty was obtained decides the
 * type: for ordinary least squares u(a) and u(b) come from the scatter s of the residuals, a statistical
 * analysis of a series of observations, so the evaluation is <b>Type A with nu = n - 2</b>; for weighted least
 * squares, generalized distance regression and Gauss-Markov regression they are propagated from stated
 * uncertainties u(y_i) (and u(x_i)), so the evaluation is <b>Type B with infinite degrees of freedom</b>. The
 * Monte Carlo method draws the parameter from a <b>normal</b> distribution; when a budget uses both
 * parameters of one data set, {@link CorrelationMatrix} joins them with the fit's correlation coefficient
 * r(a, b), so the pair is drawn from the bivariate normal distribution with the fit's covariance matrix.
 *
 * <p>References: JCGM 100:2008 H.3 (the line's parameters y1, y2 with u, r(y1, y2) and nu = n - 2 used in a
 * further evaluation, H.3.4, eq. H.16); JCGM 100:2008 4.2 and 4.3 (Type A and Type B); ISO/TS 28037:2010 6.3
 * and 7.3 (u(a), u(b), cov(a, b) from stated uncertainties); JCGM 101:2008 6.4.8 (multivariate Gaussian).
 *
 * <p>Immutable and thread-safe.
 */
public final class FitParameter implements Evaluation {

    /** The parameter of the line an input refers to. */
    public enum Parameter {
        /** The intercept a, the line's value at x = x0. */
        INTERCEPT("intercept"),
        /** The slope b. */
        SLOPE("slope");

        private final String label;

        Parameter(String label) {
            this.label = label;
        }

        /** @return the word used in budget files: "intercept" or "slope" */
        public String label() {
            return label;
        }

        /**
         * @param text "intercept" or "slope"
         * @throws InvalidParameterException for any other text
         */
        public static Parameter parse(String text) {
            for (Parameter p : values()) {
                if (p.label.equals(text)) {
                    return p;
                }
            }
            throw new InvalidParameterException("parameter", "parameter must be \"intercept\" or \"slope\", not \""
                    + text + "\"");
        }
    }

    private final CalibrationLine line;
    private final LineFit fit;
    private final Parameter parameter;

    private FitParameter(CalibrationLine line, LineFit fit, Parameter parameter) {
        this.line = line;
        this.fit = fit;
        this.parameter = parameter;
    }

    /**
     * Fits the line and takes one of its parameters.
     *
     * @param line the data set with its fitting method
     * @param parameter intercept or slope
     * @return the evaluation
     * @throws IllegalArgumentException when the line cannot be fitted (the message names the data set and point)
     */
    public static FitParameter of(CalibrationLine line, Parameter parameter) {
        if (line == null) {
            throw new IllegalArgumentException("a fit parameter needs its calibration data set");
        }
        if (parameter == null) {
            throw new InvalidParameterException("parameter", "a fit parameter needs \"intercept\" or \"slope\"");
        }
        LineFit f;
        try {
            f = line.fit();
        } catch (IllegalArgumentException | ArithmeticException e) {
            throw new IllegalArgumentException("data set '" + line.name() + "': " + e.getMessage(), e);
        }
        double u = parameter == Parameter.INTERCEPT ? f.interceptUncertainty() : f.slopeUncertainty();
        if (!(u > 0)) {
            throw new IllegalArgumentException("data set '" + line.name() + "': the fitted " + parameter.label()
                    + " has zero uncertainty (the points lie exactly on a line); it cannot be used as an uncertain input");
        }
        return new FitParameter(line, f, parameter);
    }

    /** @return the data set and method the parameter comes from */
    public CalibrationLine line() {
        return line;
    }

    /** @return the data set's name */
    public String dataSet() {
        return line.name();
    }

    /** @return the fitted line */
    public LineFit fit() {
        return fit;
    }

    /** @return intercept or slope */
    public Parameter parameter() {
        return parameter;
    }

    /**
     * @return r(a, b) of the fit when {@code other} is the other parameter of the same data set and method;
     *     NaN when the two are not parameters of one fit
     */
    public double correlationWith(FitParameter other) {
        if (other == null || !other.line.equals(line) || other.parameter == parameter) {
            return Double.NaN;
        }
        return fit.correlation();
    }

    @Override
    public double estimate() {
        return parameter == Parameter.INTERCEPT ? fit.intercept() : fit.slope();
    }

    @Override
    public double standardUncertainty() {
        return parameter == Parameter.INTERCEPT ? fit.interceptUncertainty() : fit.slopeUncertainty();
    }

    @Override
    public double dof() {
        return fit.uncertaintyDof();
    }

    @Override
    public Distribution distribution() {
        return Distribution.Normal.of(estimate(), standardUncertainty());
    }

    @Override
    public String type() {
        return line.method() == LineMethod.ORDINARY_LEAST_SQUARES ? "A" : "B";
    }

    @Override
    public String basis() {
        String from = line.method() == LineMethod.ORDINARY_LEAST_SQUARES
                ? "from the residual scatter, nu = " + fit.dof()
                : "from the stated uncertainties of the points";
        return String.format(Locale.ROOT, "%s of the %s line of data set '%s' (%d points, x0 = %s), %s",
                parameter.label(), line.method().abbreviation(), line.name(), fit.data().size(),
                TypeA.fmt(line.referenceX()), from);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FitParameter && ((FitParameter) o).line.equals(line)
                && ((FitParameter) o).parameter == parameter;
    }

    @Override
    public int hashCode() {
        return Objects.hash(line, parameter);
    }

    @Override
    public String toString() {
        return "fit " + parameter.label() + " of '" + line.name() + "'";
    }
}
