package org.quire.app;

import org.quire.app.common.Engine;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.gum.Contribution;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.model.ModelProblem;

/**
 * The budget templates shipped in {@code templates/}: each opens, evaluates without model or result warnings
 * with the application's function library, documents itself and its inputs, and reproduces the estimates and
 * combined standard uncertainties of an independent GUM evaluation (JCGM 100:2008 5.1.2).
 */
class ShippedTemplatesTest {

    /** Expected figures per file and output: {estimate, tolerance, u_c, tolerance}. */
    private static final Map<String, Map<String, double[]>> EXPECTED = new LinkedHashMap<>();

    private static void expect(String file, String output, double y, double tolY, double uc, double tolU) {
        EXPECTED.computeIfAbsent(file, f -> new LinkedHashMap<>()).put(output, new double[] {y, tolY, uc, tolU});
    }

    static {
        // Independent GUM by central differences, Python script, see test resource README
        // (templates-check/check_templates.py: its own Tanaka (2001) and CIPM-2007 formulas, the models written
        // out again, JCGM 100:2008 5.1.2 eq. 10). Tolerance: half a unit in the last digit the script prints
        // (estimate to 9 significant digits, u_c to 6).
        expect("gravimetric-emf-flow-point.json", "E", 0.120164490, 5e-10, 0.0292704, 5e-08);
        expect("gravimetric-emf-flow-point.json", "q", 49.9996182, 5e-08, 0.00446463, 5e-09);
        expect("master-meter-comparison.json", "E", 0.273349060, 5e-10, 0.0609929, 5e-08);
        expect("field-verification-clamp-on.json", "E", -1.04287078, 5e-09, 1.27242, 5e-06);
        expect("field-verification-clamp-on.json", "q_ref", 1786.83437, 5e-06, 22.9110, 5e-05);
        expect("emf-electronics-low-velocity.json", "E_lo", 0.666666667, 5e-10, 1.28928, 5e-06);
        expect("emf-electronics-low-velocity.json", "E_hi", 0.0666666667, 5e-11, 0.149668, 5e-07);
        expect("emf-electronics-low-velocity.json", "q_lo", 8.53884883, 5e-09, 0.109361, 5e-07);
        expect("emf-electronics-low-velocity.json", "q_hi", 84.8795503, 5e-08, 0.126953, 5e-07);
        expect("volumetric-proving-tank.json", "E", -0.326646861, 5e-10, 0.0145596, 5e-08);
        // the same script's gravimetric_run model (one run of a calibration across the range; gum() on this file)
        expect("tvfl-emf-gravimetric-calibration-run.json", "E", -0.274140983, 5e-10, 0.0250434, 5e-08);
        expect("tvfl-emf-gravimetric-calibration-run.json", "q", 60.1649367, 5e-08, 0.00524755, 5e-09);
    }

    /** The templates folder: the test's working directory is app/, so ../templates, else templates. */
    static Path templatesFolder() {
        for (String candidate : List.of("../templates", "templates")) {
            Path p = Paths.get(candidate);
            if (Files.isDirectory(p)) {
                return p;
            }
        }
        throw new AssertionError("no templates folder found from " + Paths.get("").toAbsolutePath());
    }

    static List<Path> templateFiles() throws IOException {
        try (Stream<Path> s = Files.list(templatesFolder())) {
            return s.filter(p -> p.getFileName().toString().endsWith(".json")).sorted().toList();
        }
    }

    private static GumResult evaluate(String file) throws Exception {
        Budget b = BudgetJson.read(templatesFolder().resolve(file));
        return GumEvaluator.evaluate(b, Engine.standard().library());
    }

    @Test
    void everyShippedTemplateHasIndependentlyComputedFigures() throws IOException {
        TreeSet<String> files = new TreeSet<>();
        for (Path p : templateFiles()) {
            files.add(p.getFileName().toString());
        }
        assertEquals(new TreeSet<>(EXPECTED.keySet()), files,
                "every template in templates/ needs expected figures from the independent check script");
    }

    @TestFactory
    Stream<DynamicTest> eachTemplateEvaluatesWithoutModelOrResultWarnings() throws IOException {
        return templateFiles().stream().map(file -> DynamicTest.dynamicTest(file.getFileName().toString(), () -> {
            Budget b = BudgetJson.read(file);
            List<String> modelWarnings = new ArrayList<>();
            for (ModelProblem w : b.compile(Engine.standard().library()).warnings()) {
                modelWarnings.add(w.toString());
            }
            assertEquals(List.of(), modelWarnings, "model warnings");
            GumResult r = GumEvaluator.evaluate(b, Engine.standard().library());
            assertEquals(List.of(), r.warnings(), "budget warnings");
            for (OutputResult o : r.outputs()) {
                assertEquals(List.of(), o.warnings(), "warnings of output " + o.name());
                assertTrue(Double.isFinite(o.estimate()) && o.standardUncertainty() > 0,
                        o.name() + ": finite estimate and positive u_c");
            }
        }));
    }

