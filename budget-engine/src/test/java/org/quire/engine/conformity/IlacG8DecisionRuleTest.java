package org.quire.engine.conformity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * ILAC G8:2019 decision rules (simple acceptance, guarded acceptance with w = r U, non-binary statement) and
 * the JCGM 106:2012 probability-of-conformity rule: decisions at the edges of the guard bands and the risk
 * stated in the certificate sentence. Limits ±1 %, u = 0.25 %, k = 2, so U = 0.5 % (values exact in binary).
 */
class IlacG8DecisionRuleTest {

    private static final MpeLimits ONE_PERCENT = MpeLimits.symmetric(1.0);

    private static Decision decide(DecisionRule rule, double error) {
        return rule.decide(MeasuredError.of(10.0, error, 0.25, 2.0), ONE_PERCENT).decision();
    }

    @Test
    void simpleAcceptanceAtTheToleranceLimits() {
        DecisionRule rule = DecisionRule.simpleAcceptance();
        assertEquals(Decision.CONFORMS, decide(rule, 1.0));
        assertEquals(Decision.CONFORMS, decide(rule, -1.0));
        assertEquals(Decision.DOES_NOT_CONFORM, decide(rule, Math.nextUp(1.0)));
        assertEquals(Decision.DOES_NOT_CONFORM, decide(rule, Math.nextDown(-1.0)));
        assertEquals(0.0, rule.decide(MeasuredError.of(10, 0, 0.25, 2), ONE_PERCENT).guardBand());
    }

    @Test
    void guardedAcceptanceAtTheAcceptanceLimits() {
        DecisionRule rule = DecisionRule.guardedAcceptance();    // w = U = 0.5 %
        PointDecision at = rule.decide(MeasuredError.of(10.0, 0.5, 0.25, 2.0), ONE_PERCENT);
        assertEquals(0.5, at.guardBand());
        assertEquals(-0.5, at.acceptanceLower());
        assertEquals(0.5, at.acceptanceUpper());
        assertEquals(Decision.CONFORMS, at.decision());
        assertEquals(Decision.DOES_NOT_CONFORM, decide(rule, Math.nextUp(0.5)));
        assertEquals(Decision.CONFORMS, decide(rule, -0.5));
        assertEquals(Decision.DOES_NOT_CONFORM, decide(rule, Math.nextDown(-0.5)));
        assertEquals(Decision.DOES_NOT_CONFORM, decide(rule, 0.9));   // within MPE, but in the guard band
        // a result at the acceptance limit carries the specific risk 1 - Phi(2), standard normal table
        // Phi(2) = 0.9772 (from memory)
        assertEquals(1 - 0.9772, at.specificRisk(), 0.00005);
    }

    @Test
    void guardFactorScalesTheGuardBand() {
        DecisionRule half = DecisionRule.guardedAcceptance(0.5);  // w = 0.25 %
        assertEquals(Decision.CONFORMS, decide(half, 0.75));
        assertEquals(Decision.DOES_NOT_CONFORM, decide(half, Math.nextUp(0.75)));
    }

    @Test
    void nonBinaryRuleLeavesTheZonesAroundTheLimitUndecided() {
        DecisionRule rule = DecisionRule.guardedNonBinary(1.0);
        assertEquals(Decision.CONFORMS, decide(rule, 0.5));
        assertEquals(Decision.UNDECIDED, decide(rule, Math.nextUp(0.5)));
        assertEquals(Decision.UNDECIDED, decide(rule, 1.0));
        assertEquals(Decision.UNDECIDED, decide(rule, 1.5));
        assertEquals(Decision.DOES_NOT_CONFORM, decide(rule, Math.nextUp(1.5)));
        assertEquals(Decision.UNDECIDED, decide(rule, -1.5));
        assertEquals(Decision.DOES_NOT_CONFORM, decide(rule, Math.nextDown(-1.5)));
        assertTrue(Double.isNaN(rule.decide(MeasuredError.of(10, 1.2, 0.25, 2), ONE_PERCENT).specificRisk()));
    }

    @Test
    void guardBandWiderThanHalfTheToleranceAcceptsNothing() {
        PointDecision d = DecisionRule.guardedAcceptance()
                .decide(MeasuredError.of(10.0, 0.0, 0.6, 2.0), ONE_PERCENT);   // U = 1.2 % > 1 %
        assertEquals(Decision.DOES_NOT_CONFORM, d.decision());
        assertTrue(Double.isNaN(d.acceptanceLower()));
        assertTrue(Double.isNaN(d.acceptanceUpper()));
    }

