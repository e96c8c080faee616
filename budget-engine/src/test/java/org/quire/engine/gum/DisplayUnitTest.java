package org.quire.engine.gum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeB;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;

/**
 * Display units of outputs: the model computes in the stated unit and the results are shown in another of the
 * same dimension; the estimate converts as a value, u_c, U, u_i(y) and c_i as differences (NIST SP 811 (2008)
 * clause 4.2.1.1 and Appendix B).
 */
class DisplayUnitTest {
    private static final FunctionLibrary LIBRARY = FunctionLibrary.standard();

    private static InputQuantity normal(String name, String unit, double x, double u) {
        return InputQuantity.of(name, TypeB.of("normal", Map.of("estimate", x, "standardUncertainty", u)))
                .withUnit(unit);
    }

    private static Budget flowBudget(String display) {
        return Budget.of("q = q_ref * k\nq_ref_out = q_ref",
                List.of(new OutputQuantity("q", "m^3/h", "volume flow rate", display),
                        new OutputQuantity("q_ref_out", "m^3/h", "reference flow rate")),
                List.of(normal("q_ref", "m^3/h", 12.0, 0.03), normal("k", "1", 1.002, 0.0005)));
    }

    @Test
    void aFlowInCubicMetresPerHourIsShownInLitresPerMinute() throws ModelException {
        // NIST SP 811 B.8 (exact): 1 L = 10^-3 m^3, 1 h = 3600 s, 1 min = 60 s, so 1 m^3/h = 1000/60 L/min
        double f = 1000.0 / 60.0;
        OutputResult base = GumEvaluator.evaluate(flowBudget(""), LIBRARY).output("q");
        GumResult shownAll = GumEvaluator.evaluate(flowBudget("L/min"), LIBRARY);
        OutputResult shown = shownAll.output("q");
        assertEquals("L/min", shown.unit());
        // 12.0 m^3/h × 1.002 = 12.024 m^3/h = 200.4 L/min, worked by hand
        assertEquals(200.4, shown.estimate(), 1e-12);
        assertEquals(base.standardUncertainty() * f, shown.standardUncertainty(), 1e-12);
        assertEquals(base.expandedUncertainty() * f, shown.expandedUncertainty(), 1e-12);
        assertEquals(base.coverageFactor(), shown.coverageFactor(), 0);
        for (String in : List.of("q_ref", "k")) {
            Contribution b = base.contribution(in);
            Contribution s = shown.contribution(in);
            assertEquals(b.contribution() * f, s.contribution(), 1e-12 * Math.abs(s.contribution()));
            assertEquals(b.sensitivity() * f, s.sensitivity(), 1e-12 * Math.abs(s.sensitivity()));
            assertEquals(b.share(), s.share(), 0);
            assertEquals(b.estimate(), s.estimate(), 0);
        }
        // c(q, q_ref) = k = 1.002 (L/min)/(m^3/h) × 1000/60, worked by hand
        assertEquals(1.002 * f, shown.contribution("q_ref").sensitivity(), 1e-12);
        // the covariance of the outputs scales with the factor of each output shown in another unit
        GumResult baseAll = GumEvaluator.evaluate(flowBudget(""), LIBRARY);
        assertEquals(baseAll.covariance()[0][1] * f, shownAll.covariance()[0][1], 1e-15);
        assertEquals(baseAll.covariance()[0][0] * f * f, shownAll.covariance()[0][0], 1e-12);
        assertEquals(baseAll.correlation()[0][1], shownAll.correlation()[0][1], 1e-12);
        // the other output keeps its unit
        assertEquals("m^3/h", shownAll.output("q_ref_out").unit());
    }

    @Test
    void aCelsiusTemperatureShownInKelvinShiftsTheEstimateOnly() throws ModelException {
        Budget b = Budget.of("t = t_read + d_t",
                List.of(new OutputQuantity("t", "°C", "water temperature", "K")),
                List.of(normal("t_read", "°C", 20.0, 0.05), normal("d_t", "°C", 0.3, 0.02)));
        OutputResult base = GumEvaluator.evaluate(b.withOutputs(List.of(new OutputQuantity("t", "°C", ""))),
                LIBRARY).output("t");
        OutputResult shown = GumEvaluator.evaluate(b, LIBRARY).output("t");
        assertEquals("K", shown.unit());
        // NIST SP 811 4.2.1.1: T/K = t/°C + 273.15; 20.3 °C is 293.45 K
        assertEquals(293.45, shown.estimate(), 1e-12);
        // a temperature interval of 1 °C is 1 K: u_c and U unchanged
        assertEquals(base.standardUncertainty(), shown.standardUncertainty(), 0);
        assertEquals(base.expandedUncertainty(), shown.expandedUncertainty(), 0);
        assertEquals(1.0, shown.contribution("t_read").sensitivity(), 0);
        assertEquals(0.05, shown.contribution("t_read").contribution(), 1e-15);
    }

    @Test
    void aDisplayUnitOfAnotherDimensionIsAnErrorNamingOutputAndBothUnits() {
        Budget b = flowBudget("kg/s");
        ModelException e = assertThrows(ModelException.class, () -> GumEvaluator.evaluate(b, LIBRARY));
        String m = e.problems().get(0).message();
        assertTrue(m.contains("output q ") && m.contains("m^3/h") && m.contains("kg/s"), m);
    }

    @Test
    void anUnreadableDisplayUnitIsAnErrorNamingTheOutput() {
        ModelException e = assertThrows(ModelException.class,
                () -> GumEvaluator.evaluate(flowBudget("L/mn"), LIBRARY));
        String m = e.problems().get(0).message();
        assertTrue(m.startsWith("output 'q': display unit: cannot read unit \"L/mn\""), m);
    }

    @Test
    void theDisplayUnitIsReadAndWrittenInBudgetFiles() throws BudgetFormatException {
        Budget b = flowBudget("L/min");
        String json = BudgetJson.write(b);
        assertTrue(json.contains("\"displayUnit\"") && json.contains("L/min"), json);
        Budget back = BudgetJson.read(json);
        assertEquals("L/min", back.outputs().get(0).displayUnit());
        assertEquals("", back.outputs().get(1).displayUnit());
        assertEquals(b, back);
    }
}
