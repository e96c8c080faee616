package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.distribution.ExponentialDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.distribution.TriangularDistribution;
import org.apache.commons.math3.distribution.UniformRealDistribution;
import org.apache.commons.math3.stat.inference.KolmogorovSmirnovTest;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Distribution;

/**
 * JCGM 101:2008 6.4, sampling from the probability distributions: every sampler's mean and variance against the
 * formulas of Table 1 and 6.4.x.3, and its values against the distribution function written out from the
 * densities of 6.4.x.2 (Kolmogorov–Smirnov).
 *
 * <p>Tolerances from n = 200 000 draws: the mean within 5 standard errors sigma/sqrt(n); the variance within 5
 * standard errors sigma^2 sqrt((kurtosis - 1)/n), kurtosis from the distribution (normal 3, rectangular 1.8,
 * arcsine 1.5, exponential 9, Student t nu = 9: 3 + 6/(nu - 4) = 4.2; 3 as an upper bound for the others).
 * The Kolmogorov–Smirnov check draws 20 000 values and requires a p-value above 0.001 (fixed seed).
 */
class Jcgm101SamplingTest {
    private static final int N = 200_000;

    /**
     * @return the Kolmogorov-Smirnov distance sup |F_n - F| of n Student t draws (stream {@code stream}) from
     *     Commons Math's t distribution function
     */
    private static double studentTDistance(double nu, int n, long stream) {
        double[] v = draw(Distribution.StudentT.of(0, 1, nu), n, stream);
        Arrays.sort(v);
        TDistribution ref = new TDistribution(null, nu);
        double sup = 0;
        for (int i = 0; i < n; i++) {
            double f = ref.cumulativeProbability(v[i]);
            sup = Math.max(sup, Math.max(Math.abs(f - (double) i / n), Math.abs(f - (i + 1.0) / n)));
        }
        return sup;
    }

    private static double[] draw(Distribution d, int n, long stream) {
        double[] v = new double[n];
        Marginal.of(d).fill(MonteCarlo.blockStream(6_4L, stream), v, 0, n);
        return v;
    }

    private static void checkMoments(Distribution d, double expectedMean, double expectedVariance,
            double kurtosis) {
        double[] v = draw(d, N, 1);
        double mean = Arrays.stream(v).average().orElseThrow();
        double var = Arrays.stream(v).map(x -> (x - mean) * (x - mean)).sum() / (N - 1);
        double sd = Math.sqrt(expectedVariance);
        assertEquals(expectedMean, mean, 5 * sd / Math.sqrt(N), d + " mean");
        assertEquals(expectedVariance, var, 5 * expectedVariance * Math.sqrt((kurtosis - 1) / N), d + " variance");
        assertEquals(expectedVariance, Marginal.of(d).variance(), 1e-12 * expectedVariance, d + " variance()");
    }

    private static void checkDistributionFunction(Distribution d, DoubleUnaryOperator cdf) {
        double[] v = draw(d, 20_000, 2);
        Arrays.sort(v);
        int n = v.length;
        double dmax = 0;
        for (int i = 0; i < n; i++) {
            double f = cdf.applyAsDouble(v[i]);
            dmax = Math.max(dmax, Math.max(f - (double) i / n, (double) (i + 1) / n - f));
        }
        double pValue = 1.0 - new KolmogorovSmirnovTest().cdf(dmax, n);
        assertTrue(pValue > 0.001, d + ": Kolmogorov-Smirnov D = " + dmax + ", p = " + pValue);
        // the package's own distribution function and its inverse agree with the reference one
        Marginal m = Marginal.of(d);
        for (int i = 1; i < 20; i++) {
            double x = v[i * n / 20];
            assertEquals(cdf.applyAsDouble(x), m.cdf(x), 1e-9, d + " cdf at " + x);
            double p = cdf.applyAsDouble(x);
            assertEquals(p, cdf.applyAsDouble(m.quantile(p)), 1e-9, d + " quantile at " + p);
        }
    }

