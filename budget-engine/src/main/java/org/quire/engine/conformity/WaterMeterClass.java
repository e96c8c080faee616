package org.quire.engine.conformity;

/**
 * Accuracy classes of water meters with their maximum permissible errors, in % of the reading.
 *
 * <p>References: OIML R 49-1:2013 and ISO 4064-1:2014, maximum permissible errors of water meters (read in a
 * secondary copy; confirm against the Recommendation): class 1: ±1 % in the upper zone at 0.1 °C to 30 °C,
 * ±2 % above 30 °C, ±3 % in the lower zone; class 2: ±2 %, ±3 %, ±5 %.
 */
public enum WaterMeterClass {
    /** Accuracy class 1. */
    CLASS_1("1", 1.0, 2.0, 3.0),
    /** Accuracy class 2. */
    CLASS_2("2", 2.0, 3.0, 5.0);

    private final String label;
    private final double upperZoneUpTo30;
    private final double upperZoneAbove30;
    private final double lowerZone;

    WaterMeterClass(String label, double upperZoneUpTo30, double upperZoneAbove30, double lowerZone) {
        this.label = label;
        this.upperZoneUpTo30 = upperZoneUpTo30;
        this.upperZoneAbove30 = upperZoneAbove30;
        this.lowerZone = lowerZone;
    }

    /** @return "1" or "2" */
    public String label() {
        return label;
    }

    /** @return MPE in the upper zone (Q2 &le; Q &le; Q4) at 0.1 °C to 30 °C, % */
    public double upperZoneUpTo30() {
        return upperZoneUpTo30;
    }

    /** @return MPE in the upper zone above 30 °C, % */
    public double upperZoneAbove30() {
        return upperZoneAbove30;
    }

    /** @return MPE in the lower zone (Q1 &le; Q &lt; Q2), % */
    public double lowerZone() {
        return lowerZone;
    }
}
