package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.model.FunctionLibrary;

/**
 * A template prepared once for a batch gives, for every set of values, the budget and the GUM result that the
 * template and the evaluator give on their own, with the same refusals; with a correlation between inputs the
 * matrix is worked out for each budget. The figures are invented test data (Tarrow Vale Flow Laboratory); the
 * one expected result is worked by hand beside its check.
 */
class PreparedTemplateTest {
    /** E from a pulse count against a reference count; {@code %s} is the budget's correlations. */
    private static final String COUNTER = """
            {"format": "quire-budget", "formatVersion": 2,
             "title": "Pulse count against a reference count (Tarrow Vale Flow Laboratory, test template)",
             "model": ["E = 100 * (N * M / (N_ref * M_ref) - 1)"],
             "outputs": [{"name": "E", "unit": "%%"}],
             "inputs": [
               {"name": "N", "unit": "1", "source": "counter log", "evaluation": {"type": "A",
                 "readings": [1000.2, 1000.4, 1000.3]}},
               {"name": "M", "unit": "1", "source": "second counter", "evaluation": {"type": "B",
                 "distribution": "normal", "estimate": 500.0, "standardUncertainty": 0.2}},
               {"name": "N_ref", "unit": "1", "source": "reference", "evaluation": {"type": "B",
                 "distribution": "normal", "estimate": 1000, "standardUncertainty": 0.1}},
               {"name": "M_ref", "unit": "1", "source": "method", "evaluation": {"type": "B",
                 "distribution": "constant", "estimate": 500}}],
             "correlations": [%s],
             "template": {"id": "tvfl-counter-prepared-test", "version": 1,
               "parameters": [
                 {"name": "N", "input": "N", "field": "readings", "minimum": 0, "maximum": 100000},
                 {"name": "M", "input": "M", "field": "estimate"},
                 {"name": "N_ref", "input": "N_ref", "field": "estimate"}],
               "locked": ["model", "outputs", "M_ref"]}}
            """;
    private static final String CORRELATED = """
            {"inputs": ["M", "N_ref"], "r": 0.5, "justification": "one counter's gate times both"}""";

    private static Template template(String correlations) throws Exception {
        return Template.of(DocumentJson.read(String.format(java.util.Locale.ROOT, COUNTER, correlations), Fixtures.T0));
    }

    private static TemplateValues values(double m, double nRef, double... readings) {
        return TemplateValues.of(Map.of("M", m, "N_ref", nRef)).withReadings("N", readings);
    }

    private static void assertSameResult(GumResult expected, GumResult actual) {
        assertEquals(expected.outputs().size(), actual.outputs().size());
        for (int i = 0; i < expected.outputs().size(); i++) {
            OutputResult e = expected.outputs().get(i);
            OutputResult a = actual.outputs().get(i);
            assertEquals(e.estimate(), a.estimate(), 0.0, e.name());
            assertEquals(e.standardUncertainty(), a.standardUncertainty(), 0.0, e.name());
            assertEquals(e.effectiveDof(), a.effectiveDof(), 0.0, e.name());
            assertEquals(e.coverageFactor(), a.coverageFactor(), 0.0, e.name());
            assertEquals(e.expandedUncertainty(), a.expandedUncertainty(), 0.0, e.name());
            assertEquals(e.correlationVariance(), a.correlationVariance(), 0.0, e.name());
        }
    }

    @Test
    void everyRowGivesWhatTheTemplateAndTheEvaluatorGiveAlone() throws Exception {
        FunctionLibrary library = FunctionLibrary.standard();
        for (String correlations : new String[] {"", CORRELATED}) {
            Template t = template(correlations);
            PreparedTemplate prepared = PreparedTemplate.of(t, library);
            double[][] rows = {{501.0, 999.0, 998.0, 1000.0, 1002.0, 1004.0}, {499.5, 1000.5, 1000.0, 1000.1},
                {500.0, 1000.0, 1000.3, 1000.2, 1000.4}};
            for (double[] row : rows) {
                TemplateValues v = values(row[0], row[1], java.util.Arrays.copyOfRange(row, 2, row.length));
                Budget alone = t.budgetFor(v);
                Budget b = prepared.budgetFor(v);
                assertEquals(alone, b, "the budget of the row");
                GumResult batch = prepared.evaluate(b);
                assertSameResult(GumEvaluator.evaluate(alone, library), batch);
                // c(M) > 0 and c(N_ref) < 0, so r = 0.5 makes the covariance term negative (JCGM 100:2008 5.2.2)
                assertEquals(!correlations.isEmpty(), batch.outputs().get(0).correlationVariance() < 0,
                        "the correlation counts exactly when given");
            }
        }
        // by hand, the first row: N = mean(998, 1000, 1002, 1004) = 1001, E = 100 (1001 * 501 / (999 * 500) - 1)
        // = 100 * 2001 / 499500 = 0.40060060 %
        PreparedTemplate p = PreparedTemplate.of(template(""), library);
        GumResult r = p.evaluate(p.budgetFor(values(501.0, 999.0, 998.0, 1000.0, 1002.0, 1004.0)));
        assertEquals(100.0 * 2001 / 499500, r.outputs().get(0).estimate(), 1e-12);
        // u(E) by JCGM 100:2008 5.1.2, worked by hand: u(N) = s / sqrt(4) = sqrt(20/3) / 2 = 1.290994 (4.2.3);
        // c(N) = 100 M / (N_ref M_ref) = 0.1003003, c(M) = 100 N / (N_ref M_ref) = 0.2004004,
        // c(N_ref) = -100 N M / (N_ref^2 M_ref) = -0.1005011 (per unit of each);
        // u^2 = (0.1003003 * 1.290994)^2 + (0.2004004 * 0.2)^2 + (0.1005011 * 0.1)^2 = 0.0184743, u = 0.135920 %
        assertEquals(0.135920, r.outputs().get(0).standardUncertainty(), 5e-7);
    }

    @Test
    void aRowMissingAValueIsRefusedWithTheTemplatesOwnMessage() throws Exception {
        Template t = template("");
        PreparedTemplate prepared = PreparedTemplate.of(t, FunctionLibrary.standard());
        TemplateValues noReadings = TemplateValues.of(Map.of("M", 501.0, "N_ref", 999.0));
        IllegalArgumentException alone = assertThrows(IllegalArgumentException.class, () -> t.budgetFor(noReadings));
        IllegalArgumentException batch = assertThrows(IllegalArgumentException.class,
                () -> prepared.budgetFor(noReadings));
        assertEquals(alone.getMessage(), batch.getMessage());
        // and the refusal of one row does not spoil the next
        Budget next = prepared.budgetFor(values(501.0, 999.0, 1000.0, 1001.0));
        assertEquals(1000.5, next.input("N").evaluation().estimate(), 1e-12, "the next row's mean of 1000 and 1001");
    }
}
