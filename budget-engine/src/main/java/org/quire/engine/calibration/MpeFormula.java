package org.quire.engine.calibration;

import org.quire.engine.units.Dimension;
import org.quire.engine.units.Unit;
import org.quire.engine.units.UnitException;
import org.quire.engine.units.Units;

/**
 * A maximum permissible error stated as a formula of flow, the usual form of an electromagnetic meter's
 * specification: MPE = ±(a % of the reading + b as a velocity over the bore), so that at flow q through a bore
 * of diameter D, with mean velocity v = q / (pi D^2 / 4),
 *
 * <pre>
 *   MPE(q) = a + 100 b / v    (in % of the reading)
 * </pre>
 *
 * <p>The form ±(a % of rate + b mm/s) is common practice in manufacturers' specifications of electromagnetic
 * meters; ISO 20456:2017 describes how their performance is stated (from memory). The continuity relation
 * q = A v with A = pi D^2 / 4 is ISO 4006:1991 (from memory). Units are checked: the velocity term must be a
 * velocity, the bore a length, the flow a volume per time.
 *
 * @param percentOfReading a, % of the reading, not negative
 * @param velocityTerm b, not negative (a and b not both zero)
 * @param velocityUnit the unit of b, a velocity such as "mm/s"
 * @param bore D, the meter's bore, positive
 * @param boreUnit the unit of D, a length such as "mm"
 */
public record MpeFormula(double percentOfReading, double velocityTerm, String velocityUnit, double bore,
        String boreUnit) {

    private static final Dimension VELOCITY = Dimension.LENGTH.divide(Dimension.TIME);
    private static final Dimension VOLUME_FLOW = Dimension.LENGTH.pow(3).divide(Dimension.TIME);

    /** Checks the components and their units; prefer {@link #of}. */
    public MpeFormula {
        if (!Double.isFinite(percentOfReading) || percentOfReading < 0) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula("percentOfReading",
                    "must be a finite number, not negative: " + percentOfReading));
        }
        if (!Double.isFinite(velocityTerm) || velocityTerm < 0) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula("velocityTerm",
                    "must be a finite number, not negative: " + velocityTerm));
        }
        if (percentOfReading == 0 && velocityTerm == 0) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula("percentOfReading",
                    "and the velocity term are both zero: no meter meets an MPE of 0"));
        }
        if (!Double.isFinite(bore) || !(bore > 0)) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula("bore", "must be positive, not " + bore));
        }
        velocityUnit = checkUnit("velocityUnit", velocityUnit, VELOCITY, "a velocity such as mm/s");
        boreUnit = checkUnit("boreUnit", boreUnit, Dimension.LENGTH, "a length such as mm");
    }

    public static MpeFormula of(double percentOfReading, double velocityTerm, String velocityUnit, double bore,
            String boreUnit) {
        return new MpeFormula(percentOfReading, velocityTerm, velocityUnit, bore, boreUnit);
    }

    private static String checkUnit(String field, String text, Dimension want, String what) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula(field, "is missing; give " + what));
        }
        Unit u;
        try {
            u = Units.parse(text.strip());
        } catch (UnitException e) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula(field, "'" + text + "' is not a unit: "
                    + e.getMessage()));
        }
        if (!u.dimension().equals(want) || u.isAffine()) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula(field, "'" + text + "' is not " + what
                    + " (its dimension is " + u.dimension() + ")"));
        }
        return text.strip();
    }

    /**
     * @param flowUnit a unit of volume flow
     * @throws IllegalArgumentException when it is not one
     */
    public static void checkFlowUnit(String flowUnit) {
        Unit u;
        try {
            u = Units.parse(flowUnit);
        } catch (UnitException e) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula("flowUnit", "'" + flowUnit
                    + "' is not a unit: " + e.getMessage()));
        }
        if (!u.dimension().equals(VOLUME_FLOW)) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula("flowUnit", "the formula needs a "
                    + "volume flow such as m^3/h, but the flow is in '" + flowUnit + "' (dimension " + u.dimension() + ")"));
        }
    }

    /**
     * @param flow the flow, positive
     * @param flowUnit its unit, a volume flow
     * @return the mean velocity over the bore, in m/s
     */
    public double velocity(double flow, String flowUnit) {
        checkFlowUnit(flowUnit);
        double q = flow * Units.parse(flowUnit).factor();
        double d = bore * Units.parse(boreUnit).factor();
        return q / (Math.PI * d * d / 4);
    }

    /**
     * @param flow the flow, positive
     * @param flowUnit its unit, a volume flow
     * @return MPE(q) = a + 100 b / v, % of the reading
     * @throws IllegalArgumentException when the flow is not positive or its unit is not a volume flow
     */
    public double percentAt(double flow, String flowUnit) {
        if (!(flow > 0) || !Double.isFinite(flow)) {
            throw new IllegalArgumentException(CalibrationMessages.mpeFormula("flow", "the formula needs a positive "
                    + "flow, not " + flow));
        }
        double v = velocity(flow, flowUnit);
        double b = velocityTerm * Units.parse(velocityUnit).factor();
        return percentOfReading + 100 * b / v;
    }

    /** @return the formula as text, e.g. "±(0.2 % of reading + 1.5 mm/s over DN 80 mm)" */
    public String label() {
        return "\u00b1(" + num(percentOfReading) + " % of reading + " + num(velocityTerm) + " " + velocityUnit
                + " over a bore of " + num(bore) + " " + boreUnit + ")";
    }

    private static String num(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros().toPlainString();
    }
}
