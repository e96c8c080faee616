package org.quire.engine.conformity;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A maximum-permissible-error envelope: a named accuracy class over ordered, contiguous flow zones, each with
 * limits in percent of the reading (optionally by temperature band). Zone {@code i} covers
 * {@code from_i <= q < to_i}; the last zone also covers its upper end. The checking factory rejects gaps,
 * overlaps and negative limits with a message naming the zone. Built-in envelopes are in
 * {@link MpeEnvelopes}. Immutable and thread-safe.
 */
public final class MpeEnvelope {
    /** Relative tolerance for zone boundaries computed from ratios (Q2 = 1.6 Q1 and so on). */
    private static final double JOIN_TOLERANCE = 1e-12;

    private final String name;
    private final String source;
    private final String flowUnit;
    private final List<MpeZone> zones;

    private MpeEnvelope(String name, String source, String flowUnit, List<MpeZone> zones) {
        this.name = name;
        this.source = source;
        this.flowUnit = flowUnit;
        this.zones = zones;
    }

    /**
     * @param name the envelope's name, e.g. "Tarrow Vale house class A"
     * @param source where the limits come from (a standard and clause, or "laboratory specification")
     * @param flowUnit the unit of the zone flows (a unit expression)
     * @param zones the zones in increasing order of flow, each beginning where the previous one ends
     * @throws IllegalArgumentException naming the zone at fault
     */
    public static MpeEnvelope of(String name, String source, String flowUnit, List<MpeZone> zones) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException(ConformityMessages.blank("envelope name"));
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException(ConformityMessages.blank("source of the limits"));
        }
        if (flowUnit == null) {
            throw new IllegalArgumentException(ConformityMessages.missing("flow unit"));
        }
        if (zones == null || zones.isEmpty()) {
            throw new IllegalArgumentException(ConformityMessages.noZones());
        }
        List<MpeZone> copy = new ArrayList<>();
        Set<String> names = new HashSet<>();
        for (int i = 0; i < zones.size(); i++) {
            MpeZone z = zones.get(i);
            if (z == null) {
                throw new IllegalArgumentException(ConformityMessages.missing("zone " + (i + 1)));
            }
            if (!names.add(z.name())) {
                throw new IllegalArgumentException(ConformityMessages.duplicateZone(z.name()));
            }
            if (i > 0) {
                MpeZone prev = copy.get(i - 1);
                double join = prev.flowTo();
                double tol = JOIN_TOLERANCE * Math.abs(join);
                if (z.flowFrom() > join + tol) {
                    throw new IllegalArgumentException(
                            ConformityMessages.zoneGap(prev.name(), join, z.name(), z.flowFrom()));
                }
                if (z.flowFrom() < join - tol) {
                    throw new IllegalArgumentException(
                            ConformityMessages.zoneOverlap(prev.name(), join, z.name(), z.flowFrom()));
                }
            }
            copy.add(z);
        }
        return new MpeEnvelope(name.strip(), source.strip(), flowUnit.strip(), List.copyOf(copy));
    }

    /** @return the envelope's name (the accuracy class and its parameters) */
    public String name() {
        return name;
    }

    /** @return where the limits come from */
    public String source() {
        return source;
    }

    /** @return the unit of the zone flows */
    public String flowUnit() {
        return flowUnit;
    }

    /** @return the zones in increasing order of flow, unmodifiable */
    public List<MpeZone> zones() {
        return zones;
    }

    /** @return the lowest flow covered */
    public double flowMin() {
        return zones.get(0).flowFrom();
    }

    /** @return the highest flow covered */
    public double flowMax() {
        return zones.get(zones.size() - 1).flowTo();
    }

    /**
     * @param flow a flow in {@link #flowUnit()}
     * @return the zone containing it
     * @throws IllegalArgumentException when the flow lies outside the envelope
     */
    public MpeZone zoneAt(double flow) {
        if (!Double.isNaN(flow)) {
            for (int i = 0; i < zones.size(); i++) {
                MpeZone z = zones.get(i);
                boolean last = i == zones.size() - 1;
                if (flow >= z.flowFrom() && (flow < z.flowTo() || last && flow == z.flowTo())) {
                    return z;
                }
            }
        }
        throw new IllegalArgumentException(ConformityMessages.flowOutside(flow, flowUnit, flowMin(), flowMax()));
    }

    /**
     * @param flow a flow in {@link #flowUnit()}
     * @param temperature the liquid's temperature in °C (NaN when not stated; accepted only where the limits
     *     do not depend on temperature)
     * @return the limits at that flow and temperature
     * @throws IllegalArgumentException when the flow or temperature lies outside the envelope, or a needed
     *     temperature is not stated
     */
    public MpeLimits limitsAt(double flow, double temperature) {
        return zoneAt(flow).limitsAt(temperature);
    }

    /** @return the limits at a flow whose zone does not depend on temperature */
    public MpeLimits limitsAt(double flow) {
        return zoneAt(flow).limits();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MpeEnvelope e && name.equals(e.name) && source.equals(e.source)
                && flowUnit.equals(e.flowUnit) && zones.equals(e.zones);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(name, source, flowUnit, zones);
    }

    @Override
    public String toString() {
        return "MpeEnvelope[" + name + ", " + zones.size() + " zones, " + flowMin() + " to " + flowMax() + " "
                + flowUnit + "]";
    }
}