    @TestFactory
    Stream<DynamicTest> eachTemplateMatchesTheIndependentGumEstimatesAndUncertainties() {
        return EXPECTED.entrySet().stream().map(e -> DynamicTest.dynamicTest(e.getKey(), () -> {
            GumResult r = evaluate(e.getKey());
            assertEquals(List.copyOf(e.getValue().keySet()),
                    r.outputs().stream().map(OutputResult::name).toList(), "outputs");
            for (Map.Entry<String, double[]> x : e.getValue().entrySet()) {
                OutputResult o = output(r, x.getKey());
                double[] v = x.getValue();
                assertEquals(v[0], o.estimate(), v[1], x.getKey() + " estimate");
                assertEquals(v[2], o.standardUncertainty(), v[3], x.getKey() + " u_c");
            }
        }));
    }

    @TestFactory
    Stream<DynamicTest> eachTemplateDocumentsItselfAndEveryInput() throws IOException {
        return templateFiles().stream().map(file -> DynamicTest.dynamicTest(file.getFileName().toString(), () -> {
            Budget b = BudgetJson.read(file);
            assertFalse(b.title().isBlank(), "title");
            for (String part : List.of("PURPOSE:", "CONDITIONS:", "METHOD:", "CAUTION:")) {
                assertTrue(b.notes().contains(part), "notes have a " + part + " paragraph");
            }
            assertTrue(b.notes().contains("Tarrow Vale") && b.notes().contains("invented demonstration values"),
                    "notes say the figures are invented, of the fictional laboratory");
            for (InputQuantity q : b.inputs()) {
                assertFalse(q.description().isBlank(), q.name() + ": description");
                assertFalse(q.unit().isBlank(), q.name() + ": unit");
                assertFalse(q.source().isBlank(), q.name() + ": source");
                assertFalse(q.notes().isBlank(), q.name() + ": notes");
            }
        }));
    }

    @Test
    void emfElectronicsRelativeUncertaintyAtLowVelocityIsSeveralTimesThatAtHighVelocity() throws Exception {
        // common practice: about 300 µV per m/s of electrode signal and a zero offset of a few µV
        GumResult r = evaluate("emf-electronics-low-velocity.json");
        OutputResult lo = output(r, "q_lo");
        OutputResult hi = output(r, "q_hi");
        double ratio = lo.relativeExpandedUncertainty() / hi.relativeExpandedUncertainty();
        // from the independent figures above: (0.109361 / 8.53884883) / (0.126953 / 84.8795503) = 8.563
        assertEquals(8.563, ratio, 0.0005);
        assertEquals("e_zero", largest(lo).input(), "the zero offset dominates at low velocity");
    }

    @Test
    void clampOnFieldVerificationIsDominatedByInstallationEffects() throws Exception {
        GumResult r = evaluate("field-verification-clamp-on.json");
        OutputResult e = output(r, "E");
        // independent script: d_straight alone is 80.6 % of u_c^2(E)
        double installation = e.contribution("d_straight").share() + e.contribution("d_profile").share();
        assertTrue(installation > 0.8, "installation share of u_c^2 is " + installation);
        assertEquals("d_straight", largest(e).input());
    }

    /**
     * Issue 11/15: every shipped file is a real template that carries no value of its example into a new budget:
     * each input is set by a parameter or locked as a value of the method, every Type A input's data (readings,
     * or mean, s and n) comes from parameters, and a new budget without values is refused naming every required
     * parameter.
     */
    @TestFactory
    Stream<DynamicTest> eachTemplateAsksForEveryValueOfTheMeasurementAndLocksTheRest() throws IOException {
        return templateFiles().stream().map(file -> DynamicTest.dynamicTest(file.getFileName().toString(), () -> {
            org.quire.engine.document.Template t = org.quire.engine.document.Template.of(
                    org.quire.engine.document.DocumentStore.open(file));
            Budget b = t.document().budget();
            assertFalse(t.spec().parameters().isEmpty(), "parameters");
            assertEquals(List.of(), t.spec().carriedValues(b), "values of the example a new budget would keep");
            for (InputQuantity q : b.inputs()) {
                boolean parameter = t.spec().parameters().stream().anyMatch(p -> p.input().equals(q.name()));
                boolean locked = t.spec().isLocked(q.name(), "evaluation");
                assertTrue(parameter != locked, q.name() + ": either a parameter (the user's) or locked (the method's)");
                if (q.evaluation() instanceof org.quire.engine.budget.TypeA) {
                    assertTrue(parameter, q.name() + ": Type A data come from the user");
                }
            }
            IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                    () -> t.budgetFor(Map.of()));
            for (org.quire.engine.document.TemplateParameter p : t.spec().parameters()) {
                if (!p.hasDefault()) {
                    assertTrue(e.getMessage().contains("parameter '" + p.name() + "'"), p.name() + ": " + e.getMessage());
                }
            }
            org.quire.engine.document.BudgetDocument d = org.quire.engine.document.DocumentStore.open(file);
            assertTrue(!d.laboratory().isBlank(), "the template names its laboratory (which is not carried over)");
        }));
    }

    private static OutputResult output(GumResult r, String name) {
        OutputResult o = r.outputs().stream().filter(q -> q.name().equals(name)).findFirst().orElse(null);
        assertNotNull(o, "output " + name);
        return o;
    }

    private static Contribution largest(OutputResult o) {
        Contribution best = null;
        for (Contribution c : o.contributions()) {
            if (best == null || c.contribution() > best.contribution()) {
                best = c;
            }
        }
        return best;
    }
}
