package org.quire.app.review;

import org.quire.engine.document.Verdict;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.app.report.CanonicalSha256;
import org.quire.app.testing.Examples;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeB;

/**
 * The assessor's checklist on the JCGM worked examples (JCGM 100:2008 H.1, H.2; JCGM 101:2008 9.2) and the
 * decision rules of a review.
 */
class ChecklistTest {

    private static CheckItem item(List<CheckItem> items, String id) {
        return items.stream().filter(i -> i.id().equals(id)).findFirst().orElseThrow();
    }

    private static List<CheckItem> check(Budget b) throws Exception {
        return Checklist.evaluate(b, Examples.gum(b), ReviewContext.none());
    }

    @Test
    void endGaugeDominantContributionsMustBeExplained() throws Exception {
        Budget b = Examples.budget("jcgm100-h1-end-gauge.json");
        CheckItem d = item(check(b), "dominant-explained");
        // JCGM 100:2008 H.1, Table H.1: 25 nm of u_c = 32 nm (about 62 %) from l_s and 16.6 nm (about 27 %) from
        // delta_theta; every other contribution is under 25 %
        assertEquals(Outcome.NOT_MET, d.outcome());
        assertEquals(List.of("l_s", "delta_theta"), d.inputs());
        Budget explained = b.withInput("l_s", b.input("l_s").withNotes("the certificate of the standard dominates"))
                .withNotes(b.notes() + " The temperature difference delta_theta is poorly known (50 %).");
        assertEquals(Outcome.MET, item(check(explained), "dominant-explained").outcome());
    }

    @Test
    void endGaugeInfiniteDegreesOfFreedomAreToConfirm() throws Exception {
        // JCGM 100:2008 H.1, Table H.1: alpha_s and theta are taken with infinite degrees of freedom
        CheckItem d = item(check(Examples.budget("jcgm100-h1-end-gauge.json")), "dof");
        assertEquals(Outcome.TO_CONFIRM, d.outcome());
        assertEquals(List.of("alpha_s", "theta_mean", "theta_cyclic"), d.inputs());
    }

    @Test
    void sourcesUnitsAndBasesOfTheAdditiveExample() throws Exception {
        // JCGM 101:2008 9.2.3: four inputs without units or sources in our file
        List<CheckItem> items = check(Examples.budget("jcgm101-9.2.3-additive-rectangular.json"));
        assertEquals(Outcome.NOT_MET, item(items, "sources").outcome());
        assertEquals(List.of("X1", "X2", "X3", "X4"), item(items, "sources").inputs());
        assertEquals(Outcome.NOT_MET, item(items, "units-given").outcome());
        assertEquals(Outcome.NOT_MET, item(items, "type-b-basis").outcome());
        assertEquals(Outcome.NOT_APPLICABLE, item(items, "correlations-justified").outcome());
        assertEquals(Outcome.NOT_RUN, item(items, "monte-carlo").outcome());
        assertEquals(Outcome.NOT_RUN, item(items, "units-consistent").outcome());
    }

    @Test
    void correlationsNeedAJustification() throws Exception {
        // JCGM 100:2008 H.2: V, I and phi observed simultaneously, hence correlated
        Budget b = Examples.budget("jcgm100-h2-resistance-reactance.json");
        assertEquals(Outcome.MET, item(check(b), "correlations-justified").outcome());
        Budget bare = b.withCorrelations(List.of(b.correlations().get(0).withJustification(""),
                b.correlations().get(1), b.correlations().get(2)));
        CheckItem c = item(check(bare), "correlations-justified");
        assertEquals(Outcome.NOT_MET, c.outcome());
        assertEquals(List.of("V", "I"), c.inputs());
    }

    @Test
    void roundingToOneDigitThatLowersUMuchIsToConfirm() throws Exception {
        // JCGM 100:2008 7.2.6: round uncertainties to at most two significant digits; rounding up may be
        // appropriate. U = 2 x 0.7 = 1.4 rounds to 1 with one digit, 29 % lower.
        Budget b = Budget.of("y = x", List.of(new OutputQuantity("y", "m", "")), List.of(
                InputQuantity.of("x", TypeB.of("normal", Map.of("estimate", 10.0, "standardUncertainty", 0.7)))
                        .withUnit("m").withSource("invented")));
        b = b.withSettings(b.settings().withCoverageFactor(2));
        assertEquals(Outcome.MET, item(check(b), "rounding").outcome());
        CheckItem one = item(check(b.withSettings(b.settings().withSignificantDigits(1))), "rounding");
        assertEquals(Outcome.TO_CONFIRM, one.outcome());
        assertTrue(one.details().stream().anyMatch(d -> d.contains("lowers it by 28.6 %")), one.details().toString());
        assertEquals(Outcome.TO_CONFIRM,
                item(check(b.withSettings(b.settings().withSignificantDigits(3))), "rounding").outcome());
    }

