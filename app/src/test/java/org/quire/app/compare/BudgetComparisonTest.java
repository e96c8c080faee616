package org.quire.app.compare;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.quire.app.common.Engine;
import org.quire.app.report.ReportSection;
import org.quire.app.testing.Examples;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.io.BudgetJson;

/** Comparing two variants of the JCGM worked examples (JCGM 101:2008 9.2.3 and 9.2.4; JCGM 100:2008 H.1). */
class BudgetComparisonTest {

    @Test
    void additiveModelWithOneDominantInput() throws Exception {
        Budget a = Examples.budget("jcgm101-9.2.3-additive-rectangular.json");
        Budget b = Examples.budget("jcgm101-9.2.4-additive-dominant.json");
        Comparison c = BudgetComparison.compare(a, b, Engine.standard().library());
        assertFalse(c.identical());
        assertTrue(c.inputsAdded().isEmpty() && c.inputsRemoved().isEmpty());
        assertEquals(1, c.inputsChanged().size());
        QuantityChange x4 = c.inputsChanged().get(0);
        assertEquals("X4", x4.name());
        // JCGM 101:2008 9.2.4: X4 rectangular with u = 10 instead of 1
        FieldChange u = x4.changes().stream().filter(f -> f.field().equals("standard uncertainty")).findFirst().orElseThrow();
        assertEquals(1.0, Double.parseDouble(u.before()), 1e-12);
        assertEquals(10.0, Double.parseDouble(u.after()), 1e-12);
        assertFalse(c.modelChanged());
        OutputEffect y = c.effects().get(0);
        // JCGM 101:2008 9.2.3 and 9.2.4: GUM 95 % half-widths 3.92 and 19.9
        assertEquals(3.92, y.expandedA(), 0.005);
        assertEquals(19.9, y.expandedB(), 0.05);
        // the change from the printed figures: 19.85/3.925 - 1 ... 19.95/3.915 - 1, i.e. 405.7 % to 409.6 %
        assertTrue(y.changePercent() > 405.7 && y.changePercent() < 409.6, "change " + y.changePercent());
    }

    @Test
    void endGaugeWithTheComparatorDifferenceAsOneInput() throws Exception {
        Budget a = Examples.budget("jcgm100-h1-end-gauge.json");
        Budget b = BudgetJson.read(Path.of(BudgetComparisonTest.class.getResource("jcgm100-h1-combined-d.json").toURI()));
        Comparison c = BudgetComparison.compare(a, b, Engine.standard().library());
        assertEquals(List.of("d"), c.inputsAdded().stream().map(InputQuantity::name).toList());
        assertEquals(List.of("d_mean", "d_random", "d_systematic"),
                c.inputsRemoved().stream().map(InputQuantity::name).toList());
        assertTrue(c.inputsChanged().isEmpty());
        assertTrue(c.modelChanged());
        List<LineEdit> removed = c.model().stream().filter(e -> e.kind() == LineEdit.Kind.REMOVED).toList();
        assertEquals(1, removed.size());
        assertEquals("d = d_mean + d_random + d_systematic", removed.get(0).text());
        assertEquals(2, removed.get(0).lineA());
        OutputEffect l = c.effects().get(0);
        // JCGM 100:2008 H.1: U_99 = 93 nm either way (the three components combine to u(d) = 9.7 nm, nu = 25.6);
        // 1.5 nm for the rounding of u_c to 32 nm before it was multiplied by k = 2.92
        assertEquals(93e-6, l.expandedA(), 1.5e-6);
        assertEquals(93e-6, l.expandedB(), 1.5e-6);
        assertEquals(2.92, l.coverageFactorB(), 0.005);
        String text = ComparisonText.format(c, "A.json", "B.json");
        assertTrue(text.contains("  - d = d_mean + d_random + d_systematic"), text);
        assertTrue(text.contains("+ d [mm]"), text);
        ReportSection s = ComparisonSection.of(c, "the three-component budget", "this budget");
        assertEquals(2, s.tables().size());
        assertEquals(6, s.tables().get(0).rows().size(), "one added and three removed inputs, the title and the notes");
    }

    @Test
    void aBudgetComparedWithItselfIsIdentical() throws Exception {
        Budget a = Examples.budget("jcgm100-h2-resistance-reactance.json");
        Comparison c = BudgetComparison.compare(a, a, Engine.standard().library());
        assertTrue(c.identical());
        assertEquals(0, c.effects().get(0).changePercent(), 0);
        Budget k3 = a.withSettings(a.settings().withCoverageFactor(3));
        Comparison s = BudgetComparison.compare(a, k3, Engine.standard().library());
        assertEquals(List.of(new FieldChange("coverage", "k = 2", "k = 3")), s.settings());
        // U = k u_c, so going from k = 2 to k = 3 raises every U by exactly 50 %
        assertEquals(50, s.effects().get(1).changePercent(), 1e-9);
    }

    @Test
    void lineDiffKeepsTheLongestCommonSubsequence() {
        // Hunt and McIlroy (1976): the lines not in the longest common subsequence are the edits
        List<LineEdit> e = LineDiff.diff(List.of("a", "b", "c"), List.of("a", "c", "d"));
        assertEquals(List.of(new LineEdit(LineEdit.Kind.KEPT, 1, 1, "a"), new LineEdit(LineEdit.Kind.REMOVED, 2, 0, "b"),
                new LineEdit(LineEdit.Kind.KEPT, 3, 2, "c"), new LineEdit(LineEdit.Kind.ADDED, 0, 3, "d")), e);
        assertEquals(List.of(new LineEdit(LineEdit.Kind.ADDED, 0, 1, "x")), LineDiff.diff(List.of(), List.of("x")));
    }
}
