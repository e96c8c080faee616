package org.quire.engine.conformity;

import java.util.ArrayList;
import java.util.List;

/**
 * One flow zone of an {@link MpeEnvelope}: flows {@code from <= q < to} (the envelope's last zone also
 * includes {@code to}) with limits in percent of the reading, either for every temperature or per
 * {@link TemperatureBand}. Immutable and thread-safe.
 */
public final class MpeZone {
    private final String name;
    private final double flowFrom;
    private final double flowTo;
    private final List<TemperatureBand> bands;

    private MpeZone(String name, double flowFrom, double flowTo, List<TemperatureBand> bands) {
        this.name = name;
        this.flowFrom = flowFrom;
        this.flowTo = flowTo;
        this.bands = bands;
    }

    /**
     * A zone whose limits do not depend on temperature.
     *
     * @param name the zone's name, e.g. "upper zone"
     * @param flowFrom lowest flow of the zone, not negative
     * @param flowTo flow where the zone ends, greater than {@code flowFrom}
     * @param lowerPercent magnitude of the lower limit, % of reading, not negative
     * @param upperPercent magnitude of the upper limit, % of reading, not negative
     * @throws IllegalArgumentException with a message naming the zone
     */
    public static MpeZone of(String name, double flowFrom, double flowTo, double lowerPercent,
            double upperPercent) {
        String n = checkName(name);
        MpeLimits limits;
        try {
            limits = MpeLimits.of(lowerPercent, upperPercent);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(ConformityMessages.zone(n, e.getMessage()), e);
        }
        return of(n, flowFrom, flowTo, List.of(TemperatureBand.any(limits)));
    }

    /**
     * A zone whose limits depend on temperature.
     *
     * @param bands temperature bands in increasing order, each beginning where the previous one ends
     * @throws IllegalArgumentException with a message naming the zone
     */
    public static MpeZone of(String name, double flowFrom, double flowTo, List<TemperatureBand> bands) {
        String n = checkName(name);
        if (!Double.isFinite(flowFrom)) {
            throw new IllegalArgumentException(ConformityMessages.zone(n, ConformityMessages.notFinite("lower flow", flowFrom)));
        }
        if (!Double.isFinite(flowTo)) {
            throw new IllegalArgumentException(ConformityMessages.zone(n, ConformityMessages.notFinite("upper flow", flowTo)));
        }
        if (flowFrom < 0) {
            throw new IllegalArgumentException(ConformityMessages.zone(n, ConformityMessages.negative("lower flow", flowFrom)));
        }
        if (!(flowTo > flowFrom)) {
            throw new IllegalArgumentException(ConformityMessages.zone(n, ConformityMessages.flowOrder(flowFrom, flowTo)));
        }
        if (bands == null || bands.isEmpty()) {
            throw new IllegalArgumentException(ConformityMessages.zone(n, ConformityMessages.missing("list of temperature bands")));
        }
        List<TemperatureBand> copy = new ArrayList<>(bands.size());
        for (int i = 0; i < bands.size(); i++) {
            TemperatureBand b = bands.get(i);
            if (b == null) {
                throw new IllegalArgumentException(ConformityMessages.zone(n, ConformityMessages.missing("temperature band " + (i + 1))));
            }
            if (i > 0) {
                double prevTo = copy.get(i - 1).toCelsius();
                if (b.fromCelsius() > prevTo) {
                    throw new IllegalArgumentException(ConformityMessages.zone(n, ConformityMessages.bandGap(prevTo, b.fromCelsius())));
                }
                if (b.fromCelsius() < prevTo) {
                    throw new IllegalArgumentException(ConformityMessages.zone(n, ConformityMessages.bandOverlap(prevTo, b.fromCelsius())));
                }
            }
            copy.add(b);
        }
        return new MpeZone(n, flowFrom, flowTo, List.copyOf(copy));
    }

    private static String checkName(String name) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException(ConformityMessages.blank("zone name"));
        }
        return name.strip();
    }

    /** @return the zone's name */
    public String name() {
        return name;
    }

    /** @return the lowest flow of the zone */
    public double flowFrom() {
        return flowFrom;
    }

    /** @return the flow where the zone ends (excluded, except for the envelope's last zone) */
    public double flowTo() {
        return flowTo;
    }

    /** @return the temperature bands, unmodifiable */
    public List<TemperatureBand> bands() {
        return bands;
    }

    /** @return whether the limits depend on temperature */
    public boolean dependsOnTemperature() {
        return !(bands.size() == 1 && bands.get(0).coversAnyTemperature());
    }

    /**
     * @param temperature the liquid's temperature, °C
     * @return the limits of the band containing it
     * @throws IllegalArgumentException when no band contains it
     */
    public MpeLimits limitsAt(double temperature) {
        if (!dependsOnTemperature()) {
            return bands.get(0).limits();
        }
        if (Double.isNaN(temperature)) {
            throw new IllegalArgumentException(ConformityMessages.temperatureNeeded(name));
        }
        for (int i = 0; i < bands.size(); i++) {
            TemperatureBand b = bands.get(i);
            boolean aboveFrom = i == 0 ? temperature >= b.fromCelsius() : temperature > b.fromCelsius();
            if (aboveFrom && temperature <= b.toCelsius()) {
                return b.limits();
            }
        }
        throw new IllegalArgumentException(ConformityMessages.temperatureOutside(name, temperature,
                bands.get(0).fromCelsius(), bands.get(bands.size() - 1).toCelsius()));
    }

    /** @return the limits when they do not depend on temperature */
    public MpeLimits limits() {
        if (dependsOnTemperature()) {
            throw new IllegalArgumentException(ConformityMessages.temperatureNeeded(name));
        }
        return bands.get(0).limits();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MpeZone z && name.equals(z.name) && flowFrom == z.flowFrom && flowTo == z.flowTo
                && bands.equals(z.bands);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(name, flowFrom, flowTo, bands);
    }

    @Override
    public String toString() {
        return ConformityMessages.fmt("MpeZone[%s, %s to %s, %s]", name, flowFrom, flowTo, bands);
    }
}
