package org.quire.engine.montecarlo;

import java.util.Locale;

/**
 * The error and information messages of the Monte Carlo package, kept in one place so that the same fault is
 * always described in the same words.
 *
 * <p>Stateless and thread-safe.
 */
final class Messages {
    private Messages() {
    }

    private static String fmt(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }

    static String trialsNotPositive(long trials) {
        return fmt("number of trials must be positive, not %d", trials);
    }

    static String trialsTooMany(long trials, long limit) {
        return fmt("number of trials %d exceeds the limit of %d trials that can be held in memory", trials, limit);
    }

    static String maxTrialsTooSmall(long maxTrials, long runLength) {
        return fmt("maximum number of trials for the adaptive procedure (%d) must be at least two runs of %d trials",
                maxTrials, runLength);
    }

    static String coverageProbabilityOutside(double p) {
        return fmt("coverage probability must lie strictly between 0 and 1, not %s", p);
    }

    static String threadsNotPositive(int threads) {
        return fmt("number of threads must be at least 1, not %d", threads);
    }

    static String significantDigitsOutside(int digits) {
        return fmt("number of significant decimal digits must lie between 1 and 15, not %d", digits);
    }

    static String notEnoughMemory(long trials, int outputs, long neededMiB, long availableMiB) {
        return fmt("%d trials of %d output(s) need about %d MiB for the output values, but the Java heap allows "
                + "at most %d MiB; use fewer trials or a larger heap (-Xmx)", trials, outputs, neededMiB,
                availableMiB);
    }

    static String inputCountMismatch(int modelInputs, int sampledInputs) {
        return fmt("the model has %d input(s) but %d distribution(s) were given", modelInputs, sampledInputs);
    }

    static String noOutputs() {
        return "the model has no outputs";
    }

    static String nullArgument(String name) {
        return name + " must not be null";
    }

    static String workersClosed() {
        return "the Monte Carlo workers were closed before this run";
    }

    static String workerThreads(int threads) {
        return fmt("the Monte Carlo workers need at least 1 thread, not %d", threads);
    }

    static String matrixSizeMismatch(int matrixSize, int inputs) {
        return fmt("correlation matrix is %d x %d but there are %d input(s)", matrixSize, matrixSize, inputs);
    }

    static String constantCorrelated(int input) {
        return fmt("input %d is a constant and cannot be correlated with another input", input + 1);
    }

    static String probabilityOutside(String what, double p) {
        return fmt("%s must lie in [0, 1], not %s", what, p);
    }

    static String notFinite(String what, double v) {
        return fmt("%s must be a finite number, not %s", what, v);
    }

    static String uncertaintyNotPositive(String what, double v) {
        return fmt("%s must be positive, not %s", what, v);
    }

    static String uncertaintyNegative(String what, double v) {
        return fmt("%s must be finite and not negative, not %s", what, v);
    }

    static String comparisonFirstOrderZero() {
        return "the GUM result is not validated: the first-order law of propagation gives u(y) = 0 (every "
                + "sensitivity coefficient vanishes at the estimates, or correlated contributions cancel), so there "
                + "is no GUM interval to compare; "
                + "use the Monte Carlo result (JCGM 101:2008 clause 9) or include the higher-order terms "
                + "(JCGM 100:2008 5.1.2 note)";
    }

    /** @return why the GUM result is validated, with d_low, d_high and delta as symbols (JCGM 101:2008 8.2) */
    static java.util.List<Phrase> comparisonValidated(double dLow, double dHigh, double delta) {
        return java.util.List.of(Phrase.words("the GUM result is validated: "), Phrase.symbol("d_low"),
                Phrase.words(" = "), Phrase.number(g(dLow), dLow), Phrase.words(" and "), Phrase.symbol("d_high"),
                Phrase.words(" = "), Phrase.number(g(dHigh), dHigh),
                Phrase.words(" are both within the numerical tolerance "), Phrase.symbol("delta"), Phrase.words(" = "),
                Phrase.number(g(delta), delta), Phrase.words(" (JCGM 101:2008 8.2)"));
    }

    static String comparisonNarrower() {
        return "The Monte Carlo interval is narrower than the GUM interval at both ends: the output's distribution "
                + "has shorter tails than the t distribution the GUM assumes, as when a rectangular (bounded) input "
                + "dominates the budget.";
    }

    static String comparisonWider() {
        return "The Monte Carlo interval is wider than the GUM interval at both ends: the output's distribution has "
                + "longer tails than the t distribution the GUM assumes, as when a dominant input has few degrees "
                + "of freedom or heavy tails.";
    }

    static String comparisonShifted(boolean towardsLower) {
        return "The Monte Carlo interval lies " + (towardsLower ? "lower" : "higher") + " than the GUM interval: "
                + "the output's distribution is asymmetric, as when the model is not linear over the spread of "
                + "its inputs.";
    }

    /** @return why the GUM result is not validated, with d_low, d_high and delta as symbols (JCGM 101:2008 8.2) */
    static java.util.List<Phrase> comparisonNotValidated(double dLow, double dHigh, double delta) {
        java.util.List<Phrase> p = new java.util.ArrayList<>(java.util.List.of(
                Phrase.words("the GUM result is not validated: "), Phrase.symbol("d_low"), Phrase.words(" = "),
                Phrase.number(g(dLow), dLow), Phrase.words(" and "), Phrase.symbol("d_high"), Phrase.words(" = "),
                Phrase.number(g(dHigh), dHigh)));
        if (dLow > delta && dHigh > delta) {
            p.add(Phrase.words(", and both exceed the numerical tolerance "));
        } else {
            p.add(Phrase.words(", and "));
            p.add(Phrase.symbol(dLow > delta ? "d_low" : "d_high"));
            p.add(Phrase.words(" exceeds the numerical tolerance "));
        }
        p.addAll(java.util.List.of(Phrase.symbol("delta"), Phrase.words(" = "), Phrase.number(g(delta), delta),
                Phrase.words(" (JCGM 101:2008 8.2); report the Monte Carlo result")));
        return p;
    }

    static String standardUncertaintyUndefined(String input, double dof) {
        return fmt("no standard uncertainty: input %s is drawn from a t distribution with %s degrees of freedom, "
                + "which has no finite variance for nu <= 2 (JCGM 101:2008 6.4.9), so neither has the output; "
                + "report the coverage interval only", input, g(dof));
    }

    /** @return {@code v} to 3 significant digits without trailing zeros: 0.0005, 0.0451, 2 */
    private static String g(double v) {
        double a = Math.abs(v);
        if (!Double.isFinite(v) || a != 0 && (a < 1e-6 || a >= 1e9)) {
            return String.format(Locale.ROOT, "%.3g", v);
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
    }

    static String valuesNotKept() {
        return "the trial values were not kept; run with MonteCarloSettings.withKeepValues(true)";
    }

    static String noValidTrials(int output, long trials) {
        return fmt("output %d gave no finite value in any of the %d trials: every trial left the domain of a "
                + "function in the model", output + 1, trials);
    }

    static String cancelled(long done, long planned) {
        return fmt("Monte Carlo run cancelled after %d of %d trials", done, planned);
    }

    static String excluded(long excluded, long trials) {
        return fmt("%d of %d trials gave no finite value (a function left its domain) and were excluded from "
                + "this output's summary", excluded, trials);
    }

    static String adaptiveNotStabilized(long trials, int digits) {
        return fmt("the adaptive procedure stopped at the maximum of %d trials before the results were stable "
                + "to %d significant decimal digit(s)", trials, digits);
    }
}
