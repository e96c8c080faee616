package org.quire.engine.conformity;

/**
 * Accuracy classes of dynamic measuring systems for liquids other than water, with the maximum permissible
 * error of the complete measuring system and of the meter alone, in % of the reading.
 *
 * <p>References: OIML R 117-1, accuracy classes and maximum permissible errors (line A: measuring system,
 * line B: meter), and Directive 2014/32/EU (MID), annex VII (MI-005), (both read in secondary copies; confirm against
 * the Recommendation): classes 0.3 / 0.5 / 1.0 / 1.5 / 2.5 with 0.3 / 0.5 / 1.0 / 1.5 / 2.5 % for the system and
 * 0.2 / 0.3 / 0.6 / 1.0 / 1.5 % for the meter.
 */
public enum LiquidAccuracyClass {
    /** Class 0.3. */
    CLASS_0_3("0.3", 0.3, 0.2),
    /** Class 0.5. */
    CLASS_0_5("0.5", 0.5, 0.3),
    /** Class 1.0. */
    CLASS_1_0("1.0", 1.0, 0.6),
    /** Class 1.5. */
    CLASS_1_5("1.5", 1.5, 1.0),
    /** Class 2.5. */
    CLASS_2_5("2.5", 2.5, 1.5);

    private final String label;
    private final double systemMpe;
    private final double meterMpe;

    LiquidAccuracyClass(String label, double systemMpe, double meterMpe) {
        this.label = label;
        this.systemMpe = systemMpe;
        this.meterMpe = meterMpe;
    }

    /** @return the class as written, e.g. "0.5" */
    public String label() {
        return label;
    }

    /** @return MPE of the complete measuring system, % */
    public double systemMpe() {
        return systemMpe;
    }

    /** @return MPE of the meter alone, % */
    public double meterMpe() {
        return meterMpe;
    }

    /**
     * @param text a class as written ("0.3", "1", "1.0", "2.5")
     * @return the class
     * @throws IllegalArgumentException listing the classes
     */
    public static LiquidAccuracyClass parse(String text) {
        if (text != null) {
            try {
                double v = Double.parseDouble(text.strip());
                for (LiquidAccuracyClass c : values()) {
                    if (c.systemMpe == v) {
                        return c;
                    }
                }
            } catch (NumberFormatException e) {
                // reported below
            }
        }
        throw new IllegalArgumentException("unknown accuracy class '" + text + "'; expected 0.3, 0.5, 1.0, 1.5 or 2.5");
    }
}
