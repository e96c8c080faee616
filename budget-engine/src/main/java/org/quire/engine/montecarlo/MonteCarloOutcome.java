package org.quire.engine.montecarlo;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.quire.engine.budget.Distribution;

/**
 * One Monte Carlo run of a budget and what it says about the GUM result, the only shape in which a run is shown:
 * the workbench, the report, the review checklist, the command line and the JSON output all read this value and
 * compute nothing of their own.
 *
 * <p>Per output ({@link Output}): the Monte Carlo estimate and standard uncertainty (or the statement that the
 * latter is not defined), both coverage intervals, the histogram, the GUM interval y ± U_p, the clause-8
 * comparison with its verdict and reason, and the probability the GUM's distribution for the output puts in each
 * histogram bin, from the engine's own distribution functions ({@link Marginal}).
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: JCGM 101:2008 7.6 (estimate and standard uncertainty), 7.7 (coverage intervals), clause 8
 * (comparison with the GUM uncertainty framework); JCGM 100:2008 G.3 and JCGM 101:2008 6.4.9 (the scaled and
 * shifted t distribution the GUM framework assigns to an output with finite effective degrees of freedom).
 */
public final class MonteCarloOutcome {
    private final MonteCarloResult result;
    private final List<Output> outputs;

    private MonteCarloOutcome(MonteCarloResult result, List<Output> outputs) {
        this.result = result;
        this.outputs = List.copyOf(outputs);
    }

    /**
     * @param result the run
     * @param outputs one per output of the run, in output order
     * @return the outcome
     */
    public static MonteCarloOutcome of(MonteCarloResult result, List<Output> outputs) {
        if (result == null || outputs == null) {
            throw new IllegalArgumentException(Messages.nullArgument(result == null ? "result" : "outputs"));
        }
        if (outputs.size() != result.outputCount()) {
            throw new IllegalArgumentException("a Monte Carlo outcome needs one output per output of the run, not "
                    + outputs.size() + " for " + result.outputCount());
        }
        return new MonteCarloOutcome(result, outputs);
    }

    /** @return the run: settings, trials, seed, output correlation, notes */
    public MonteCarloResult result() {
        return result;
    }

    /** @return the number of trials M run */
    public long trials() {
        return result.trials();
    }

    /** @return the seed, from which the run can be repeated exactly */
    public long seed() {
        return result.seed();
    }

    /** @return whether the adaptive procedure (JCGM 101:2008 7.9) chose the number of trials */
    public boolean adaptive() {
        return result.settings().adaptive();
    }

    /** @return the coverage probability p of every interval */
    public double coverageProbability() {
        return result.coverageProbability();
    }

    /** @return the outputs, in output order */
    public List<Output> outputs() {
        return outputs;
    }

    /** @return output {@code k}, from 0 */
    public Output output(int k) {
        return outputs.get(k);
    }

    /** @return the output of that name, if there is one */
    public Optional<Output> output(String name) {
        return outputs.stream().filter(o -> o.name().equals(name)).findFirst();
    }

    /** @return true when the GUM result of every output is validated */
    public boolean allValidated() {
        return outputs.stream().allMatch(o -> o.comparison().validated());
    }

    /**
     * @return sentences for the report: excluded trials, the copula, the adaptive procedure, and per output a
     *     standard uncertainty that is not defined
     */
    public List<String> notes() {
        List<String> n = new ArrayList<>(result.notes());
        for (Output o : outputs) {
            o.standardUncertaintyNote().ifPresent(t -> n.add("output " + o.name() + ": " + t));
        }
        return List.copyOf(n);
    }

    /**
     * The outcome for one output.
     *
     * <p>Immutable and thread-safe.
     */
    public static final class Output {
        private final String name;
        private final String unit;
        private final OutputSummary summary;
        private final GumComparison comparison;
        private final double gumDof;
        private final double[] gumBinProbabilities;
        private final String undefinedStandardUncertainty;

        private Output(String name, String unit, OutputSummary summary, GumComparison comparison, double gumDof,
                double[] gumBinProbabilities, String undefinedStandardUncertainty) {
            this.name = name;
            this.unit = unit;
            this.summary = summary;
            this.comparison = comparison;
            this.gumDof = gumDof;
            this.gumBinProbabilities = gumBinProbabilities;
            this.undefinedStandardUncertainty = undefinedStandardUncertainty;
        }

        /**
         * @param name the output's name
         * @param unit the unit of every figure, as text ("" for none)
         * @param summary the Monte Carlo summary
         * @param comparison the clause-8 comparison with the GUM result
         * @param gumDof the degrees of freedom the GUM result used for its coverage factor (infinite: normal)
         * @param undefinedStandardUncertainty null when the output's standard uncertainty is defined, else the
         *     sentence saying why it is not (an input with no finite variance)
         * @return the output, with the GUM distribution's probability in each histogram bin computed here
         */
        public static Output of(String name, String unit, OutputSummary summary, GumComparison comparison,
                double gumDof, String undefinedStandardUncertainty) {
            if (name == null || summary == null || comparison == null) {
                throw new IllegalArgumentException(Messages.nullArgument(
                        name == null ? "name" : summary == null ? "summary" : "comparison"));
            }
            if (!(gumDof > 0)) {
                throw new IllegalArgumentException("GUM degrees of freedom must be positive, not " + gumDof);
            }
            return new Output(name, unit == null ? "" : unit, summary, comparison, gumDof,
                    binProbabilities(summary.histogram(), comparison, gumDof), undefinedStandardUncertainty);
        }

