package org.quire.engine.montecarlo;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The outcome of a Monte Carlo run: a summary per output, the correlation matrix of the outputs, the seed and
 * number of trials used, and notes for the report (excluded trials, use of the Gaussian copula, an adaptive
 * procedure that did not stabilise).
 *
 * <p>Immutable and thread-safe (the kept trial values are handed out as copies).
 *
 * <p>References: JCGM 101:2008 7.6 to 7.9 (results of the Monte Carlo method); JCGM 102:2011 7.6 (covariance
 * matrix of several outputs).
 */
public final class MonteCarloResult {
    private final MonteCarloSettings settings;
    private final long trials;
    private final List<OutputSummary> outputs;
    private final double[][] correlation;
    private final boolean usesCopula;
    private final int adaptiveRuns;
    private final boolean stabilized;
    private final double[][] values;
    private final long elapsedNanos;

    MonteCarloResult(MonteCarloSettings settings, long trials, List<OutputSummary> outputs, double[][] correlation,
            boolean usesCopula, int adaptiveRuns, boolean stabilized, double[][] values, long elapsedNanos) {
        this.settings = settings;
        this.trials = trials;
        this.outputs = List.copyOf(outputs);
        this.correlation = correlation;
        this.usesCopula = usesCopula;
        this.adaptiveRuns = adaptiveRuns;
        this.stabilized = stabilized;
        this.values = values;
        this.elapsedNanos = elapsedNanos;
    }

    /** @return the settings of the run */
    public MonteCarloSettings settings() {
        return settings;
    }

    /** @return the seed used, from which the run can be repeated exactly */
    public long seed() {
        return settings.seed();
    }

    /** @return the number of trials M run (in the adaptive procedure, all runs together) */
    public long trials() {
        return trials;
    }

    /** @return the coverage probability of the intervals */
    public double coverageProbability() {
        return settings.coverageProbability();
    }

    /** @return the number of outputs */
    public int outputCount() {
        return outputs.size();
    }

    /** @return the summary of output {@code k}, from 0 */
    public OutputSummary output(int k) {
        return outputs.get(k);
    }

    /** @return the summaries of every output, in output order */
    public List<OutputSummary> outputs() {
        return outputs;
    }

    /**
     * @return a copy of the correlation matrix of the outputs, over the trials in which every output is finite;
     *     an entry is NaN when an output does not vary
     */
    public double[][] outputCorrelation() {
        double[][] c = new double[correlation.length][];
        for (int i = 0; i < c.length; i++) {
            c[i] = correlation[i].clone();
        }
        return c;
    }

    /** @return the correlation coefficient of outputs {@code i} and {@code j} */
    public double outputCorrelation(int i, int j) {
        return correlation[i][j];
    }

    /**
     * @return true when correlated inputs that are not all normal were drawn through the Gaussian copula, so that
     *     their correlation coefficients hold for the underlying normals rather than for the inputs themselves
     */
    public boolean usesCopula() {
        return usesCopula;
    }

    /** @return the number h of runs of the adaptive procedure, or 1 for a fixed number of trials */
    public int adaptiveRuns() {
        return adaptiveRuns;
    }

    /**
     * @return false when the adaptive procedure reached its maximum number of trials before the results were
     *     stable to the requested digits; always true for a fixed number of trials
     */
    public boolean stabilized() {
        return stabilized;
    }

    /** @return true when the result holds every trial's output values */
    public boolean hasValues() {
        return values != null;
    }

    /**
     * @return a copy of output {@code k}'s value in every trial, in trial order (NaN where the trial failed)
     * @throws IllegalStateException when the run did not keep the values
     */
    public double[] values(int k) {
        if (values == null) {
            throw new IllegalStateException(Messages.valuesNotKept());
        }
        return values[k].clone();
    }

    /** @return the wall-clock time of the run in nanoseconds (not part of the reproducible result) */
    public long elapsedNanos() {
        return elapsedNanos;
    }

    /** @return sentences for the report about excluded trials, the copula and the adaptive procedure */
    public List<String> notes() {
        List<String> notes = new ArrayList<>();
        for (OutputSummary o : outputs) {
            o.exclusionNote().ifPresent(n -> notes.add("output " + (o.index() + 1) + ": " + n));
        }
        if (usesCopula) {
            notes.add("correlated inputs that are not all normal were drawn through a Gaussian copula: the "
                    + "correlation coefficients apply to the underlying normal variables");
        }
        if (!stabilized) {
            notes.add(Messages.adaptiveNotStabilized(trials, settings.significantDigits()));
        }
        return Collections.unmodifiableList(notes);
    }
}
