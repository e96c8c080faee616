package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.TypeA;
import org.quire.engine.budget.TypeB;

/**
 * No value of a template's example is carried into a new budget unasked (every input is a parameter or locked;
 * Type A data always from the user), and a budget whose locked field was changed deviates from its template.
 * The figures here are invented test data; expected values are the inputs themselves or their arithmetic mean
 * and sample standard deviation (JCGM 100:2008 4.2.1, 4.2.2), worked by hand beside each check.
 */
class TemplateValuesAndLocksTest {
    private static final Map<String, Double> RUN = Map.of("m_net", 99.87, "T_tank", 20.4, "V_meter", 100.05);

    /** A template whose Type A input N is given by readings, and M as a summary (mean, s, n). */
    private static final String COUNTER = """
            {"format": "quire-budget", "formatVersion": 2,
             "title": "Pulse count against a reference count (Tarrow Vale Flow Laboratory, test template)",
             "model": ["E = 100 * (N * M / (N_ref * M_ref) - 1)"],
             "outputs": [{"name": "E", "unit": "%"}],
             "inputs": [
               {"name": "N", "unit": "1", "source": "counter log", "evaluation": {"type": "A",
                 "readings": [1000.2, 1000.4, 1000.3]}},
               {"name": "M", "unit": "1", "source": "second counter", "evaluation": {"type": "A",
                 "mean": 500.0, "s": 0.2, "n": 4}},
               {"name": "N_ref", "unit": "1", "source": "reference", "evaluation": {"type": "B",
                 "distribution": "normal", "estimate": 1000, "standardUncertainty": 0.1}},
               {"name": "M_ref", "unit": "1", "source": "method", "evaluation": {"type": "B",
                 "distribution": "constant", "estimate": 500}}],
             "template": {"id": "tvfl-counter-test", "version": 1,
               "parameters": [
                 {"name": "N", "input": "N", "field": "readings", "minimum": 0, "maximum": 100000},
                 {"name": "M", "input": "M", "field": "estimate"},
                 {"name": "M_s", "input": "M", "field": "standardDeviation"},
                 {"name": "M_n", "input": "M", "field": "count"},
                 {"name": "N_ref", "input": "N_ref", "field": "estimate"}],
               "locked": ["model", "outputs", "M_ref"]}}
            """;

    private static Template counter(String text) throws Exception {
        return Template.of(DocumentJson.read(text, Fixtures.T0));
    }

    @Test
    void anOriginLocksAPartOfTheBudgetOnlyWhenItsTemplateListsIt() {
        TemplateOrigin o = new TemplateOrigin("tvfl-tank", 1, "0".repeat(64), List.of("model", "settings", "V_20"));
        assertTrue(o.locksPart("settings"));
        assertTrue(o.locksPart("model"));
        assertTrue(!o.locksPart("correlations"));
        assertThrows(IllegalArgumentException.class, () -> o.locksPart("V_20"), "an input is not a part");
    }

    @Test
    void theExampleReadingsAreNeverCarriedIntoANewBudget() throws Exception {
        Template t = counter(COUNTER);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> t.budgetFor(
                Map.of("M", 501.0, "M_s", 0.3, "M_n", 5.0, "N_ref", 999.0)));
        assertTrue(e.getMessage().contains("parameter 'N' (the readings of input 'N') must be given"), e.getMessage());

        TemplateValues v = TemplateValues.of(Map.of("M", 501.0, "M_s", 0.3, "M_n", 5.0, "N_ref", 999.0))
                .withReadings("N", new double[] {998.0, 1000.0, 1002.0, 1004.0});
        Budget b = t.budgetFor(v);
        TypeA n = (TypeA) b.input("N").evaluation();
        assertArrayEquals(new double[] {998.0, 1000.0, 1002.0, 1004.0}, n.readings());
        // mean 1001, s = sqrt((9 + 1 + 1 + 9) / 3) = sqrt(20/3) (JCGM 100:2008 4.2.1, 4.2.2), by hand
        assertEquals(1001.0, n.estimate(), 1e-12);
        assertEquals(Math.sqrt(20.0 / 3.0), n.standardDeviation(), 1e-12);
        TypeA m = (TypeA) b.input("M").evaluation();
        assertEquals(501.0, m.estimate());
        assertEquals(0.3, m.standardDeviation());
        assertEquals(5, m.count());