    @Test
    void normalMatchesMeanVarianceAndDistributionFunction() {
        // JCGM 101:2008 6.4.7: N(mu, sigma^2)
        Distribution d = Distribution.Normal.of(10.0, 0.5);
        checkMoments(d, 10.0, 0.25, 3.0);
        NormalDistribution ref = new NormalDistribution(null, 10.0, 0.5);
        checkDistributionFunction(d, ref::cumulativeProbability);
    }

    @Test
    void rectangularMatchesMeanVarianceAndDistributionFunction() {
        // JCGM 101:2008 6.4.2: R(a, b), E = (a + b)/2, V = (b - a)^2/12
        Distribution d = Distribution.Rectangular.of(-1.0, 3.0);
        checkMoments(d, 1.0, 16.0 / 12.0, 1.8);
        UniformRealDistribution ref = new UniformRealDistribution(null, -1.0, 3.0);
        checkDistributionFunction(d, ref::cumulativeProbability);
    }

    @Test
    void triangularMatchesMeanVarianceAndDistributionFunction() {
        // JCGM 101:2008 6.4.5: T(a, b), V = (b - a)^2/24
        Distribution d = Distribution.Triangular.of(2.0, 4.0);
        checkMoments(d, 3.0, 4.0 / 24.0, 2.4);
        TriangularDistribution ref = new TriangularDistribution(null, 2.0, 3.0, 4.0);
        checkDistributionFunction(d, ref::cumulativeProbability);
    }

    @Test
    void arcsineMatchesMeanVarianceAndDistributionFunction() {
        // JCGM 101:2008 6.4.6: U(a, b), V = (b - a)^2/8; G(x) = 1/2 + arcsin((2x - a - b)/(b - a))/pi
        double a = -2.0;
        double b = 1.0;
        Distribution d = Distribution.Arcsine.of(a, b);
        checkMoments(d, -0.5, 9.0 / 8.0, 1.5);
        checkDistributionFunction(d, x -> x <= a ? 0 : x >= b ? 1
                : 0.5 + Math.asin((2 * x - a - b) / (b - a)) / Math.PI);
    }

    @Test
    void trapezoidalMatchesMeanVarianceAndDistributionFunction() {
        // JCGM 101:2008 6.4.4: Tr(a, b, beta), V = (b - a)^2 (1 + beta^2)/24. With a = 0, b = 4, beta = 0.5:
        // density rises on [0, 1], is flat at 1/3 on [1, 3] and falls on [3, 4]; G(1) = 1/6 (integrated here).
        Distribution d = Distribution.Trapezoidal.of(0.0, 4.0, 0.5);
        checkMoments(d, 2.0, 16.0 * 1.25 / 24.0, 3.0);
        checkDistributionFunction(d, x -> x <= 0 ? 0 : x < 1 ? x * x / 6.0 : x <= 3 ? 1.0 / 6.0 + (x - 1) / 3.0
                : x < 4 ? 1.0 - (4 - x) * (4 - x) / 6.0 : 1.0);
    }

    @Test
    void trapezoidalWithBetaOneIsRectangularAndWithBetaZeroTriangular() {
        // JCGM 101:2008 6.4.4.1: beta = 1 gives R(a, b), beta = 0 gives T(a, b)
        Marginal flat = Marginal.of(Distribution.Trapezoidal.of(1.0, 3.0, 1.0));
        Marginal peak = Marginal.of(Distribution.Trapezoidal.of(1.0, 3.0, 0.0));
        Marginal tri = Marginal.of(Distribution.Triangular.of(1.0, 3.0));
        for (double x = 1.1; x < 3.0; x += 0.1) {
            assertEquals((x - 1.0) / 2.0, flat.cdf(x), 1e-14);
            assertEquals(tri.cdf(x), peak.cdf(x), 1e-14);
        }
    }

