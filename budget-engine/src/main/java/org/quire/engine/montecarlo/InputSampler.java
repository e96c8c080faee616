package org.quire.engine.montecarlo;

import java.util.ArrayList;
import java.util.List;
import org.quire.engine.budget.CorrelationMatrix;
import org.quire.engine.budget.Distribution;

/**
 * The joint distribution of a model's inputs as the Monte Carlo method draws it: one {@link Marginal} per input
 * and, optionally, a correlation matrix over the inputs.
 *
 * <p>Inputs not correlated with any other are drawn independently. Each group of inputs linked by non-zero
 * correlation coefficients is drawn from correlated standard normals z = L e, L the Cholesky factor of the
 * group's correlation matrix and e independent standard normals. When every input of the group is normal the
 * values are mu + sigma z (the multivariate Gaussian). Otherwise a Gaussian copula is used: each z is mapped to
 * u = Phi(z) and then through the inverse distribution function of the input's own distribution, which keeps
 * every marginal exact while the requested coefficients become those of the underlying normals (the
 * correlation of the values themselves then differs slightly from the coefficient asked for);
 * {@link #usesCopula()} reports it and the run's result carries the flag.
 *
 * <p>Immutable and thread-safe; each thread draws through its own {@link Block}.
 *
 * <p>References: JCGM 101:2008 6.4.8 (multivariate Gaussian, 6.4.8.4 sampling with the Cholesky factor);
 * JCGM 101:2008 6.4.8.1 and JCGM 102:2011 6.4.8 (correlated inputs); R. B. Nelsen, An Introduction to Copulas,
 * 2nd ed., Springer 2006, 2.3 (Sklar's theorem) and 5.1 (the Gaussian copula).
 */
public final class InputSampler {
    private final List<Distribution> distributions;
    private final Marginal[] marginals;
    private final CorrelationMatrix correlation;
    /** groups[g] = indices of correlated inputs, ascending; inputs in no group are drawn independently */
    private final int[][] groups;
    /** cholesky[g] = lower-triangular factor of group g's correlation matrix */
    private final double[][][] cholesky;
    /** copula[g] = true when group g has a non-normal member */
    private final boolean[] copula;
    /** groupOf[i] = group of input i, or -1; leader[i] = true when i is the first input of its group */
    private final int[] groupOf;

