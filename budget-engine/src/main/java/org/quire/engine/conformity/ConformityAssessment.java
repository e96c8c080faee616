package org.quire.engine.conformity;

import java.util.ArrayList;
import java.util.List;

/**
 * The decisions for a set of measured errors of one meter against an {@link MpeEnvelope} under a
 * {@link DecisionRule}, with an overall decision and the certificate statement. Immutable and thread-safe.
 *
 * <p>The overall decision is "does not conform" if any point does not conform, otherwise "undecided" if any
 * point is undecided, otherwise "conforms". The statement is the rule's sentence for the points' own coverage
 * factors (one k when they agree, else the k stated with each point and the largest risk over the points),
 * followed by the envelope's name.
 *
 * <p>References: ISO/IEC 17025:2017 7.8.6 (statement of conformity with the decision rule applied); ILAC
 * G8:2019; JCGM 106:2012 clauses 7 to 9.
 */
public final class ConformityAssessment {
    private final MpeEnvelope envelope;
    private final DecisionRule rule;
    private final List<PointDecision> decisions;

    private ConformityAssessment(MpeEnvelope envelope, DecisionRule rule, List<PointDecision> decisions) {
        this.envelope = envelope;
        this.rule = rule;
        this.decisions = decisions;
    }

    /**
     * @param envelope the maximum permissible errors
     * @param rule the decision rule
     * @param points the measured errors, at least one
     * @return the assessment
     * @throws IllegalArgumentException naming the point (from 1) that lies outside the envelope or lacks a
     *     needed temperature
     */
    public static ConformityAssessment of(MpeEnvelope envelope, DecisionRule rule, List<MeasuredError> points) {
        if (envelope == null) {
            throw new IllegalArgumentException(ConformityMessages.missing("envelope"));
        }
        if (rule == null) {
            throw new IllegalArgumentException(ConformityMessages.missing("decision rule"));
        }
        if (points == null || points.isEmpty()) {
            throw new IllegalArgumentException(ConformityMessages.missing("list of measured errors"));
        }
        List<PointDecision> out = new ArrayList<>(points.size());
        for (int i = 0; i < points.size(); i++) {
            MeasuredError p = points.get(i);
            if (p == null) {
                throw new IllegalArgumentException(ConformityMessages.missing("measured error " + (i + 1)));
            }
            try {
                out.add(rule.decide(p, envelope));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException(ConformityMessages.fmt("point %d: %s", i + 1, e.getMessage()), e);
            }
        }
        return new ConformityAssessment(envelope, rule, List.copyOf(out));
    }

    /** @return the envelope */
    public MpeEnvelope envelope() {
        return envelope;
    }

    /** @return the rule */
    public DecisionRule rule() {
        return rule;
    }

    /** @return the decisions in the order of the points, unmodifiable */
    public List<PointDecision> decisions() {
        return decisions;
    }

    /** @return the overall decision */
    public Decision overall() {
        return overall(decisions);
    }

    /**
     * @param decisions the decisions at the points of one item
     * @return "does not conform" if any point does not conform, otherwise "undecided" if any point is
     *     undecided, otherwise "conforms"
     */
    public static Decision overall(List<PointDecision> decisions) {
        boolean undecided = false;
        for (PointDecision d : decisions) {
            if (d.decision() == Decision.DOES_NOT_CONFORM) {
                return Decision.DOES_NOT_CONFORM;
            }
            undecided |= d.decision() == Decision.UNDECIDED;
        }
        return undecided ? Decision.UNDECIDED : Decision.CONFORMS;
    }

    /** @return the sentences for the certificate: the rule with its risk, and the limits applied */
    public String statement() {
        return statement(rule, envelope.name(), decisions);
    }

    /**
     * @param rule the decision rule applied
     * @param limitsName the name of the maximum permissible errors applied
     * @param decisions the decisions at the points, at least one
     * @return the rule's sentence for the points' own coverage factors (one k when they agree, else the k stated
     *     with each point and the largest risk over the points), followed by the name of the limits
     */
    public static String statement(DecisionRule rule, String limitsName, List<PointDecision> decisions) {
        double[] k = new double[decisions.size()];
        double[] dof = new double[decisions.size()];
        for (int i = 0; i < k.length; i++) {
            k[i] = decisions.get(i).point().coverageFactor();
            dof[i] = decisions.get(i).point().dof();
        }
        return rule.statement(k, dof) + " Maximum permissible errors: " + limitsName + ".";
    }
}
