package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jakarta.json.JsonObject;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.engine.budget.TypeA;
import org.quire.engine.budget.TypeB;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;

/**
 * Issue 11 and 15: {@code template new} with the shipped gravimetric template keeps no value of the template's
 * example (the meter's pulse readings above all); a budget whose locked uncertainty was cut by a factor of 30
 * does not pass {@code template check}, is a finding of {@code review} and a warning of {@code evaluate}.
 * The figures are invented demonstration values.
 */
class TemplateLocksCommandTest {
    private static final String GRAVIMETRIC = "tvfl-gravimetric-emf-point";

    private static List<String> gravimetricRun(Path dir, Path counts) {
        return new ArrayList<>(List.of("template", "new", GRAVIMETRIC, "-o", dir.resolve("point.json").toString(),
                "--set", "I_net=398.75", "--set", "U_bal=0.04", "--readings", "N_ind=" + counts,
                "--set", "k_pulse=10", "--set", "d_conv=0.0002", "--set", "t_tank=19.8", "--set", "t_meter=19.9",
                "--set", "p_meter=260000", "--set", "t_c=28.8", "--set", "p_a=100900", "--set", "t_a=21.0",
                "--set", "h_a=0.5", "--laboratory", "Tarrow Vale Flow Laboratory", "--device", "TV-EM-100-09"));
    }

    private static Path counts(Path dir, String text) throws Exception {
        Path p = dir.resolve("counts.csv");
        Files.writeString(p, text);
        return p;
    }

    @Test
    void aNewBudgetWithOnlyTheNetIndicationGivenIsRefusedNamingTheReadingsAndEveryMissingValue(@TempDir Path dir) {
        // before: exit 0, the template's own pulse readings of a 997 kg collection kept, E = 150 %
        TemplateCommandTest.Run r = TemplateCommandTest.run("template", "new", GRAVIMETRIC, "-o",
                dir.resolve("p.json").toString(), "--set", "I_net=398.75");
        assertEquals(2, r.status(), r.out() + r.err());
        assertTrue(r.err().contains("parameter 'N_ind' (the readings of input 'N_ind') must be given"), r.err());
        for (String p : List.of("U_bal", "k_pulse", "t_tank", "t_meter", "p_meter", "t_c", "p_a", "t_a", "h_a")) {
            assertTrue(r.err().contains("parameter '" + p + "' has no default and must be given"), p + ": " + r.err());
        }
        assertFalse(Files.exists(dir.resolve("p.json")), "nothing written");
    }

    @Test
    void theRunsOwnReadingsLaboratoryAndDeviceGoIntoTheNewBudget(@TempDir Path dir) throws Exception {
        Path counts = counts(dir, "reading\n4003.1\n4001.8\n4002.6\n4000.9\n4003.4\n");
        TemplateCommandTest.Run r = TemplateCommandTest.run(gravimetricRun(dir, counts).toArray(String[]::new));
        assertEquals(0, r.status(), r.err());
        BudgetDocument d = DocumentStore.open(dir.resolve("point.json"));
        TypeA n = (TypeA) d.budget().input("N_ind").evaluation();
        assertArrayEquals(new double[] {4003.1, 4001.8, 4002.6, 4000.9, 4003.4}, n.readings());
        // the mean of the five readings, by hand: 20011.8 / 5
        assertEquals(4002.36, n.estimate(), 1e-9);
        assertEquals(0.04, ((TypeB) d.budget().input("I_net").evaluation()).parameters().get("expandedUncertainty"));
        assertEquals("Tarrow Vale Flow Laboratory", d.laboratory());
        assertEquals("TV-EM-100-09", d.deviceUnderTest());
        assertFalse(d.budget().input("N_ind").source().contains("5 runs"), "no source text of the example's readings");
        assertFalse(d.budget().notes().contains("TV-EM-100-07"), "no tag of the example's meter in the notes");

        TemplateCommandTest.Run check = TemplateCommandTest.run("template", "check", dir.resolve("point.json").toString());
        assertEquals(0, check.status(), check.err());
        assertTrue(check.out().contains("keeps every locked field"), check.out());
    }

