package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.CorrelationMatrix;
import org.quire.engine.budget.Distribution;

/**
 * JCGM 101:2008 6.4.8, correlated inputs: the multivariate Gaussian through the Cholesky factor, the Gaussian
 * copula for correlated inputs that are not all normal, and refusal of a correlation matrix that is not
 * positive semi-definite.
 *
 * <p>Tolerances from M = 200 000 trials: the standard error of a sample correlation coefficient is about
 * (1 - r^2)/sqrt(M); each check allows 5 of them. Means within 5 sigma/sqrt(M).
 */
class Jcgm101CorrelatedInputsTest {
    private static final int M = 200_000;

    private static MonteCarloResult run(List<Distribution> d, CorrelationMatrix r) {
        MonteCarloSettings s = MonteCarloSettings.defaults().withTrials(M).withSeed(648L).withKeepValues(true);
        return MonteCarlo.run(TestModels.identity(d.size()), InputSampler.of(d, r), s);
    }

    @Test
    void correlatedNormalsReproduceTheRequestedCorrelationWithoutCopula() {
        // JCGM 101:2008 6.4.8.4: x = mu + R^T z
        List<Distribution> d = List.of(Distribution.Normal.of(1, 2), Distribution.Normal.of(-3, 0.5),
                Distribution.Normal.of(0, 1));
        CorrelationMatrix r = CorrelationMatrix.of(new double[][] {{1, 0.8, -0.3}, {0.8, 1, 0}, {-0.3, 0, 1}});
        MonteCarloResult res = run(d, r);
        assertFalse(res.usesCopula());
        assertEquals(0.8, res.outputCorrelation(0, 1), 5 * (1 - 0.64) / Math.sqrt(M));
        assertEquals(-0.3, res.outputCorrelation(0, 2), 5 * (1 - 0.09) / Math.sqrt(M));
        assertEquals(0.0, res.outputCorrelation(1, 2), 5 / Math.sqrt(M));
        assertEquals(1.0, res.output(0).mean(), 5 * 2 / Math.sqrt(M));
        assertEquals(0.5, res.output(1).standardUncertainty(), 5 * 0.5 / Math.sqrt(2.0 * M));
    }

    @Test
    void fullyCorrelatedNormalsAreAcceptedAsSemiDefinite() {
        // r = 1 makes the matrix singular but still positive semi-definite (6.4.8.1)
        List<Distribution> d = List.of(Distribution.Normal.of(0, 1), Distribution.Normal.of(5, 3));
        MonteCarloResult res = run(d, CorrelationMatrix.identity(2).withCoefficient(0, 1, 1.0));
        double[] x = res.values(0);
        double[] y = res.values(1);
        for (int t = 0; t < 1000; t++) {
            assertEquals(5 + 3 * x[t], y[t], 1e-9);
        }
    }

    @Test
    void nonNormalCorrelatedInputsUseTheGaussianCopulaAndKeepTheirMarginals() {
        // Gaussian copula (Nelsen 2006, 5.1): X1 = F1^-1(Phi(Z1)) rectangular on [0, 1], X2 = Z2 normal, with
        // corr(Z1, Z2) = rho. Then corr(X1, X2) = rho sqrt(3/pi) (cov(Phi(Z1), Z2) = rho / (2 sqrt(pi)) and
        // var Phi(Z1) = 1/12; recomputed): 0.6 sqrt(3/pi) = 0.5863.
        List<Distribution> d = List.of(Distribution.Rectangular.of(0, 1), Distribution.Normal.of(0, 1));
        MonteCarloResult res = run(d, CorrelationMatrix.identity(2).withCoefficient(0, 1, 0.6));
        assertTrue(res.usesCopula());
        assertTrue(res.notes().stream().anyMatch(n -> n.contains("copula")), res.notes().toString());
        double expected = 0.6 * Math.sqrt(3 / Math.PI);
        assertEquals(expected, res.outputCorrelation(0, 1), 5 * (1 - expected * expected) / Math.sqrt(M));
        // the rectangular marginal is kept: mean 1/2, u = 1/sqrt(12), all values in [0, 1]
        assertEquals(0.5, res.output(0).mean(), 5 * 0.2887 / Math.sqrt(M));
        assertEquals(1 / Math.sqrt(12), res.output(0).standardUncertainty(), 0.002);
        assertTrue(Arrays.stream(res.values(0)).allMatch(v -> v >= 0 && v <= 1));
    }