    @Test
    void curvilinearTrapezoidMatchesMeanVarianceAndDistributionFunction() {
        // JCGM 101:2008 6.4.3: CTrap(a, b, d), V = (b - a)^2/12 + d^2/9. Reference G integrated here from the
        // density 6.4.3.2 for a = -1, b = 1, d = 0.25 (half-width W = 1): with t = |x| and H uniform on
        // [W - d, W + d], Pr(|X| <= t) = t ln((W + d)/(W - d))/(2d) for t <= W - d,
        // ((t - W + d) + t ln((W + d)/t))/(2d) for W - d < t < W + d.
        double w = 1.0;
        double dd = 0.25;
        Distribution d = Distribution.CurvilinearTrapezoid.of(-1.0, 1.0, dd);
        checkMoments(d, 0.0, 4.0 / 12.0 + dd * dd / 9.0, 3.0);
        checkDistributionFunction(d, x -> {
            double t = Math.abs(x);
            double c = t >= w + dd ? 1.0 : t <= w - dd ? t * Math.log((w + dd) / (w - dd)) / (2 * dd)
                    : ((t - w + dd) + t * Math.log((w + dd) / t)) / (2 * dd);
            return x < 0 ? 0.5 - 0.5 * c : 0.5 + 0.5 * c;
        });
    }

    @Test
    void studentTMatchesMeanVarianceAndDistributionFunction() {
        // JCGM 101:2008 6.4.9: t_nu(mu, s^2), E = mu, V = s^2 nu/(nu - 2) for nu > 2
        Distribution d = Distribution.StudentT.of(5.0, 0.2, 9);
        checkMoments(d, 5.0, 0.04 * 9.0 / 7.0, 4.2);
        TDistribution ref = new TDistribution(null, 9);
        checkDistributionFunction(d, x -> ref.cumulativeProbability((x - 5.0) / 0.2));
    }

    @Test
    void studentTWithOneOrTwoDegreesOfFreedomHasClosedFormQuantiles() {
        // nu = 1 (Cauchy) and nu = 2 have closed-form quantiles; compare with the regularized beta inversion
        for (double nu : new double[] {1.0, 2.0}) {
            Marginal m = Marginal.of(Distribution.StudentT.of(0.0, 1.0, nu));
            TDistribution ref = new TDistribution(null, nu);
            for (double p : new double[] {0.001, 0.025, 0.3, 0.5, 0.8, 0.975, 0.999}) {
                assertEquals(ref.inverseCumulativeProbability(p), m.quantile(p), 1e-6, "nu " + nu + " p " + p);
            }
        }
        // a t with nu = 2 has infinite variance
        assertEquals(Double.POSITIVE_INFINITY, Marginal.of(Distribution.StudentT.of(0, 1, 2)).variance());
        TDistribution ref = new TDistribution(null, 2.5);
        double[] v = draw(Distribution.StudentT.of(0, 1, 2.5), 20_000, 3);
        Arrays.sort(v);
        assertEquals(ref.inverseCumulativeProbability(0.9), v[18_000], 0.05); // SE ~0.013
    }

    @Test
    void studentTDrawsFollowTheDistributionFunctionForWholeAndFractionalDegreesOfFreedom() {
        // JCGM 101:2008 6.4.9; the draws are by Bailey's polar method (Math. Comp. 62 (1994) 779-781).
        // Kolmogorov-Smirnov against Commons Math's t distribution function (TDistribution, the regularized
        // incomplete beta function, an independent calculation): sup |F_n - F| stays below 1.95 / sqrt(n), the
        // 0.1 % critical value (Smirnov's asymptotic distribution; from memory), for each nu with its own closed
        // form (1, 2, 4), through the power w^(-2/nu) (0.6, 2.5, 7, 30, 31.5, 100) and through expm1 (200, 1e4)
        int n = 40_000;
        for (double nu : new double[] {1, 2, 4, 0.6, 2.5, 7, 30, 31.5, 100, 200, 1e4}) {
            double sup = studentTDistance(nu, n, 11);
            assertTrue(sup < 1.95 / Math.sqrt(n), "nu = " + nu + ": KS distance " + sup);
        }
        // the same check at ten times the draws (critical value 1.95 / sqrt(n) three times as tight) for the
        // closed form used most (nu = 4) and one through the power
        int big = 400_000;
        for (double nu : new double[] {4, 2.5}) {
            double sup = studentTDistance(nu, big, 13);
            assertTrue(sup < 1.95 / Math.sqrt(big), "nu = " + nu + ", " + big + " draws: KS distance " + sup);
        }
        // nu without bound is the normal
        double[] v = draw(Distribution.StudentT.of(0, 1, Double.POSITIVE_INFINITY), n, 12);
        for (double x : v) {
            assertTrue(Double.isFinite(x));
        }
    }