        IllegalArgumentException out = assertThrows(IllegalArgumentException.class, () -> t.budgetFor(
                v.withReadings("N", new double[] {998.0, -3.0})));
        assertTrue(out.getMessage().contains("reading 2 of parameter 'N' = -3.0 lies outside"), out.getMessage());
        IllegalArgumentException notWhole = assertThrows(IllegalArgumentException.class, () -> t.budgetFor(
                TemplateValues.of(Map.of("M", 501.0, "M_s", 0.3, "M_n", 4.5, "N_ref", 999.0))
                        .withReadings("N", new double[] {1, 2})));
        assertTrue(notWhole.getMessage().contains("'M_n' = 4.5: the number of observations must be a whole number"),
                notWhole.getMessage());
    }

    @Test
    void theUsersReadingsAreNoChangeWhenANewerTemplateVersionIsCompared() throws Exception {
        Template v1 = counter(COUNTER);
        Template v2 = counter(COUNTER.replace("\"version\": 1", "\"version\": 2")
                .replace("\"source\": \"method\"", "\"source\": \"method, revised\""));
        BudgetDocument d = v1.instantiate(TemplateValues.of(Map.of("M", 501.0, "M_s", 0.3, "M_n", 5.0,
                "N_ref", 999.0)).withReadings("N", new double[] {998.0, 1000.0}), "Ash Penrose", Fixtures.T0);
        List<TemplateChange> changes = TemplateLibrary.compare(d, v2);
        assertEquals(1, changes.size(), changes.toString());
        assertEquals(TemplateChange.Kind.SOURCE_CHANGED, changes.get(0).kind());
        assertEquals("M_ref", changes.get(0).subject());
        BudgetDocument adopted = TemplateLibrary.adopt(d, v2, changes, "Ash Penrose", Fixtures.T0);
        assertArrayEquals(new double[] {998.0, 1000.0}, ((TypeA) adopted.budget().input("N").evaluation()).readings());
        assertEquals(2, adopted.templateOrigin().version());
    }

    @Test
    void aTemplateThatLeavesAnInputNeitherAParameterNorLockedIsRefused() throws Exception {
        Template noLock = counter(COUNTER.replace("\"M_ref\"]", "\"outputs\"]"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> noLock.budgetFor(
                TemplateValues.of(Map.of("M", 501.0, "M_s", 0.3, "M_n", 5.0, "N_ref", 999.0))
                        .withReadings("N", new double[] {1, 2})));
        assertTrue(e.getMessage().contains("input 'M_ref' is neither set by a parameter nor locked"), e.getMessage());

        Template noS = counter(COUNTER.replace("{\"name\": \"M_s\", \"input\": \"M\", \"field\": \"standardDeviation\"},", ""));
        IllegalArgumentException s = assertThrows(IllegalArgumentException.class, () -> noS.budgetFor(
                TemplateValues.of(Map.of("M", 501.0, "M_n", 5.0, "N_ref", 999.0)).withReadings("N", new double[] {1, 2})));
        assertTrue(s.getMessage().contains("input 'M' is a Type A evaluation, the data of one measurement, but no "
                + "parameter sets its standardDeviation"), s.getMessage());
        assertTrue(TemplateLibrary.completenessProblems(noS.document(), "Ash Penrose").stream()
                .anyMatch(p -> p.contains("no parameter sets its standardDeviation")));
    }

    @Test
    void theTemplatesLaboratoryIsNotCarriedOverButTheGivenOneIs() throws Exception {
        Template t = Fixtures.templateV1();
        BudgetDocument d = t.instantiate(TemplateValues.of(RUN).withLaboratory("Tarrow Vale Field Services")
                .withDeviceUnderTest("TV-EM-80-12"), "Ash Penrose", Fixtures.T0);
        assertEquals("Tarrow Vale Field Services", d.laboratory());
        assertEquals("TV-EM-80-12", d.deviceUnderTest());
        assertEquals(t.spec().locked(), d.templateOrigin().locked());
        assertTrue(d.templateOrigin().isLocked("rho_20", "evaluation"));
        assertTrue(d.templateOrigin().isLocked("k_b", "estimate"));
        assertTrue(!d.templateOrigin().isLocked("m_net", "estimate"));
        // the recorded locks survive a save and a read
        BudgetDocument again = DocumentJson.read(CanonicalJson.write(DocumentJson.toJson(d)), Fixtures.T0);
        assertEquals(d.templateOrigin(), again.templateOrigin());
    }

    @Test
    void aLockedUncertaintyCutByAFactorOf30IsADeviationNamingFieldAndBothValues(@TempDir Path dir) throws Exception {
        Path shipped = Files.createDirectories(dir.resolve("shipped"));
        Files.writeString(shipped.resolve("grav-v1.json"), Fixtures.text("tvfl-gravimetric-water-v1.json"));
        TemplateLibrary lib = TemplateLibrary.of(shipped, null, null);
        Template t = Fixtures.templateV1();
        BudgetDocument d = t.instantiate(RUN, "Ash Penrose", Fixtures.T0);
        assertEquals(TemplateConformance.State.FOLLOWS, TemplateConformance.check(d, lib).state());

        InputQuantity rho = d.budget().input("rho_20");
        // the template's half-width 0.05 kg/m^3, cut by 30: 0.05 / 30
        BudgetDocument cut = d.withBudget(d.budget().withInput("rho_20", rho.withEvaluation(
                ((TypeB) rho.evaluation()).with("halfWidth", 0.05 / 30))), "Ash Penrose", Fixtures.T0);
        TemplateConformance.Finding f = TemplateConformance.check(cut, lib);
        assertEquals(TemplateConformance.State.DEVIATES, f.state());
        assertEquals(List.of(new TemplateConformance.Deviation("tvfl-gravimetric-water", 1,
                "rho_20.evaluation.halfWidth", "0.05", "0.0016666666666666668")),
                f.deviations());
        assertTrue(f.isFinding());
        assertTrue(f.messages().get(0).contains("'rho_20.evaluation.halfWidth'"), f.messages().get(0));

        // a parameter's field is the user's: changing it is no deviation
        InputQuantity m = d.budget().input("m_net");
        BudgetDocument own = d.withBudget(d.budget().withInput("m_net", m.withEvaluation(
                ((TypeB) m.evaluation()).with("expandedUncertainty", 0.004))), "Ash Penrose", Fixtures.T0);
        assertEquals(TemplateConformance.State.FOLLOWS, TemplateConformance.check(own, lib).state());

        // a removed locked input deviates; a budget from a template the library does not hold cannot be checked
        List<InputQuantity> fewer = new java.util.ArrayList<>(d.budget().inputs());
        fewer.removeIf(q -> q.name().equals("beta_w"));
        BudgetDocument removed = d.withBudget(d.budget().withInputs(fewer), "Ash Penrose", Fixtures.T0);
        assertEquals("beta_w", TemplateConformance.deviations(t, removed.budget()).get(0).field());
        TemplateConformance.Finding missing = TemplateConformance.check(d, TemplateLibrary.of(null, null, null));
        assertEquals(TemplateConformance.State.TEMPLATE_NOT_FOUND, missing.state());
        assertTrue(missing.isFinding());
    }
}