    @Test
    void ambiguousReadingsInTheCsvFileAreRefusedWithTheirLine(@TempDir Path dir) throws Exception {
        Path counts = counts(dir, "reading\n4003.1\n4,002\n");
        TemplateCommandTest.Run r = TemplateCommandTest.run(gravimetricRun(dir, counts).toArray(String[]::new));
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("counts.csv") && r.err().contains("line 3"), r.err());
    }

    @Test
    void aLockedUncertaintyCutByAFactorOf30IsCaughtByCheckReviewAndEvaluate(@TempDir Path dir) throws Exception {
        Path counts = counts(dir, "reading\n4003.1\n4001.8\n4002.6\n4000.9\n4003.4\n");
        assertEquals(0, TemplateCommandTest.run(gravimetricRun(dir, counts).toArray(String[]::new)).status());
        Path point = dir.resolve("point.json");
        BudgetDocument d = DocumentStore.open(point);
        TypeB inst = (TypeB) d.budget().input("d_inst").evaluation();
        // the template locks d_inst (installation effect, half-width 0.0004); cut by 30: 0.0004 / 30
        BudgetDocument cut = d.withBudget(d.budget().withInput("d_inst", d.budget().input("d_inst")
                .withEvaluation(inst.with("halfWidth", 0.0004 / 30))), "Test Engineer", d.modified());
        Path cutFile = dir.resolve("point-cut.json");
        DocumentStore.save(cut, cutFile);

        // before: exit 0, "follows the newest version"
        TemplateCommandTest.Run check = TemplateCommandTest.run("template", "check", cutFile.toString());
        assertEquals(2, check.status(), check.out() + check.err());
        assertFalse(check.out().contains("follows the newest version"), check.out());
        assertTrue(check.err().contains("locked field 'd_inst.evaluation.halfWidth'"), check.err());
        assertTrue(check.err().contains("template value 0.0004, budget value 0.0000133333"), check.err());

        TemplateCommandTest.Run eval = TemplateCommandTest.run("evaluate", cutFile.toString());
        assertEquals(0, eval.status(), eval.err());
        assertTrue(eval.out().contains("Warning (template): locked field 'd_inst.evaluation.halfWidth'"), eval.out());
        TemplateCommandTest.Run json = TemplateCommandTest.run("evaluate", cutFile.toString(), "--format", "json");
        JsonObject o = jakarta.json.Json.createReader(new StringReader(json.out())).readObject();
        assertEquals(1, o.getJsonArray("templateFindings").size(), json.out());
        TemplateCommandTest.Run plain = TemplateCommandTest.run("evaluate", point.toString(), "--format", "json");
        assertFalse(plain.out().contains("templateFindings"), "no finding for the budget that keeps its locks");

        TemplateCommandTest.Run review = TemplateCommandTest.run("review", cutFile.toString());
        assertEquals(1, review.status(), review.out());
        assertTrue(review.out().contains("[not met]        The budget keeps every field its template locks"),
                review.out());
        TemplateCommandTest.Run endorse = TemplateCommandTest.run("review", cutFile.toString(), "--decide", "endorse",
                "--assessor", "R. Okafor", "--mark", "dof=agreed");
        assertEquals(1, endorse.status(), endorse.out());
        assertTrue(endorse.out().contains("mark these items first: template-locks"), endorse.out());
        TemplateCommandTest.Run kept = TemplateCommandTest.run("review", point.toString());
        assertTrue(kept.out().contains("[met]            The budget keeps every field its template locks"),
                kept.out());
    }

    @Test
    void aTemplateEvaluatedAsItIsSaysItsFiguresAreItsExamples() throws Exception {
        // never a silent figure from a template's example values: the text and the JSON say so
        String template = java.nio.file.Path.of("..", "templates", "gravimetric-emf-flow-point.json").toString();
        TemplateCommandTest.Run text = TemplateCommandTest.run("evaluate", template);
        assertEquals(0, text.status(), text.err());
        assertTrue(text.out().contains("Warning (template): this file is template tvfl-gravimetric-emf-point version 2: "
                + "its figures are those of the template's example values, not of a measurement"), text.out());
        TemplateCommandTest.Run json = TemplateCommandTest.run("evaluate", template, "--format", "json");
        JsonObject o = jakarta.json.Json.createReader(new StringReader(json.out())).readObject();
        assertTrue(o.getJsonArray("templateFindings").getString(0).startsWith("this file is template "), json.out());
        TemplateCommandTest.Run mc = TemplateCommandTest.run("montecarlo", template, "--trials", "20000");
        assertEquals(0, mc.status(), mc.err());
        assertTrue(mc.out().contains("Warning (template): this file is template tvfl-gravimetric-emf-point"), mc.out());
        TemplateCommandTest.Run mcJson = TemplateCommandTest.run("montecarlo", template, "--trials", "20000",
                "--format", "json");
        assertTrue(jakarta.json.Json.createReader(new StringReader(mcJson.out())).readObject()
                .getJsonArray("templateFindings").getString(0).startsWith("this file is template "), mcJson.out());
        // the assessor's checklist: an item not met, which needs the assessor's mark before any endorsement
        TemplateCommandTest.Run review = TemplateCommandTest.run("review", template);
        assertEquals(1, review.status(), review.out());
        assertTrue(review.out().contains("[not met]        The figures are of a measurement, not of a template's "
                + "example values"), review.out());
        TemplateCommandTest.Run budgetReview = TemplateCommandTest.run("review",
                java.nio.file.Path.of("..", "worked-examples", "jcgm100-h1-end-gauge.json").toString());
        assertTrue(budgetReview.out().contains("[met]            The figures are of a measurement, not of a "
                + "template's example values"), budgetReview.out());
        TemplateCommandTest.Run example = TemplateCommandTest.run("evaluate",
                java.nio.file.Path.of("..", "worked-examples", "jcgm100-h1-end-gauge.json").toString());
        assertFalse(example.out().contains("Warning (template)"), "a budget that is no template has no such finding");
    }
}
