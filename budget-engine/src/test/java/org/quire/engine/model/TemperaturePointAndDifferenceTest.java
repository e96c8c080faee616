package org.quire.engine.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.junit.jupiter.api.Test;
import org.quire.engine.flow.FlowFunctions;

/**
 * Temperature points and differences in models (NIST SP 811 (2008) clause 4.2.1.1: t/°C = T/K − 273.15, and an
 * interval of 1 °C is one of 1 K), and the unit conversions compiled in front of library-function arguments.
 */
class TemperaturePointAndDifferenceTest {

    /** A function that declares its argument and result in kelvin and returns the argument. */
    private static final ModelFunction IN_KELVIN = new ModelFunction() {
        @Override public String name() { return "in_kelvin"; }
        @Override public List<String> parameters() { return List.of("T"); }
        @Override public String description() { return "the thermodynamic temperature T itself"; }
        @Override public List<String> argumentUnits() { return List.of("K"); }
        @Override public String resultUnit() { return "K"; }
        @Override public String domainProblem(double[] args) { return args[0] > 0 ? null : "T must be positive"; }
        @Override public double value(double[] args) { return args[0]; }
        @Override public DerivativeStructure value(DerivativeStructure[] args) { return args[0]; }
    };

    private static final FunctionLibrary LIBRARY = FunctionLibrary.standard().with(FlowFunctions.all())
            .with(List.of(IN_KELVIN));

    private static CompiledModel compile(String model, List<String> in, ModelUnits u) throws ModelException {
        return ModelCompiler.compile(model, in, List.of("y"), LIBRARY, u);
    }

    @Test
    void aCelsiusReadingPassedToAKelvinParameterIsShiftedBy273Point15() throws ModelException {
        CompiledModel m = compile("y = in_kelvin(t)", List.of("t"),
                ModelUnits.none().withInput("t", "°C").withOutput("y", "K", ""));
        assertTrue(m.warnings().isEmpty(), m.warnings().toString());
        // NIST SP 811 4.2.1.1: T = t + 273.15 K, exact
        assertEquals(293.15, m.evaluate(new double[] {20})[0], 1e-12);
        // a difference: the sensitivity dT/dt is 1
        DerivativeStructure[] d = m.derivatives(new double[] {20}, new int[] {0}, 1);
        assertEquals(1.0, d[0].getPartialDerivative(1), 0);
        // the Monte Carlo block path compiles the same conversion
        double[][] out = new double[1][3];
        m.newSession(3).evaluate(new double[][] {{0, 20, 100}}, 3, out);
        assertEquals(273.15, out[0][0], 1e-12);
        assertEquals(293.15, out[0][1], 1e-12);
        assertEquals(373.15, out[0][2], 1e-12);
    }

    @Test
    void aKelvinTemperaturePassedToWaterDensityIsConvertedToCelsius() throws ModelException {
        CompiledModel m = compile("y = water_density(T)", List.of("T"),
                ModelUnits.none().withInput("T", "K").withOutput("y", "kg/m^3", ""));
        assertTrue(m.warnings().isEmpty(), m.warnings().toString());
        // Tanaka et al. (2001), Metrologia 38, 301, table: 20 °C gives 998.2067 kg/m^3 (4 decimals printed)
        assertEquals(998.2067, m.evaluate(new double[] {293.15})[0], 0.00005);
        double[][] out = new double[1][2];
        m.newSession(2).evaluate(new double[][] {{293.15, 303.15}}, 2, out);
        assertEquals(998.2067, out[0][0], 0.00005);
        // Tanaka et al. (2001) table: 30 °C gives 995.6488 kg/m^3
        assertEquals(995.6488, out[0][1], 0.00005);
    }

    @Test
    void aCelsiusDifferenceAddedToACelsiusTemperatureNeedsNoConversion() throws ModelException {
        CompiledModel m = compile("t = t_read + d_T\ny = water_density(t)", List.of("t_read", "d_T"),
                ModelUnits.none().withInput("t_read", "°C").withInput("d_T", "°C").withOutput("y", "kg/m^3", ""));
        assertTrue(m.warnings().isEmpty(), m.warnings().toString());
        // Tanaka et al. (2001) table: 25 °C gives 997.0470 kg/m^3
        assertEquals(997.0470, m.evaluate(new double[] {24.8, 0.2})[0], 0.00005);
    }