    @Test
    void monteCarloAgreementComesFromTheEnginesComparison() throws Exception {
        // JCGM 101:2008 9.2.3: the GUM interval [-3.92, 3.92] is validated by the Monte Carlo one [-3.88, 3.88]
        Budget b = Examples.budget("jcgm101-9.2.3-additive-rectangular.json");
        List<CheckItem> items = Checklist.evaluate(b, Examples.gum(b), ReviewContext.none()
                .withMonteCarlo(run(b, 1_000_000)));
        assertEquals(Outcome.MET, item(items, "monte-carlo").outcome());
        // JCGM 101:2008 9.2.4: one dominant rectangular input; the GUM interval is not validated
        Budget bad = Examples.budget("jcgm101-9.2.4-additive-dominant.json");
        CheckItem notMet = item(Checklist.evaluate(bad, Examples.gum(bad), ReviewContext.none()
                .withMonteCarlo(run(bad, 1_000_000))), "monte-carlo");
        assertEquals(Outcome.NOT_MET, notMet.outcome());
        assertTrue(notMet.details().get(0).contains("not validated"), notMet.details().toString());
    }

    private static org.quire.engine.montecarlo.MonteCarloOutcome run(Budget b, long trials) throws Exception {
        Budget r = b.withSettings(b.settings().withTrials(trials));
        var gum = Examples.gum(r);
        return org.quire.engine.montecarlo.BudgetSimulation.run(r, r.compile(org.quire.app.common.Engine.standard().library()), gum,
                org.quire.engine.montecarlo.BudgetSimulation.settings(r.settings(), gum).withThreads(2),
                org.quire.engine.montecarlo.ProgressListener.NONE);
    }

    @Test
    void unitCheckerSeamDecidesConsistency() throws Exception {
        Budget b = Examples.budget("jcgm100-h1-end-gauge.json");
        assertEquals(Outcome.MET, item(Checklist.evaluate(b, Examples.gum(b),
                ReviewContext.none().withUnits(x -> List.of())), "units-consistent").outcome());
        assertEquals(Outcome.NOT_MET, item(Checklist.evaluate(b, Examples.gum(b),
                ReviewContext.none().withUnits(x -> List.of("line 3: mm + °C"))), "units-consistent").outcome());
    }

    @Test
    void reviewDecisionRules() throws Exception {
        Budget b = Examples.budget("jcgm100-h1-end-gauge.json");
        Review r = Review.start(b, Examples.gum(b), ReviewContext.none(), CanonicalSha256.INSTANCE);
        LocalDate day = LocalDate.of(2026, 3, 2);
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> r.decide(Verdict.ENDORSED, "M. Ashdown", day, ""));
        assertTrue(e.getMessage().contains("dof") && e.getMessage().contains("dominant-explained"), e.getMessage());
        Review marked = r.withMark("dof", Mark.AGREED, "handbook limits are certain")
                .withMark("dominant-explained", Mark.FINDING, "explain l_s and delta_theta in the notes")
                .withComment(new Comment(Comment.Target.input("delta_theta"), "M. Ashdown", "50 % reliability is low"));
        assertThrows(IllegalStateException.class, () -> marked.decide(Verdict.ENDORSED, "M. Ashdown", day, ""));
        Review back = marked.decide(Verdict.SENT_BACK, "M. Ashdown", day, "");
        assertEquals(Verdict.SENT_BACK, back.decision().verdict());
        assertThrows(IllegalArgumentException.class, () -> back.withMark("dof", Mark.REMARK, ""));
        assertThrows(IllegalStateException.class, () -> r.decide(Verdict.SENT_BACK, "M. Ashdown", day, ""),
                "sending back needs a reason or a finding");
        assertThrows(IllegalArgumentException.class, () -> r.withMark("no-such-item", Mark.AGREED, ""));

        assertThrows(IllegalStateException.class, r::historyComment, "an open review has no decision");
        String text = back.historyComment();
        assertTrue(text.startsWith("sent back by M. Ashdown on 2026-03-02 (content SHA-256 "
                + CanonicalSha256.INSTANCE.hash(b) + ")"), text);
        assertTrue(text.contains("Findings: dominant-explained (explain l_s and delta_theta in the notes)")
                && !text.contains("Remarks:")
                && text.contains("Comments: input delta_theta: 50 % reliability is low"), text);

        Budget fixed = b.withNotes(b.notes() + " l_s dominates; delta_theta is poorly known.");
        Review again = Review.start(fixed, Examples.gum(fixed), ReviewContext.none(), CanonicalSha256.INSTANCE)
                .withMark("dof", Mark.AGREED, "").decide(Verdict.ENDORSED, "M. Ashdown", day.plusDays(3), "");
        assertTrue(!again.contentHash().equals(back.contentHash()), "changed content, new hash");
    }
}
