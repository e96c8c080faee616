package org.quire.engine.gum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.junit.jupiter.api.Test;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelCompiler;
import org.quire.engine.model.ModelException;

/**
 * Sensitivity coefficients (JCGM 100:2008 5.1.3, eq. 11a) by automatic differentiation, cross-checked against
 * central differences (common practice: step h = 1e-5 |x|, error O(h^2)).
 */
class SensitivityCoefficientTest {

    private static void crossCheck(String model, List<String> inputs, String output, double... x) throws ModelException {
        CompiledModel m = ModelCompiler.compile(model, inputs, List.of(output),
                FunctionLibrary.standard().with(org.quire.engine.flow.FlowFunctions.all()));
        int[] active = new int[x.length];
        for (int i = 0; i < x.length; i++) {
            active[i] = i;
        }
        DerivativeStructure y = m.derivatives(x, active, 1)[0];
        double[] reverse = m.sensitivities(x, active)[0];
        for (int i = 0; i < x.length; i++) {
            double h = 1e-5 * Math.max(Math.abs(x[i]), 1e-3);
            double[] up = x.clone();
            double[] down = x.clone();
            up[i] += h;
            down[i] -= h;
            double fd = (m.evaluate(up)[0] - m.evaluate(down)[0]) / (2 * h);
            int[] orders = new int[x.length];
            orders[i] = 1;
            double ad = y.getPartialDerivative(orders);
            assertEquals(fd, ad, 1e-6 * Math.max(1, Math.abs(fd)), "d" + output + "/d" + inputs.get(i));
            // the reverse mode that the GUM evaluation uses, against the same central differences
            assertEquals(fd, reverse[i], 1e-6 * Math.max(1, Math.abs(fd)), "reverse d" + output + "/d" + inputs.get(i));
        }
    }

    @Test
    void resistanceModelOfJcgm100H2() throws ModelException {
        // JCGM 100:2008 H.2 model R = (V/I) cos(phi), at the means of Table H.2
        crossCheck("R = V / (I / 1000) * cos(phi)", List.of("V", "I", "phi"), "R", 4.999, 19.661, 1.04446);
    }

    @Test
    void massCalibrationModelOfJcgm101() throws ModelException {
        // JCGM 101:2008 9.3 model, at its estimates
        crossCheck("d = (m + dm) * (1 + (ra - 1.2) * (1 / rw - 1 / rr)) - 100000",
                List.of("m", "dm", "ra", "rw", "rr"), "d", 100000, 1.234, 1.2, 8000, 8000);
    }

    @Test
    void everyStandardFunctionAndPower() throws ModelException {
        crossCheck("y = sqrt(a) * exp(b) + ln(c) * log10(a) + sin(b) * cos(c) + tan(b) + asin(b) + acos(b) + atan(c)"
                + " + abs(-a) + max(a, c) - min(a, c) + a^c + a^3 + a^-2",
                List.of("a", "b", "c"), "y", 2.5, 0.3, 1.7);
    }

    @Test
    void libraryFunctionsUnitConversionsAndPowersOfExpressions() throws ModelException {
        // water_density (a library function, its partials from its derivative structure), a power whose exponent
        // is an expression, and a quantity used twice
        crossCheck("r = water_density(T)\ns = r * a^(b * c) - r / (a - b) + max(c, b) * -a", List.of("T", "a", "b", "c"),
                "s", 20.31, 1.3, 0.4, 0.9);
    }

    @Test
    void intermediateQuantitiesAndFunctionsOfTheModel() throws ModelException {
        crossCheck("rho(T) = 999.97495 * (1 - (T - 3.983035)^2 * (T + 301.797) / (522528.9 * (T + 69.34881)))\n"
                + "m = I * (1 - ra / 8000) / (1 - ra / rho(T1))\nV = 1000 * m / rho(T2)\ny = 100 * (Vi - V) / V",
                List.of("I", "ra", "T1", "T2", "Vi"), "y", 1000.212, 1.195, 20.42, 20.31, 1002.35);
    }
}