    @Test
    void correlatedStudentTAndArcsineKeepTheirMarginalsThroughTheCopula() {
        // the copula uses each marginal's inverse distribution function: variances from 6.4.6.3 and 6.4.9.3
        List<Distribution> d = List.of(Distribution.Arcsine.of(-1, 1), Distribution.StudentT.of(0, 1, 10),
                Distribution.Trapezoidal.of(0, 2, 0.4));
        CorrelationMatrix r = CorrelationMatrix.of(new double[][] {{1, 0.5, 0.5}, {0.5, 1, 0.5}, {0.5, 0.5, 1}});
        MonteCarloResult res = run(d, r);
        assertTrue(res.usesCopula());
        assertEquals(Math.sqrt(0.5), res.output(0).standardUncertainty(), 5 * 0.7071 * Math.sqrt(0.5 / (4.0 * M)));
        assertEquals(Math.sqrt(10.0 / 8.0), res.output(1).standardUncertainty(), 0.01); // kurtosis 4, SE 0.0022
        assertTrue(res.outputCorrelation(0, 1) > 0.3 && res.outputCorrelation(1, 2) > 0.3);
    }

    @Test
    void matrixThatIsNotPositiveSemiDefiniteIsRefused() {
        // r12 = r13 = 0.9 with r23 = -0.9 cannot hold together: smallest eigenvalue 1 - 0.9 - 2 x 0.9 < 0
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CorrelationMatrix.of(
                new double[][] {{1, 0.9, 0.9}, {0.9, 1, -0.9}, {0.9, -0.9, 1}}));
        assertTrue(e.getMessage().contains("not positive semi-definite"), e.getMessage());
        assertTrue(e.getMessage().contains("smallest eigenvalue"), e.getMessage());
        IllegalArgumentException f = assertThrows(IllegalArgumentException.class,
                () -> CorrelationMatrix.identity(3).withCoefficient(0, 1, 0.9).withCoefficient(1, 2, 0.9)
                        .withCoefficient(0, 2, -0.5));
        assertTrue(f.getMessage().contains("not positive semi-definite"), f.getMessage());
    }

    @Test
    void malformedMatricesAreRefusedWithTheEntryNamed() {
        IllegalArgumentException a = assertThrows(IllegalArgumentException.class,
                () -> CorrelationMatrix.of(new double[][] {{1, 0.2}, {0.3, 1}}));
        assertTrue(a.getMessage().contains("not symmetric"), a.getMessage());
        IllegalArgumentException b = assertThrows(IllegalArgumentException.class,
                () -> CorrelationMatrix.of(new double[][] {{1, 1.5}, {1.5, 1}}));
        assertTrue(b.getMessage().contains("[-1, 1]") && b.getMessage().contains("1.5"), b.getMessage());
        IllegalArgumentException c = assertThrows(IllegalArgumentException.class,
                () -> CorrelationMatrix.of(new double[][] {{0.9, 0}, {0, 1}}));
        assertTrue(c.getMessage().contains("diagonal"), c.getMessage());
        IllegalArgumentException s = assertThrows(IllegalArgumentException.class,
                () -> InputSampler.of(List.of(Distribution.Normal.of(0, 1)), CorrelationMatrix.identity(2)));
        assertTrue(s.getMessage().contains("2 x 2") && s.getMessage().contains("1 input"), s.getMessage());
        IllegalArgumentException k = assertThrows(IllegalArgumentException.class,
                () -> InputSampler.of(List.of(Distribution.Normal.of(0, 1), Distribution.Constant.of(2)),
                        CorrelationMatrix.identity(2).withCoefficient(0, 1, 0.5)));
        assertTrue(k.getMessage().contains("input 2 is a constant"), k.getMessage());
    }
}
