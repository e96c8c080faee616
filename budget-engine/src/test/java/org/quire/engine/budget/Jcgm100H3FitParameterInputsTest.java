package org.quire.engine.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.line.CalibrationData;
import org.quire.engine.line.CalibrationLine;
import org.quire.engine.line.CalibrationPoint;
import org.quire.engine.line.LineMethod;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.montecarlo.InputSampler;
import org.quire.engine.montecarlo.MonteCarlo;
import org.quire.engine.montecarlo.MonteCarloResult;
import org.quire.engine.montecarlo.MonteCarloSettings;

/**
 * JCGM 100:2008 H.3: the intercept y1 and slope y2 of the thermometer's calibration line as inputs of the budget
 * of the correction b(30 °C) = y1 + y2 (30 - 20), with r(y1, y2) taken from the fit, in the GUM evaluation and in
 * the Monte Carlo method (JCGM 101:2008 6.4.8, bivariate normal pair). Values from memory, recomputed
 * independently from the published observations.
 */
class Jcgm100H3FitParameterInputsTest {
    private static final double[] T = {21.521, 22.012, 22.512, 23.003, 23.507, 23.999, 24.513, 25.002, 25.503,
        26.010, 26.511};
    private static final double[] B = {-0.171, -0.169, -0.166, -0.159, -0.164, -0.165, -0.156, -0.157, -0.159,
        -0.161, -0.160};

    static CalibrationLine line(LineMethod m) {
        List<CalibrationPoint> p = new ArrayList<>();
        for (int i = 0; i < T.length; i++) {
            p.add(CalibrationPoint.of(T[i], B[i], 0, 0.0035));
        }
        return CalibrationLine.of(CalibrationData.of("H.3", "°C", "°C", p), m, 20);
    }

    static Budget budget(CalibrationLine l) {
        List<InputQuantity> in = List.of(
                InputQuantity.of("y1", FitParameter.of(l, FitParameter.Parameter.INTERCEPT)),
                InputQuantity.of("y2", FitParameter.of(l, FitParameter.Parameter.SLOPE)),
                InputQuantity.of("t", TypeB.of("constant", Map.of("estimate", 30.0))));
        return Budget.of("b = y1 + y2 * (t - 20)", List.of(OutputQuantity.of("b")), List.of())
                .withDataSets(List.of(l)).withInputs(in);
    }

    @Test
    void ordinaryLeastSquaresParametersAreTypeAWithNMinusTwoDegreesOfFreedom() {
        FitParameter y1 = FitParameter.of(line(LineMethod.ORDINARY_LEAST_SQUARES), FitParameter.Parameter.INTERCEPT);
        assertEquals("A", y1.type());
        assertEquals(9.0, y1.dof());
        assertEquals(-0.1712, y1.estimate(), 0.00005); // JCGM 100:2008 H.3, from memory
        assertEquals(0.0029, y1.standardUncertainty(), 0.00005);
        assertEquals("normal", y1.distribution().shape());
    }

    @Test
    void weightedLeastSquaresParametersAreTypeBWithInfiniteDegreesOfFreedom() {
        FitParameter y2 = FitParameter.of(line(LineMethod.WEIGHTED_LEAST_SQUARES), FitParameter.Parameter.SLOPE);
        assertEquals("B", y2.type());
        assertEquals(Double.POSITIVE_INFINITY, y2.dof());
    }

    @Test
    void theFitsCorrelationEntersTheGumEvaluation() throws Exception {
        Budget b = budget(line(LineMethod.ORDINARY_LEAST_SQUARES));
        assertEquals(-0.930, b.correlationMatrix().get(0, 1), 0.0005); // JCGM 100:2008 H.3, r(y1, y2)
        GumResult r = GumEvaluator.evaluate(b, FunctionLibrary.standard());
        assertEquals(-0.1494, r.output("b").estimate(), 0.00005); // JCGM 100:2008 H.3, b(30 °C)
        assertEquals(0.0041, r.output("b").standardUncertainty(), 0.00005); // JCGM 100:2008 H.3, u(b(30 °C))
        // JCGM 100:2008 H.3: y1 and y2 share one s with nu = n - 2 = 9, so b(30 °C) has nu = 9 (not the 1.3 the
        // Welch-Satterthwaite formula would give treating them as independent components)
        assertEquals(9.0, r.output("b").effectiveDof(), 1e-9);
    }

    @Test
    void theMonteCarloMethodDrawsTheParametersAsACorrelatedNormalPair() throws Exception {
        Budget b = budget(line(LineMethod.ORDINARY_LEAST_SQUARES));
        int m = 200_000;
        MonteCarloResult r = MonteCarlo.run(b.compile(FunctionLibrary.standard()), InputSampler.of(b),
                MonteCarloSettings.defaults().withTrials(m).withSeed(3L));
        assertTrue(!r.usesCopula());
        // a linear model: the Monte Carlo u equals the GUM u up to the sampling error of a standard deviation,
        // about u / sqrt(2 M); five times that, plus half a unit of the printed 0.0041 (JCGM 100:2008 H.3)
        double u = r.output(0).standardUncertainty();
        assertEquals(0.0041, u, 0.00005 + 5 * 0.0041 / Math.sqrt(2.0 * m));
        assertEquals(-0.1494, r.output(0).mean(), 0.00005 + 5 * 0.0041 / Math.sqrt(m));
    }

    @Test
    void aStatedCorrelationForTheFittedPairIsRefused() {
        Budget b = budget(line(LineMethod.ORDINARY_LEAST_SQUARES))
                .withCorrelations(List.of(Correlation.of("y1", "y2", -0.9)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, b::correlationMatrix);
        assertTrue(e.getMessage().contains("fixed by the fit of data set 'H.3'"), e.getMessage());
    }

    @Test
    void theSameParameterTwiceAndAForeignDataSetAreRefused() {
        CalibrationLine l = line(LineMethod.ORDINARY_LEAST_SQUARES);
        Budget b = budget(l);
        List<InputQuantity> in = new ArrayList<>(b.inputs());
        in.add(InputQuantity.of("y2b", FitParameter.of(l, FitParameter.Parameter.SLOPE)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> b.withInputs(in).correlationMatrix());
        assertTrue(e.getMessage().contains("both the slope"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> b.withDataSets(List.of()));
        assertTrue(e.getMessage().contains("does not hold"), e.getMessage());
    }

    @Test
    void replacingADataSetRefitsItsInputs() {
        Budget b = budget(line(LineMethod.ORDINARY_LEAST_SQUARES));
        Budget w = b.withDataSets(List.of(line(LineMethod.WEIGHTED_LEAST_SQUARES)));
        assertEquals("B", w.input("y1").evaluation().type());
    }
}
