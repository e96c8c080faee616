package org.quire.engine.calibration;

import org.quire.engine.conformity.DecisionRule;
import org.quire.engine.conformity.MpeEnvelope;

/**
 * What the meter is checked against at each point: either an envelope of maximum permissible errors (an OIML R
 * 49 or R 117 class, or zones of the laboratory's own) or an {@link MpeFormula}; the decision rule (JCGM
 * 106:2012, ILAC G8:2019); the test uncertainty ratio a point's U must meet, U &le; MPE / ratio (3 is common
 * practice for verification; OIML R 49-2 states comparable fractions of the MPE, from memory); and the
 * liquid's temperature where the limits depend on it.
 *
 * @param envelope the envelope, or null when a formula is given
 * @param formula the formula, or null when an envelope is given
 * @param rule the decision rule
 * @param uncertaintyRatio the smallest acceptable MPE / U, at least 1
 * @param temperature the liquid's temperature, °C, for limits that depend on it; NaN when not stated
 */
public record ConformitySpec(MpeEnvelope envelope, MpeFormula formula, DecisionRule rule, double uncertaintyRatio,
        double temperature) {

    /** Checks the components; use the factories. */
    public ConformitySpec {
        if ((envelope == null) == (formula == null)) {
            throw new IllegalArgumentException(CalibrationMessages.envelopeOrFormula());
        }
        if (rule == null) {
            throw new IllegalArgumentException(CalibrationMessages.missing("decision rule"));
        }
        if (!Double.isFinite(uncertaintyRatio) || uncertaintyRatio < 1) {
            throw new IllegalArgumentException(CalibrationMessages.ratio(uncertaintyRatio));
        }
        if (Double.isInfinite(temperature)) {
            throw new IllegalArgumentException(CalibrationMessages.notFinite("temperature", temperature));
        }
    }

    public static ConformitySpec of(MpeEnvelope envelope, DecisionRule rule, double uncertaintyRatio) {
        return new ConformitySpec(envelope, null, rule, uncertaintyRatio, Double.NaN);
    }

    public static ConformitySpec of(MpeFormula formula, DecisionRule rule, double uncertaintyRatio) {
        return new ConformitySpec(null, formula, rule, uncertaintyRatio, Double.NaN);
    }

    /** @return a copy with the liquid's temperature stated, °C */
    public ConformitySpec withTemperature(double celsius) {
        return new ConformitySpec(envelope, formula, rule, uncertaintyRatio, celsius);
    }

    /** @return the name of the limits: the envelope's name or the formula as text */
    public String limitsName() {
        return envelope != null ? envelope.name() : formula.label();
    }
}