    @Test
    void probabilityRuleAcceptanceLimitAndUndecidedZone() {
        DecisionRule rule = DecisionRule.probabilityOfConformity(0.95);
        assertEquals(Decision.CONFORMS, decide(rule, 0.0));
        assertEquals(Decision.UNDECIDED, decide(rule, 1.0));            // p_c about 0.5
        assertEquals(Decision.DOES_NOT_CONFORM, decide(rule, 1.6));     // p_c = Phi(-2.4), below 5 %
        PointDecision d = rule.decide(MeasuredError.of(10, 0.0, 0.25, 2.0), ONE_PERCENT);
        // one-sided 95 % point of the normal distribution, 1.645 (JCGM 100:2008 Table G.2, nu = inf, 90 %
        // two-sided; check values, read): acceptance limit T_U - 1.645 u, printed to three decimals
        assertEquals(1.0 - 1.645 * 0.25, d.acceptanceUpper(), 0.0005 * 0.25);
        assertEquals(-(1.0 - 1.645 * 0.25), d.acceptanceLower(), 0.0005 * 0.25);
        // at the acceptance limit the decision flips
        assertEquals(Decision.CONFORMS, decide(rule, d.acceptanceUpper() - 1e-9));
        assertEquals(Decision.UNDECIDED, decide(rule, d.acceptanceUpper() + 1e-9));
    }

    @Test
    void probabilityRuleWithPhiOfTwoMatchesGuardBandOfTwoStandardUncertainties() {
        // JCGM 106:2012 clause 8: a guard band w = 2u and the acceptance limit where p_c = Phi(2) coincide
        // when the far tolerance limit is many u away
        double phi2 = ConformityProbability.normal(0, 1, Double.NEGATIVE_INFINITY, 2);
        PointDecision byP = DecisionRule.probabilityOfConformity(phi2)
                .decide(MeasuredError.of(10, 0.0, 0.1, 2.0), ONE_PERCENT);
        PointDecision byW = DecisionRule.guardedAcceptance()
                .decide(MeasuredError.of(10, 0.0, 0.1, 2.0), ONE_PERCENT);
        assertEquals(byW.acceptanceUpper(), byP.acceptanceUpper(), 1e-9);
        assertEquals(byW.acceptanceLower(), byP.acceptanceLower(), 1e-9);
    }

    @Test
    void statementsComputeTheirRisk() {
        // guarded acceptance, w = U, k = 2, normal: 1 - Phi(2) = 0.0228 (standard normal table, from memory)
        DecisionRule guarded = DecisionRule.guardedAcceptance();
        assertEquals(1 - 0.9772, guarded.maximumRiskOfFalseAcceptance(2.0, Double.POSITIVE_INFINITY), 0.00005);
        assertTrue(guarded.statement(2.0).endsWith("the specific risk of false acceptance is at most about 2.3 %."),
                guarded.statement(2.0));
        assertTrue(guarded.statement(2.0).contains("w = U,") && guarded.statement(2.0).contains("k = 2"));
        assertTrue(DecisionRule.guardedAcceptance(0.5).statement(2.0).contains("w = 0.5 U,"));
        // simple acceptance: up to 50 % at a limit
        assertTrue(DecisionRule.simpleAcceptance().statement(2.0).endsWith("up to 50 %."));
        // probability rule at 95 %: at most 5 %
        String p = DecisionRule.probabilityOfConformity(0.95).statement(2.0);
        assertTrue(p.contains("at least 95 %") && p.contains("at most 5.0 %"), p);
        // t with nu = 10 and k = t_95(10) = 2.23 (JCGM 100:2008 Table G.2 via check values, read):
        // one-sided risk 2.5 %, the printed k good to +-0.005 (+-0.0002 in the risk)
        DecisionRule t = DecisionRule.guardedAcceptance().withDistribution(ResultDistribution.SCALED_T);
        assertEquals(0.025, t.maximumRiskOfFalseAcceptance(2.23, 10), 0.0003);
        assertTrue(t.statement(2.23, 10).contains("scaled and shifted t distribution with 10 effective degrees"));
        assertTrue(t.statement(2.23, 10).endsWith("at most about 2.5 %."), t.statement(2.23, 10));
        // with the normal rule the degrees of freedom are not used
        assertEquals(guarded.maximumRiskOfFalseAcceptance(2.0, Double.POSITIVE_INFINITY),
                guarded.maximumRiskOfFalseAcceptance(2.0, 3), 0.0);
    }

    @Test
    void scaledTWidensTheUndecidedZoneOfTheProbabilityRule() {
        DecisionRule normal = DecisionRule.probabilityOfConformity(0.95);
        DecisionRule t = normal.withDistribution(ResultDistribution.SCALED_T);
        MeasuredError few = MeasuredError.of(10, 0.0, 0.25, 2.0, 4);
        assertTrue(t.decide(few, ONE_PERCENT).acceptanceUpper() < normal.decide(few, ONE_PERCENT).acceptanceUpper());
    }

    @Test
    void badRuleParametersAreNamed() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DecisionRule.guardedAcceptance(0))
                .getMessage().startsWith("guard-band factor r must be positive"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DecisionRule.probabilityOfConformity(0.4))
                .getMessage().startsWith("minimum probability of conformity must lie strictly between 0.5 and 1"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> MeasuredError.of(1, 0, 0, 2))
                .getMessage().startsWith("standard uncertainty must be positive"));
    }
}
