package org.quire.engine.flow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.quire.engine.model.ModelFunction;
import org.quire.engine.units.Units;

/**
 * The contract of {@link ModelFunction} for every flow function: the DerivativeStructure form agrees with the
 * double form and its derivatives with central finite differences (first and second order), the block form
 * equals the double form, units parse, and non-finite arguments and wrong arity are refused.
 */
class FlowFunctionsTest {

    /** Nominal arguments inside each function's domain, for every arity it accepts. */
    private static final Map<String, List<double[]>> NOMINAL = Map.ofEntries(
            Map.entry("water_density", List.of(new double[] {21.3}, new double[] {21.3, 350000.0})),
            Map.entry("water_density_air_saturated", List.of(new double[] {18.7}, new double[] {18.7, 250000.0})),
            Map.entry("air_density", List.of(new double[] {99850.0, 21.4, 0.45},
                    new double[] {99850.0, 21.4, 0.45, 0.00052})),
            Map.entry("buoyancy_factor", List.of(new double[] {1.18, 998.1}, new double[] {1.18, 998.1, 7950.0})),
            Map.entry("conventional_mass", List.of(new double[] {99.8, 998.1})),
            Map.entry("linear_expansion", List.of(new double[] {16.5e-6, 27.2}, new double[] {16.5e-6, 27.2, 21.0})),
            Map.entry("area_expansion", List.of(new double[] {16.5e-6, 27.2}, new double[] {16.5e-6, 27.2, 21.0})),
            Map.entry("volume_expansion", List.of(new double[] {16.5e-6, 27.2}, new double[] {16.5e-6, 27.2, 21.0})),
            Map.entry("induced_voltage", List.of(new double[] {0.97, 3.2e-3, 0.0508, 1.7})),
            Map.entry("pipe_flow", List.of(new double[] {0.0508, 1.7})),
            Map.entry("velocity_from_flow", List.of(new double[] {3.4e-3, 0.0508})),
            Map.entry("pulse_volume", List.of(new double[] {12345.0, 251.3})));

    static Stream<Arguments> cases() {
        List<Arguments> list = new ArrayList<>();
        for (ModelFunction f : FlowFunctions.all()) {
            List<double[]> points = NOMINAL.get(f.name());
            assertNotNull(points, "no nominal point for " + f.name());
            for (double[] p : points) {
                list.add(Arguments.of(f.name() + "/" + p.length, f, p));
            }
        }
        return list.stream();
    }

    @Test
    void everyArityIsCovered() {
        for (ModelFunction f : FlowFunctions.all()) {
            Set<Integer> arities = new HashSet<>();
            NOMINAL.get(f.name()).forEach(p -> arities.add(p.length));
            for (int n = f.minArity(); n <= f.maxArity(); n++) {
                assertTrue(arities.contains(n), f.name() + " arity " + n);
            }
        }
    }