        /**
         * The probability that the GUM's distribution for the output, N(y, u^2) or y + u t_nu (JCGM 100:2008 G.3),
         * gives to each histogram bin: G(e_{i+1}) - G(e_i) with G its distribution function. Empty when the GUM
         * standard uncertainty is zero (a point, no curve to draw).
         */
        private static double[] binProbabilities(Histogram h, GumComparison c, double nu) {
            double u = c.gumStandardUncertainty();
            if (!(u > 0)) {
                return new double[0];
            }
            Distribution d = Double.isInfinite(nu) ? Distribution.Normal.of(c.gumEstimate(), u)
                    : Distribution.StudentT.of(c.gumEstimate(), u, nu);
            Marginal g = Marginal.of(d);
            double[] e = h.edges();
            double[] p = new double[e.length - 1];
            double previous = g.cdf(e[0]);
            for (int i = 0; i < p.length; i++) {
                double next = g.cdf(e[i + 1]);
                p[i] = Math.max(0.0, next - previous);
                previous = next;
            }
            return p;
        }

        /** @return the output's name */
        public String name() {
            return name;
        }

        /** @return the unit of every figure, "" for none */
        public String unit() {
            return unit;
        }

        /** @return the Monte Carlo summary: percentiles, extremes, trial counts */
        public OutputSummary summary() {
            return summary;
        }

        /** @return the Monte Carlo estimate, the mean of the values (JCGM 101:2008 7.6) */
        public double estimate() {
            return summary.mean();
        }

        /** @return true when the output has a standard uncertainty (every input it depends on has a variance) */
        public boolean hasStandardUncertainty() {
            return undefinedStandardUncertainty == null;
        }

        /**
         * @return the Monte Carlo standard uncertainty (JCGM 101:2008 7.6), NaN when it is not defined
         * @see #standardUncertaintyNote()
         */
        public double standardUncertainty() {
            return hasStandardUncertainty() ? summary.standardUncertainty() : Double.NaN;
        }

        /** @return why the output has no standard uncertainty, when it has none */
        public Optional<String> standardUncertaintyNote() {
            return Optional.ofNullable(undefinedStandardUncertainty);
        }

        /** @return the probabilistically symmetric coverage interval (JCGM 101:2008 7.7.2) */
        public CoverageInterval symmetricInterval() {
            return summary.symmetricInterval();
        }

        /** @return the shortest coverage interval (JCGM 101:2008 7.7.3) */
        public CoverageInterval shortestInterval() {
            return summary.shortestInterval();
        }

        /** @return the histogram of the values */
        public Histogram histogram() {
            return summary.histogram();
        }

        /** @return the clause-8 comparison with the GUM result: intervals, tolerance, verdict, reason */
        public GumComparison comparison() {
            return comparison;
        }

        /** @return the GUM coverage interval [y - U_p, y + U_p] */
        public CoverageInterval gumInterval() {
            double[] g = comparison.gumInterval();
            return CoverageInterval.of(g[0], g[1], summary.symmetricInterval().probability(),
                    CoverageInterval.Kind.PROBABILISTICALLY_SYMMETRIC);
        }

        /**
         * @return the degrees of freedom of the GUM's distribution for the output: infinite for a normal
         *     distribution, else those of the scaled and shifted t
         */
        public double gumDistributionDof() {
            return gumDof;
        }

        /** @return true when the GUM gives the output a normal distribution (infinite degrees of freedom) */
        public boolean gumDistributionNormal() {
            return Double.isInfinite(gumDof);
        }

        /**
         * @return a copy of the probability of each histogram bin under the GUM's distribution for the output;
         *     empty when the GUM standard uncertainty is zero
         */
        public double[] gumBinProbabilities() {
            return gumBinProbabilities.clone();
        }

        /**
         * @return a copy of the number of trials the GUM's distribution expects in each histogram bin (the bin
         *     probabilities times the trials counted in the histogram), for drawing over it; empty as above
         */
        public double[] gumExpectedCounts() {
            double n = summary.histogram().total();
            double[] c = gumBinProbabilities.clone();
            for (int i = 0; i < c.length; i++) {
                c[i] *= n;
            }
            return c;
        }

        @Override
        public String toString() {
            return "MonteCarloOutcome.Output[" + name + ": " + summary + ", " + comparison + ", GUM bins "
                    + Arrays.toString(gumBinProbabilities) + "]";
        }
    }
}