    @Test
    void anExpansionCoefficientPerKelvinTimesACelsiusDifferenceIsDimensionless() throws ModelException {
        // JCGM 100:2008 H.1 form: l = l_s (1 + alpha theta), alpha in 1/K, theta a deviation in °C
        CompiledModel m = ModelCompiler.compile("l = l_s * (1 + alpha * theta)", List.of("l_s", "alpha", "theta"),
                List.of("l"), LIBRARY, ModelUnits.none().withInput("l_s", "mm").withInput("alpha", "1/K")
                        .withInput("theta", "°C").withOutput("l", "mm", ""));
        assertTrue(m.warnings().isEmpty(), m.warnings().toString());
        // 50 mm (1 + 11.5e-6 /K × 2 K) = 50.00115 mm, worked by hand
        assertEquals(50.00115, m.evaluate(new double[] {50, 11.5e-6, 2})[0], 1e-12);
    }

    @Test
    void kelvinBesideCelsiusInASumIsFlaggedAsRightOnlyForADifference() throws ModelException {
        CompiledModel m = compile("y = T - t", List.of("T", "t"),
                ModelUnits.none().withInput("T", "K").withInput("t", "°C").withOutput("y", "K", ""));
        assertEquals(1, m.warnings().size(), m.warnings().toString());
        ModelProblem w = m.warnings().get(0);
        assertEquals(7, w.column());
        assertTrue(w.message().startsWith("left side K, right side °C") && w.message().contains(
                "only when one side is a temperature difference"), w.message());
    }

    @Test
    void kilopascalsPassedToAPascalParameterAreMultipliedBy1000() throws ModelException {
        CompiledModel m = compile("y = water_density(t, p)", List.of("t", "p"),
                ModelUnits.none().withInput("t", "°C").withInput("p", "kPa"));
        // Tanaka et al. (2001): at 101325 Pa the compressibility factor is exactly 1; table value at 20 °C
        assertEquals(998.2067, m.evaluate(new double[] {20, 101.325})[0], 0.00005);
        // 1 kPa = 1000 Pa (NIST SP 811 B.8): the derivative to p in kPa is 1000 times that in Pa
        CompiledModel pa = compile("y = water_density(t, p)", List.of("t", "p"),
                ModelUnits.none().withInput("t", "°C").withInput("p", "Pa"));
        double perKpa = m.derivatives(new double[] {20, 101.325}, new int[] {1}, 1)[0].getPartialDerivative(1);
        double perPa = pa.derivatives(new double[] {20, 101325}, new int[] {1}, 1)[0].getPartialDerivative(1);
        assertEquals(1000 * perPa, perKpa, 1e-12 * Math.abs(perKpa));
    }

    @Test
    void aHumidityInPercentPassedToAFractionParameterIsMultipliedBy0Point01() throws ModelException {
        CompiledModel m = compile("y = air_density(p, t, h)", List.of("p", "t", "h"),
                ModelUnits.none().withInput("p", "Pa").withInput("t", "°C").withInput("h", "%"));
        // CIPM-2007 (Picard et al. 2008), recomputed from the published constants: 1.199314 kg/m^3 at
        // 101325 Pa, 20 °C, 50 % RH (CIPM-2007, Picard et al. 2008, Metrologia 45, 149: recomputed from the published constants)
        assertEquals(1.199314, m.evaluate(new double[] {101325, 20, 50})[0], 5e-7);
    }

    @Test
    void aNumberWrittenAsAWholeArgumentIsTakenInTheDeclaredUnit() throws ModelException {
        CompiledModel m = compile("y = water_density(20) + rho_corr", List.of("rho_corr"),
                ModelUnits.none().withInput("rho_corr", "kg/m^3").withOutput("y", "kg/m^3", ""));
        // Tanaka et al. (2001) table: 20 °C gives 998.2067 kg/m^3
        assertEquals(998.2067, m.evaluate(new double[] {0})[0], 0.00005);
    }

    @Test
    void anArgumentWithAFactorWrittenInTheModelIsPassedUnchangedWithAWarning() throws ModelException {
        CompiledModel m = compile("y = water_density((T1 + T2) / 2)", List.of("T1", "T2"),
                ModelUnits.none().withInput("T1", "°C").withInput("T2", "°C").withOutput("y", "kg/m^3", ""));
        assertTrue(m.warnings().isEmpty(), m.warnings().toString());
        CompiledModel k = compile("y = water_density((T1 + T2) / 2)", List.of("T1", "T2"),
                ModelUnits.none().withInput("T1", "K").withInput("T2", "K").withOutput("y", "kg/m^3", ""));
        assertEquals(1, k.warnings().size(), k.warnings().toString());
        assertTrue(k.warnings().get(0).message().contains("passed unchanged, as °C"), k.warnings().toString());
    }
}