    @Test
    void namesAreUniqueLowerSnakeCase() {
        Set<String> names = new HashSet<>();
        for (ModelFunction f : FlowFunctions.all()) {
            assertTrue(f.name().matches("[a-z][a-z0-9]*(_[a-z0-9]+)*"), f.name());
            assertTrue(names.add(f.name()), f.name());
            assertTrue(FlowFunctions.named(f.name()).isPresent());
        }
        assertTrue(FlowFunctions.named("no_such_function").isEmpty());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void unitsAreReadableAndOnePerParameter(String label, ModelFunction f, double[] x) {
        assertEquals(f.parameters().size(), f.argumentUnits().size(), label);
        f.argumentUnits().forEach(Units::parse);
        assertNotNull(Units.parse(f.resultUnit()));
        assertTrue(f.description().endsWith("."), label);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void derivativeStructureValueEqualsDoubleValue(String label, ModelFunction f, double[] x) {
        assertNull(f.domainProblem(x), label);
        double v = f.value(x);
        assertEquals(v, f.value(variables(x, 1)).getValue(), 1e-14 * Math.abs(v), label);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void firstDerivativesMatchCentralDifferences(String label, ModelFunction f, double[] x) {
        DerivativeStructure y = f.value(variables(x, 1));
        double scale = Math.abs(f.value(x));
        for (int i = 0; i < x.length; i++) {
            double h = 1e-5 * Math.max(Math.abs(x[i]), 1e-6);
            double fd = (f.value(shift(x, i, h)) - f.value(shift(x, i, -h))) / (2 * h);
            int[] orders = new int[x.length];
            orders[i] = 1;
            double ad = y.getPartialDerivative(orders);
            // truncation O(h^2 f''') and rounding O(eps f / h)
            double tol = 1e-7 * Math.abs(fd) + 1e-9 * scale / Math.max(Math.abs(x[i]), 1e-6);
            assertEquals(fd, ad, tol, label + " d/d" + f.parameters().get(i));
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void secondDerivativesMatchDifferencesOfFirstDerivatives(String label, ModelFunction f, double[] x) {
        DerivativeStructure y = f.value(variables(x, 2));
        for (int i = 0; i < x.length; i++) {
            for (int j = 0; j < x.length; j++) {
                double h = 1e-5 * Math.max(Math.abs(x[j]), 1e-6);
                int[] first = new int[x.length];
                first[i] = 1;
                double fd = (f.value(variables(shift(x, j, h), 1)).getPartialDerivative(first)
                        - f.value(variables(shift(x, j, -h), 1)).getPartialDerivative(first)) / (2 * h);
                int[] second = new int[x.length];
                second[i]++;
                second[j]++;
                double ad = y.getPartialDerivative(second);
                double firstScale = Math.abs(f.value(variables(x, 1)).getPartialDerivative(first));
                double tol = 1e-6 * Math.abs(fd) + 1e-9 * firstScale / Math.max(Math.abs(x[j]), 1e-6);
                assertEquals(fd, ad, tol, label + " d2/d" + f.parameters().get(i) + "d" + f.parameters().get(j));
            }
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void blockValueEqualsDoubleValueAndIsNaNOutsideDomain(String label, ModelFunction f, double[] x) {
        int n = 7;
        double[][] block = new double[x.length][n];
        for (int t = 0; t < n; t++) {
            for (int i = 0; i < x.length; i++) {
                block[i][t] = x[i] * (1 + 0.001 * (t - 3) * (i + 1));
            }
        }
        block[0][n - 1] = Double.NaN; // a trial with a non-finite argument leaves the domain
        double[] out = new double[n];
        f.valueBlock(block, n, out);
        for (int t = 0; t < n - 1; t++) {
            double[] a = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                a[i] = block[i][t];
            }
            assertNull(f.domainProblem(a), label + " trial " + t);
            assertEquals(f.value(a), out[t], 0.0, label + " trial " + t);
        }
        assertTrue(Double.isNaN(out[n - 1]), label);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void blockDomainMatchesTheScalarDomainCheckEverywhere(String label, ModelFunction f, double[] x) {
        // arguments scattered from -3x to +5x around the case's point, with zeros, NaN and infinities: the block
        // path (vectorised domain test) must give the scalar path's value where domainProblem is null, NaN elsewhere
        int n = 4000;
        java.util.Random rng = new java.util.Random(label.hashCode());
        double[] special = {0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, -1.0};
        double[][] block = new double[x.length][n];
        for (int t = 0; t < n; t++) {
            for (int i = 0; i < x.length; i++) {
                double r = rng.nextDouble();
                double scale = x[i] == 0 ? 1.0 : x[i];
                block[i][t] = r < 0.05 ? special[rng.nextInt(special.length)]
                        : r < 0.5 ? x[i] * (1 + 0.02 * rng.nextGaussian()) : scale * (-3 + 8 * rng.nextDouble());
            }
        }
        double[] out = new double[n];
        f.valueBlock(block, n, out);
        int inside = 0;
        for (int t = 0; t < n; t++) {
            double[] a = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                a[i] = block[i][t];
            }
            if (f.domainProblem(a) == null) {
                inside++;
                assertEquals(f.value(a), out[t], 0.0, label + " trial " + t + " " + java.util.Arrays.toString(a));
            } else {
                assertTrue(Double.isNaN(out[t]), label + " trial " + t + " " + java.util.Arrays.toString(a));
            }
        }
        assertTrue(inside > 0, label + ": some trials lie inside the domain");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void nonFiniteArgumentIsNamed(String label, ModelFunction f, double[] x) {
        double[] bad = x.clone();
        bad[0] = Double.POSITIVE_INFINITY;
        assertEquals("argument " + f.parameters().get(0) + " of " + f.name() + " is Infinity, not a finite number",
                f.domainProblem(bad));
    }

    @Test
    void wrongArityIsRefused() {
        ModelFunction f = FlowFunctions.named("air_density").orElseThrow();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> f.value(new double[] {1e5, 20.0}));
        assertEquals("air_density takes 3 to 4 arguments, not 2", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> f.domainProblem(new double[5]));
    }

    private static DerivativeStructure[] variables(double[] x, int order) {
        DerivativeStructure[] d = new DerivativeStructure[x.length];
        for (int i = 0; i < x.length; i++) {
            d[i] = new DerivativeStructure(x.length, order, i, x[i]);
        }
        return d;
    }

    private static double[] shift(double[] x, int i, double h) {
        double[] y = x.clone();
        y[i] += h;
        return y;
    }
}
