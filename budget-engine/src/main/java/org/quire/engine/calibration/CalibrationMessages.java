package org.quire.engine.calibration;

import java.util.List;
import java.util.Locale;
import org.quire.engine.document.TemplateOrigin;
import org.quire.engine.line.LineFit;
import org.quire.engine.units.Units;

/** The messages of the calibration package, kept in one place. */
final class CalibrationMessages {
    private CalibrationMessages() {
    }

    static String fmt(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }

    /** Six significant digits, no trailing zeros. */
    static String num(double v) {
        if (!Double.isFinite(v)) {
            return String.valueOf(v);
        }
        if (v == 0) {
            return "0";
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros().toPlainString();
    }

    /** Three significant digits for an uncertainty or limit in %. */
    static String pct(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
    }

    static String negative(String what, double v) {
        return what + " must not be negative, not " + num(v);
    }

    static String notPositive(String what, double v) {
        return what + " must be positive, not " + v;
    }

    static String notFinite(String what, double v) {
        return what + " must be a finite number, not " + v;
    }

    static String blank(String what) {
        return what + " must not be blank";
    }

    static String missing(String what) {
        return what + " is missing";
    }

    static String row(int row) {
        return row > 0 ? " (source row " + row + ")" : "";
    }

    static String noReadings(int row) {
        return "a run" + row(row) + " has no readings";
    }

    static String readingNotFinite(String name, Double v, int row) {
        return "reading '" + name + "'" + row(row) + " must be a finite number, not " + v;
    }

    static String noRuns(String label) {
        return "flow point '" + label + "' has no runs";
    }

    static String correlationRange(double r) {
        return "a correlated input needs a coefficient strictly between 0 and 1 (use 'shared' for 1 and "
                + "'independent' for 0), not " + r;
    }

    static String cmc(String message) {
        return "CMC table: " + message;
    }

    static String cmcGap(int prev, double join, int next, double from, String written) {
        String unit = Units.display(written);
        return cmc(fmt("range %d ends at %s %s but range %d starts at %s %s: the table has a gap; state the CMC "
                + "for every flow between them", prev, num(join), unit, next, num(from), unit));
    }

    static String cmcOverlap(int prev, double join, int next, double from, String written) {
        String unit = Units.display(written);
        return cmc(fmt("range %d ends at %s %s but range %d starts at %s %s: the ranges overlap", prev, num(join),
                unit, next, num(from), unit));
    }

    static String outsideCmc(double flow, String written, double lo, double hi) {
        String unit = Units.display(written);
        return cmc(fmt("the flow %s %s lies outside the table (%s to %s %s): the laboratory states no CMC there",
                num(flow), unit, num(lo), num(hi), unit));
    }

    static String mpeFormula(String field, String message) {
        return "MPE formula, " + field + ": " + message;
    }

    static String envelopeOrFormula() {
        return "a conformity specification needs either maximum permissible errors ('mpe') or an MPE formula "
                + "('mpeFormula'), exactly one of them";
    }

    static String ratio(double r) {
        return "the test uncertainty ratio must be a finite number of at least 1 (3 is common practice), not " + r;
    }

    static String trials(long n) {
        return "the Monte Carlo method needs between 10000 and 100000000 trials per point, not " + n;
    }

    static String sameOutput(String name) {
        return "the error output and the flow output are both '" + name + "'; name two different outputs of the method";
    }

    static String noPoints() {
        return "a calibration needs at least one as-found flow point";
    }

    static String duplicatePoint(String phase, String label) {
        return "the " + phase + " points have two points labelled '" + label + "'";
    }

    static String otherMethod(TemplateOrigin wanted, TemplateOrigin given) {
        if (!wanted.id().equals(given.id())) {
            return "the calibration was made with method template '" + wanted.id() + "', not '" + given.id() + "'";
        }
        if (wanted.version() != given.version()) {
            return "the calibration was made with version " + wanted.version() + " of method template '" + wanted.id()
                    + "', but version " + given.version() + " was given";
        }
        return "method template '" + wanted.id() + "' version " + wanted.version() + " has changed since the "
                + "calibration was made: its content hash is " + given.contentHash() + ", the calibration records "
                + wanted.contentHash() + "; use the template the calibration was made with, or rebuild the calibration";
    }

    static String errorNotPercent(String name, String unit) {
        return "the error output '" + name + "' must be in percent of the reading (unit \"%\"), but its unit is \""
                + unit + "\"";
    }

    static String noOutput(String role, String name, List<String> outputs) {
        return "the " + role + " output '" + name + "' is not an output of the method (its outputs: "
                + String.join(", ", outputs) + ")";
    }

    static String undeclared(List<String> names) {
        return "declare how each input of the method behaves between flow points (shared, independent, or "
                + "correlated with a coefficient and a justification); not declared: " + String.join(", ", names);
    }

    static String declaredUnknown(String name, List<String> inputs) {
        return "a declaration is given for '" + name + "', which is not an input of the method"
                + org.quire.engine.model.Suggest.hint(name, inputs);
    }

    static String mixedCorrelation(String a, String b) {
        return "the method correlates inputs '" + a + "' and '" + b + "', which are declared differently between "
                + "points; declare both alike";
    }

    static String missingReadings(String where, int row, List<String> names) {
        return where + row(row) + ": reading" + (names.size() == 1 ? " " : "s ") + "'" + String.join("', '", names)
                + "' " + (names.size() == 1 ? "is" : "are") + " missing; every run must give each per-run quantity "
                + "of the method";
    }

    static String unknownReading(String where, int row, String name, String method, List<String> params) {
        return where + row(row) + ": '" + name + "' is not a per-run quantity of method " + method
                + org.quire.engine.model.Suggest.hint(name, params) + " (its per-run quantities: "
                + String.join(", ", params) + ")";
    }

    static String at(String where, int row, String message) {
        return where + row(row) + ": " + message;
    }

    static String oneRun(String at, int row) {
        return at + row(row) + " has one run, so its repeatability is undefined (a Type A evaluation needs at "
                + "least two runs, JCGM 100:2008 4.2): state a repeatability for the point (a pooled standard "
                + "deviation with its degrees of freedom and source) or measure more runs";
    }

    static String noScatter(String at, int n) {
        return at + ": the " + n + " runs give exactly the same error, so their standard deviation is 0; state a "
                + "repeatability for the point (a pooled standard deviation with its degrees of freedom and source)";
    }

    static String ownBasis(RepeatabilityBasis b, int n) {
        return b == RepeatabilityBasis.MEAN_OF_RUNS
                ? "Type A from the " + n + " runs: u = s/sqrt(" + n + "), nu = " + (n - 1) + " (JCGM 100:2008 4.2.3)"
                : "Type A from the " + n + " runs, for a single run: u = s, nu = " + (n - 1) + " (JCGM 100:2008 4.2.2)";
    }

    static String statedBasis(StatedRepeatability s, RepeatabilityBasis b, int n) {
        return "stated repeatability s = " + num(s.standardDeviation()) + " with nu = " + num(s.dof()) + " ("
                + s.source() + ")" + (b == RepeatabilityBasis.MEAN_OF_RUNS ? ", u = s/sqrt(" + n + ")" : ", u = s")
                + " (JCGM 100:2008 4.2.4)";
    }

    static String statedNote(String label, StatedRepeatability s, int n, double own) {
        return "point '" + label + "': the stated repeatability s = " + num(s.standardDeviation()) + " % (nu = "
                + num(s.dof()) + ", " + s.source() + ") is used" + (n < 2 ? " because the point has one run"
                : " instead of the " + n + " runs' own s = " + num(own) + " %");
    }

    static String repeatabilityDescription(String error) {
        return "repeatability of " + error + " at the flow point: the runs' errors minus the error at the mean "
                + "readings";
    }

    static String raisedToCmc(String label, double u, double cmc, double flow, String unit) {
        return "point '" + label + "': U = " + pct(u) + " % is below the laboratory's CMC of " + pct(cmc) + " % at "
                + num(flow) + " " + Units.display(unit) + "; it is reported at the CMC (ILAC P14)";
    }

    static String flowUnitMismatch(String what, String from, String to, String message) {
        return "the flows are in " + Units.display(from) + " but the " + what + " is in " + Units.display(to) + ": "
                + message;
    }

    /**
     * @return the finding of a point whose GUM result the Monte Carlo method does not validate, in words (a finding
     *     is read as text everywhere, so it names no symbol)
     */
    static String monteCarloNotValidated(String phase, String label,
            org.quire.engine.montecarlo.GumComparison c) {
        if (c.firstOrderZero()) {
            return phase + ": point '" + label + "': " + c.reason();
        }
        return phase + ": point '" + label + "': the GUM result is not validated by the Monte Carlo method: the ends "
                + "of the GUM interval differ from those of the Monte Carlo interval by "
                + org.quire.engine.gum.Figures.working(c.lowerDifference()) + " (lower) and "
                + org.quire.engine.gum.Figures.working(c.upperDifference()) + " (upper), more than the numerical "
                + "tolerance " + org.quire.engine.gum.Figures.working(c.tolerance()) + " allows (JCGM 101:2008 8.2); "
                + "report the Monte Carlo result";
    }

    static String weightedMeanNote(int m) {
        return "weighted mean error of the " + m + " as-found points, weights w = 1/u^2 of each point's combined "
                + "standard uncertainty; its uncertainty uses the full covariance of the points (JCGM 102:2011 "
                + "6.2.1.3), so shared inputs do not average away";
    }

    static String noDoubleCounting() {
        return "the new constant is dialled into the meter and is exactly known; the as-left results carry the "
                + "as-found points' uncertainty once, and u of the new constant is not added to them, since it is "
                + "made from the same points";
    }

    static String slopeNeedsPoints(int m) {
        return "an adjustment by a fitted slope needs at least 3 as-found points, not " + m
                + "; use the weighted mean error or a chosen constant";
    }

    static String slopeNote(LineFit fit, String written) {
        String unit = Units.display(written);
        return "slope of indicated against reference flow by Gauss-Markov regression (ISO/TS 28037:2010 clause 8): "
                + "b = " + num(fit.slope()) + ", u(b) = " + num(fit.slopeUncertainty()) + "; the intercept a = "
                + num(fit.intercept()) + " " + unit + " (u = " + num(fit.interceptUncertainty()) + " " + unit
                + ") is an offset the calibration constant does not change; chi-squared " + num(fit.chiSquared())
                + " with " + fit.dof() + " degrees of freedom (" + fit.consistency().toString().toLowerCase(Locale.ROOT)
                .replace('_', ' ') + ")";
    }

    static String slopeInconsistent(LineFit fit) {
        return "adjustment: the points do not lie on a straight line within their uncertainties (chi-squared "
                + num(fit.chiSquared()) + " above the 95 % quantile " + num(fit.chiSquaredQuantile()) + " for "
                + fit.dof() + " degrees of freedom, ISO/TS 28037:2010 clause 8); review the line before relying on "
                + "its slope, or adjust by the weighted mean error";
    }

    static String chosenNote() {
        return "the new constant is the one chosen by the user; it is exactly known as dialled";
    }

    static String predictedNote() {
        return "the as-left results are predicted from the as-found runs and the adjustment, not measured; a "
                + "measured as-left series after the adjustment is the stronger evidence";
    }

    static String pointLimits(String phase, String label, String message) {
        return phase + ": point '" + label + "': " + message;
    }

    static String ratioFailed(String phase, String label, double u, double mpe, double ratio) {
        return phase + ": point '" + label + "': U = " + pct(u) + " % exceeds MPE/" + num(ratio) + " = "
                + pct(mpe / ratio) + " % (MPE " + pct(mpe) + " %): the test uncertainty ratio MPE/U = "
                + fmt("%.2f", mpe / u) + " is below " + num(ratio) + " (common practice), so the conformity decision "
                + "carries a large risk";
    }

    static String pointDecision(String phase, String label, String decision) {
        return phase + ": point '" + label + "' " + decision + " (" + (decision.equals("undecided")
                ? "no statement of conformity can be made" : "its error lies outside the acceptance limits") + ")";
    }

    static String formulaSource() {
        return "MPE = ±(a % of the reading + b over the bore) as specified for the meter: the usual form of an "
                + "electromagnetic meter's specification (common practice; ISO 20456:2017 describes such statements, "
                + "from memory)";
    }
}
