package org.quire.engine.conformity;

/**
 * The limits of a flow zone over a range of the liquid's temperature. Within a zone the first band covers
 * {@code from <= t <= to}, each later band {@code from < t <= to}, so that a temperature on a shared boundary
 * belongs to the lower band (as "0.1 °C to 30 °C" and "above 30 °C" in OIML R 49). A band with infinite ends
 * makes the limits independent of temperature. Immutable and thread-safe.
 *
 * @param fromCelsius lower end, °C (may be negative infinity)
 * @param toCelsius upper end, °C (may be positive infinity)
 * @param limits the maximum permissible error in the band
 */
public record TemperatureBand(double fromCelsius, double toCelsius, MpeLimits limits) {

    /** Checks the components; prefer {@link #of}. */
    public TemperatureBand {
        if (Double.isNaN(fromCelsius) || Double.isNaN(toCelsius) || !(toCelsius > fromCelsius)) {
            throw new IllegalArgumentException(ConformityMessages.temperatureOrder(fromCelsius, toCelsius));
        }
        if (limits == null) {
            throw new IllegalArgumentException(ConformityMessages.missing("limits of the temperature band"));
        }
    }

    /** @return a band with the given limits */
    public static TemperatureBand of(double fromCelsius, double toCelsius, MpeLimits limits) {
        return new TemperatureBand(fromCelsius, toCelsius, limits);
    }

    /** @return a band covering every temperature */
    public static TemperatureBand any(MpeLimits limits) {
        return new TemperatureBand(Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, limits);
    }

    /** @return whether the band covers every temperature */
    public boolean coversAnyTemperature() {
        return fromCelsius == Double.NEGATIVE_INFINITY && toCelsius == Double.POSITIVE_INFINITY;
    }
}
