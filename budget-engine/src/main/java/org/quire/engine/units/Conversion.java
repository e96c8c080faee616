package org.quire.engine.units;

import java.util.Objects;

/**
 * The conversion of values from one unit to another of the same dimension, fixed once so that it can be
 * applied to many numbers: {@code point(v) = v × factor + shift} for values of a quantity (a temperature of
 * 20 °C is 293.15 K) and {@code difference(v) = v × factor} for differences, standard and expanded
 * uncertainties and the numerators of sensitivity coefficients (0.1 °C is 0.1 K). A variance converts with
 * {@code factor²}.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: NIST SP 811 (2008) clause 4.2.1.1 (t/°C = T/K − 273.15; an interval of 1 °C equals one of
 * 1 K) and Appendix B (conversion factors); JCGM 100:2008 5.1.3 (a sensitivity coefficient has the unit of
 * the output over that of the input, so it scales with the output's unit).
 */
public final class Conversion {
    private final Unit from;
    private final Unit to;
    private final double factor;
    private final double shift;

    private Conversion(Unit from, Unit to) {
        this.from = from;
        this.to = to;
        this.factor = from.conversionFactor(to);
        this.shift = from.convertPoint(0.0, to);
    }

    /**
     * @param from the unit values are given in
     * @param to the unit they are wanted in
     * @return the conversion
     * @throws UnitException when the units measure different dimensions; the message shows both
     */
    public static Conversion of(Unit from, Unit to) {
        Objects.requireNonNull(from, "unit converted from");
        Objects.requireNonNull(to, "unit converted to");
        return new Conversion(from, to);
    }

    /** @return the conversion that changes nothing, in the unit one */
    public static Conversion identity() {
        return new Conversion(Unit.ONE, Unit.ONE);
    }

    /** @return the unit converted from */
    public Unit from() {
        return from;
    }

    /** @return the unit converted to */
    public Unit to() {
        return to;
    }

    /** @return the number a difference is multiplied by, e.g. 1000/60 from m^3/h to L/min */
    public double factor() {
        return factor;
    }

    /** @return what {@link #point} adds after multiplying by {@link #factor}: −273.15 from K to °C, else 0 */
    public double shift() {
        return shift;
    }

    /** @return true when values do not change (same factor and offset, whatever the symbols) */
    public boolean isIdentity() {
        return factor == 1.0 && shift == 0.0;
    }

    /** @return the value of a quantity (a point on the scale), converted: 20 °C gives 293.15 K */
    public double point(double value) {
        return from.convertPoint(value, to);
    }

    /** @return a difference or an uncertainty, converted with the factor alone: 0.1 °C gives 0.1 K */
    public double difference(double value) {
        return value * factor;
    }

    /** @return a variance or covariance, converted with the square of the factor */
    public double variance(double value) {
        return value * factor * factor;
    }

    /** @return e.g. {@code m^3/h -> L/min} */
    @Override
    public String toString() {
        return from + " -> " + to;
    }
}