    private InputSampler(List<Distribution> distributions, CorrelationMatrix correlation) {
        this.distributions = List.copyOf(distributions);
        int n = distributions.size();
        this.marginals = new Marginal[n];
        for (int i = 0; i < n; i++) {
            marginals[i] = Marginal.of(distributions.get(i));
        }
        this.correlation = correlation;
        this.groupOf = new int[n];
        java.util.Arrays.fill(groupOf, -1);
        List<int[]> found = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (groupOf[i] >= 0 || !linked(i, n)) {
                continue;
            }
            // connected component of the graph of non-zero coefficients, found by a breadth-first search
            List<Integer> members = new ArrayList<>();
            members.add(i);
            groupOf[i] = found.size();
            for (int k = 0; k < members.size(); k++) {
                int m = members.get(k);
                for (int j = 0; j < n; j++) {
                    if (j != m && groupOf[j] < 0 && correlation.get(m, j) != 0.0) {
                        groupOf[j] = found.size();
                        members.add(j);
                    }
                }
            }
            int[] g = members.stream().mapToInt(Integer::intValue).sorted().toArray();
            for (int m : g) {
                if (distributions.get(m) instanceof Distribution.Constant) {
                    throw new IllegalArgumentException(Messages.constantCorrelated(m));
                }
            }
            found.add(g);
        }
        this.groups = found.toArray(new int[0][]);
        this.cholesky = new double[groups.length][][];
        this.copula = new boolean[groups.length];
        for (int g = 0; g < groups.length; g++) {
            int[] members = groups[g];
            boolean allNormal = true;
            for (int a = 0; a < members.length; a++) {
                allNormal &= marginals[members[a]].isNormal();
            }
            cholesky[g] = correlation.samplingFactor(members);
            copula[g] = !allNormal;
        }
    }

    private boolean linked(int i, int n) {
        for (int j = 0; j < n; j++) {
            if (j != i && correlation.get(i, j) != 0.0) {
                return true;
            }
        }
        return false;
    }

    /**
     * @param distributions one per input, in the model's input order
     * @return independent inputs
     */
    public static InputSampler of(List<Distribution> distributions) {
        checkList(distributions);
        return new InputSampler(distributions, CorrelationMatrix.identity(Math.max(1, distributions.size())));
    }

    /**
     * The inputs of a budget: each input's distribution, correlated by the budget's checked correlation matrix,
     * which holds the stated coefficients and, for the intercept and slope of one fitted calibration line, the
     * fit's r(a, b) (so such a pair is drawn from a bivariate normal distribution, JCGM 101:2008 6.4.8).
     *
     * @param budget the budget, inputs in its order (the order of its compiled model)
     * @return the sampler
     * @throws IllegalArgumentException when the correlations cannot be used (the message names the inputs)
     */
    public static InputSampler of(org.quire.engine.budget.Budget budget) {
        List<Distribution> d = new ArrayList<>();
        for (org.quire.engine.budget.InputQuantity q : budget.inputs()) {
            d.add(q.evaluation().distribution());
        }
        return of(d, budget.correlationMatrix());
    }

    /**
     * @param distributions one per input, in the model's input order
     * @param correlation correlation coefficients between the inputs, same order
     * @return correlated inputs
     * @throws IllegalArgumentException when the sizes differ or a constant input is correlated
     */
    public static InputSampler of(List<Distribution> distributions, CorrelationMatrix correlation) {
        checkList(distributions);
        if (correlation == null) {
            throw new IllegalArgumentException(Messages.nullArgument("correlation matrix"));
        }
        if (correlation.size() != distributions.size()) {
            throw new IllegalArgumentException(Messages.matrixSizeMismatch(correlation.size(), distributions.size()));
        }
        return new InputSampler(distributions, correlation);
    }

    private static void checkList(List<Distribution> distributions) {
        if (distributions == null) {
            throw new IllegalArgumentException(Messages.nullArgument("list of distributions"));
        }
        for (int i = 0; i < distributions.size(); i++) {
            if (distributions.get(i) == null) {
                throw new IllegalArgumentException(Messages.nullArgument("distribution of input " + (i + 1)));
            }
        }
    }

    /** @return the number of inputs */
    public int inputCount() {
        return distributions.size();
    }

    /** @return the inputs' distributions, in input order */
    public List<Distribution> distributions() {
        return distributions;
    }

    /** @return the correlation matrix over the inputs (the identity when none was given) */
    public CorrelationMatrix correlation() {
        return correlation;
    }

    /** @return true when some correlated inputs are not all normal, so that the Gaussian copula is used */
    public boolean usesCopula() {
        for (boolean c : copula) {
            if (c) {
                return true;
            }
        }
        return false;
    }

    /**
     * @param maxBlock the largest number of trials one call of {@link Block#fill} will be asked for
     * @return per-thread drawing state
     */
    public Block newBlock(int maxBlock) {
        return new Block(maxBlock);
    }

    /** Per-thread drawing state with scratch space for correlated groups; not thread-safe. */
    public final class Block {
        private final double[][] z;

        private Block(int maxBlock) {
            int largest = 0;
            for (int[] g : groups) {
                largest = Math.max(largest, g.length);
            }
            z = new double[largest][largest == 0 ? 0 : maxBlock];
        }

        /**
         * Fills {@code columns[i][0..n-1]} with {@code n} trials of every input i. The inputs are drawn in
         * input order, each group of correlated inputs when its first member is reached, all from {@code rng},
         * so that the values depend only on the stream.
         */
        public void fill(BlockStream rng, double[][] columns, int n) {
            for (int i = 0; i < marginals.length; i++) {
                int g = groupOf[i];
                if (g < 0) {
                    marginals[i].fill(rng, columns[i], 0, n);
                } else if (groups[g][0] == i) {
                    fillGroup(g, rng, columns, n);
                }
            }
        }

        private void fillGroup(int g, BlockStream rng, double[][] columns, int n) {
            int[] members = groups[g];
            int k = members.length;
            double[][] l = cholesky[g];
            for (int a = 0; a < k; a++) {
                rng.normals(z[a], 0, n);
            }
            // z := L e in place, from the last row up so that each row reads still untouched e values
            for (int a = k - 1; a >= 0; a--) {
                double[] za = z[a];
                double[] la = l[a];
                for (int t = 0; t < n; t++) {
                    double s = 0.0;
                    for (int b = 0; b <= a; b++) {
                        s += la[b] * z[b][t];
                    }
                    za[t] = s;
                }
            }
            for (int a = 0; a < k; a++) {
                int input = members[a];
                double[] out = columns[input];
                double[] za = z[a];
                Marginal m = marginals[input];
                if (m.isNormal()) {
                    Distribution.Normal d = (Distribution.Normal) m.distribution();
                    double mu = d.mean();
                    double sd = d.sd();
                    for (int t = 0; t < n; t++) {
                        out[t] = mu + sd * za[t];
                    }
                } else {
                    for (int t = 0; t < n; t++) {
                        out[t] = m.inverse(Marginal.phi(za[t]));
                    }
                }
            }
        }
    }
}