    @Test
    void exponentialMatchesMeanVarianceAndDistributionFunction() {
        // JCGM 101:2008 6.4.10: Ex(x), E = x, V = x^2
        Distribution d = Distribution.Exponential.of(3.0);
        checkMoments(d, 3.0, 9.0, 9.0);
        ExponentialDistribution ref = new ExponentialDistribution(null, 3.0);
        checkDistributionFunction(d, ref::cumulativeProbability);
    }

    @Test
    void constantIsTheSameInEveryTrial() {
        double[] v = draw(Distribution.Constant.of(7.25), 1000, 4);
        assertTrue(Arrays.stream(v).allMatch(x -> x == 7.25));
        assertEquals(0.0, Marginal.of(Distribution.Constant.of(7.25)).variance());
    }

    @Test
    void varianceAgreesWithTheStandardUncertaintyOfTheDistribution() {
        // JCGM 101:2008 Table 1: for every distribution but the t, u^2 is the variance
        Distribution[] all = {Distribution.Normal.of(1, 2), Distribution.Rectangular.of(0, 1),
            Distribution.Triangular.of(0, 1), Distribution.Arcsine.of(0, 1), Distribution.Trapezoidal.of(0, 1, 0.3),
            Distribution.CurvilinearTrapezoid.of(0, 1, 0.1), Distribution.Exponential.of(2)};
        for (Distribution d : all) {
            double u = d.standardUncertainty();
            assertEquals(u * u, Marginal.of(d).variance(), 1e-14, d.toString());
        }
    }

    @Test
    void quantileRefusesProbabilitiesOutsideZeroToOne() {
        Marginal m = Marginal.of(Distribution.Normal.of(0, 1));
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> m.quantile(1.5));
        assertTrue(e.getMessage().contains("1.5"), e.getMessage());
    }

    @Test
    void meanDensitiesAreThoseOfTheDensitiesOfJcgm101Section6() {
        double h = 1e-6;
        // normal: g(x) = exp(-(x - mu)^2 / (2 sigma^2)) / (sigma sqrt(2 pi)) (JCGM 101:2008 6.4.7.2), against
        // Commons Math's density
        NormalDistribution normal = new NormalDistribution(10.0, 0.5);
        Marginal n = Marginal.of(new Distribution.Normal(10.0, 0.5));
        for (double x : new double[] {9.0, 10.0, 10.7}) {
            assertEquals(normal.density(x), n.meanDensity(x, h), 1e-6 * normal.density(x), "normal at " + x);
        }
        // rectangular on [1, 3]: 1/2 inside, 0 outside (6.4.2.2); over a width straddling an edge, half of it
        Marginal r = Marginal.of(new Distribution.Rectangular(1.0, 3.0));
        assertEquals(0.5, r.meanDensity(2.0, h), 1e-9);
        assertEquals(0.0, r.meanDensity(3.5, h), 0.0);
        assertEquals(0.25, r.meanDensity(3.0, 0.2), 1e-12);
        // triangular on [0, 2]: peak 1 at 1 (6.4.4.2), against Commons Math's density at 0.5
        TriangularDistribution tri = new TriangularDistribution(0.0, 1.0, 2.0);
        Marginal t = Marginal.of(new Distribution.Triangular(0.0, 2.0));
        assertEquals(tri.density(0.5), t.meanDensity(0.5, h), 1e-6);
        // arcsine on [-1, 1]: g(x) = 1 / (pi sqrt(1 - x^2)) (6.4.6.2), finite even over its end
        Marginal a = Marginal.of(new Distribution.Arcsine(-1.0, 1.0));
        assertEquals(1.0 / Math.PI, a.meanDensity(0.0, h), 1e-6);
        assertTrue(Double.isFinite(a.meanDensity(1.0, 0.01)) && a.meanDensity(1.0, 0.01) > 0);
    }
}
