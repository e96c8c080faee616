package org.quire.engine.calibration;

import java.util.List;
import org.quire.engine.conformity.Decision;
import org.quire.engine.conformity.DecisionRule;

/**
 * The conformity decisions of one series (as found or as left) against the specification.
 *
 * @param limitsName the name of the maximum permissible errors
 * @param limitsSource where the limits come from
 * @param rule the decision rule
 * @param points the decision at each point, in point order
 * @param overall the overall decision (ConformityAssessment#overall)
 * @param statement the certificate sentence: the rule with its risk and the limits applied
 */
public record ConformityResult(String limitsName, String limitsSource, DecisionRule rule, List<PointConformity> points,
        Decision overall, String statement) {
    public ConformityResult {
        points = List.copyOf(points);
    }
}
