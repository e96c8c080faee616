package org.quire.engine.units;

import java.util.Objects;

/**
 * A unit of measurement: the symbol as written, its {@link Dimension}, the factor to the coherent SI unit of
 * that dimension and, for the affine temperature scales (°C, °F), an offset.
 *
 * <p>A value {@code v} in this unit is the SI value {@code (v + offset) * factor}. For every unit but °C and °F
 * the offset is zero. The offset matters only for a temperature <em>point</em> (a thermometer reading):
 * 20 °C is 293.15 K. A temperature <em>difference</em>, and every standard uncertainty, converts with the
 * factor alone: an uncertainty of 0.1 °C is 0.1 K. Hence two conversions:
 * <ul>
 *   <li>{@link #convertPoint}, {@link #toSi}, {@link #fromSi} (also {@link #convert}) for values of a quantity;
 *   <li>{@link #convertDifference}, {@link #toSiDifference}, {@link #fromSiDifference} for differences,
 *       intervals, half-widths and standard uncertainties ({@link #convertUncertainty} is the same
 *       conversion under the name a budget reads).
 * </ul>
 * A product, quotient or power that contains °C or °F (the {@code /°C} of an expansion coefficient, °C^2)
 * is a difference unit: its offset is zero and it converts with the factor only.
 *
 * <p>Units compare equal when symbol, dimension, factor and offset are equal; {@link #sameDimension} and
 * {@link #isEquivalentTo} compare what they measure.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: ISO 80000-1:2009 clause 6.5 (unit symbols, products and quotients); ISO 80000-5:2019 item 5-2
 * (Celsius temperature, t = T - 273.15 K); NIST SP 811 (2008) clause 4.2.1.1 (Celsius temperature; a
 * temperature interval in °C equals the same interval in K) and Appendix B (conversion factors).
 */
public final class Unit {

    /** The unit one of a dimensionless quantity. */
    public static final Unit ONE = new Unit("1", Dimension.NONE, 1.0, 0.0);

    private final String symbol;
    private final Dimension dimension;
    private final double factor;
    private final double offset;

    private Unit(String symbol, Dimension dimension, double factor, double offset) {
        this.symbol = symbol;
        this.dimension = dimension;
        this.factor = factor;
        this.offset = offset;
    }

    /**
     * @param symbol the symbol as written, e.g. {@code m^3/h}
     * @param dimension what the unit measures
     * @param factor the SI value of one of this unit, e.g. 1/3600 for m^3/h; finite and positive
     * @return a unit without offset
     */
    public static Unit of(String symbol, Dimension dimension, double factor) {
        return ofAffine(symbol, dimension, factor, 0.0);
    }

    /**
     * @param offset added to a value before multiplying by {@code factor}: 273.15 for °C (factor 1),
     *     459.67 for °F (factor 5/9)
     * @return a unit of an affine scale such as °C
     */
    public static Unit ofAffine(String symbol, Dimension dimension, double factor, double offset) {
        if (symbol == null || symbol.isBlank()) {
            throw new IllegalArgumentException("unit symbol must not be blank, not " + Messages.quote(symbol));
        }
        if (dimension == null) {
            throw new IllegalArgumentException("dimension of unit " + symbol + " must not be null");
        }
        if (!(factor > 0) || !Double.isFinite(factor)) {
            throw new IllegalArgumentException("factor of unit " + symbol + " must be finite and positive, not "
                    + factor);
        }
        if (!Double.isFinite(offset)) {
            throw new IllegalArgumentException("offset of unit " + symbol + " must be finite, not " + offset);
        }
        return new Unit(symbol, dimension, factor, offset);
    }

    /** @return the symbol as written, e.g. {@code kg m^-3} */
    public String symbol() {
        return symbol;
    }

    /** @return what the unit measures */
    public Dimension dimension() {
        return dimension;
    }

    /** @return the SI value of one of this unit when used for a difference (1/3600 for m^3/h, 1 for °C) */
    public double factor() {
        return factor;
    }

    /** @return the offset of an affine scale in this unit (273.15 for °C, 459.67 for °F), else 0 */
    public double offset() {
        return offset;
    }

    /** @return true for a unit with an offset (°C, °F), whose points and differences convert differently */
    public boolean isAffine() {
        return offset != 0.0;
    }

    /** @return true when the dimension is that of a pure number (1, %, ppm, rad) */
    public boolean isDimensionless() {
        return dimension.isDimensionless();
    }

    /** @return a copy of this unit written with another symbol */
    public Unit withSymbol(String newSymbol) {
        return ofAffine(newSymbol, dimension, factor, offset);
    }

    /**
     * @return this unit as a unit of differences: °C becomes a unit of the size of the kelvin, still written
     *     °C, without offset. Units without offset are returned unchanged.
     */
    public Unit asDifference() {
        return isAffine() ? new Unit(symbol, dimension, factor, 0.0) : this;
    }

    /** @return true when both units measure the same dimension (m^3/h and L/min do; m^3/h and kg/s do not) */
    public boolean sameDimension(Unit other) {
        return dimension.equals(Objects.requireNonNull(other, "other unit").dimension);
    }

    /** @return true when both units have the same dimension, factor and offset, whatever their symbols */
    public boolean isEquivalentTo(Unit other) {
        return sameDimension(other) && factor == other.factor && offset == other.offset;
    }

    // ---- conversions -------------------------------------------------------------------------------------

    /** @return the SI value of the point {@code value} in this unit (20 °C gives 293.15 K) */
    public double toSi(double value) {
        return offset == 0.0 ? value * factor : (value + offset) * factor;
    }

    /** @return the value in this unit of the SI point {@code si} (293.15 K gives 20 °C) */
    public double fromSi(double si) {
        return offset == 0.0 ? si / factor : si / factor - offset;
    }

    /** @return the SI value of a difference or uncertainty {@code value} in this unit (0.1 °C gives 0.1 K) */
    public double toSiDifference(double value) {
        return value * factor;
    }

    /** @return the value in this unit of an SI difference or uncertainty */
    public double fromSiDifference(double si) {
        return si / factor;
    }

    /**
     * Converts the value of a quantity (a point on the scale) from this unit to {@code to}: 20 °C is 293.15 K
     * and 68 °F. The same as {@link #convertPoint}.
     *
     * @throws UnitException when the dimensions differ
     */
    public double convert(double value, Unit to) {
        return convertPoint(value, to);
    }

    /**
     * Converts a point on the scale, applying offsets: 20 °C is 293.15 K.
     *
     * @throws UnitException when the dimensions differ
     */
    public double convertPoint(double value, Unit to) {
        requireConvertible(to);
        if (factor == to.factor && offset == to.offset) {
            return value;
        }
        return to.fromSi(toSi(value));
    }

    /**
     * Converts a difference, an interval or a half-width with the factors alone: 0.5 °C is 0.5 K and 0.9 °F.
     *
     * @throws UnitException when the dimensions differ
     */
    public double convertDifference(double value, Unit to) {
        return value * conversionFactor(to);
    }

    /**
     * Converts a standard uncertainty; an uncertainty is a difference, so this is {@link #convertDifference}.
     *
     * @throws UnitException when the dimensions differ
     */
    public double convertUncertainty(double standardUncertainty, Unit to) {
        return convertDifference(standardUncertainty, to);
    }

    /**
     * @return the number by which a difference (and a sensitivity's numerator) in this unit is multiplied to
     *     express it in {@code to}, e.g. 1000/60 from m^3/h to L/min
     * @throws UnitException when the dimensions differ
     */
    public double conversionFactor(Unit to) {
        requireConvertible(to);
        return factor == to.factor ? 1.0 : factor / to.factor;
    }

    private void requireConvertible(Unit to) {
        Objects.requireNonNull(to, "target unit");
        if (!sameDimension(to)) {
            throw new UnitException(Messages.cannotConvert(this, to));
        }
    }

    // ---- algebra -----------------------------------------------------------------------------------------

    /** @return the unit of a product, e.g. T·m; any offset is dropped (a product is a difference unit) */
    public Unit multiply(Unit other) {
        Objects.requireNonNull(other, "other unit");
        if (other == ONE) {
            return this;
        }
        if (this == ONE) {
            return other;
        }
        return new Unit(Symbols.product(symbol, other.symbol), dimension.multiply(other.dimension),
                factor * other.factor, 0.0);
    }

    /**
     * @return the unit of a quotient, e.g. m^3/h; any offset is dropped (so 1/°C is a difference unit); a unit
     *     divided by the unit one is itself, and divided by itself, however written, the unit one (not "%/1",
     *     "(m^3/h)/(m^3/h)" or "(m3/h)/(m^3/h)")
     */
    public Unit divide(Unit other) {
        Objects.requireNonNull(other, "other unit");
        if (other == ONE || other.equals(ONE)) {
            return this;
        }
        if (other.equals(this) || !isDimensionless() && other.dimension.equals(dimension) && sameScale(other)) {
            // the same unit, however written (m3/h and m^3/h, L/min and dm^3/min); offsets are dropped as above.
            // Dimensionless units of another name stay (rad/sr, 1/rad: the names say what the number counts)
            return ONE;
        }
        return new Unit(Symbols.quotient(symbol, other.symbol), dimension.divide(other.dimension),
                factor / other.factor, 0.0);
    }

    /**
     * The one rule for "the same scale": factors equal to 1 part in 10^12, so that units whose factors are
     * worked out along different paths (L/min = 10^-3 m^3 / 60 s, dm^3/min = (10^-1 m)^3 / 60 s) are the same.
     *
     * @return whether {@code other} has this unit's factor (its dimension is not compared)
     */
    public boolean sameScale(Unit other) {
        return sameFactor(factor, other.factor);
    }

    /** @return whether two unit factors are the same to 1 part in 10^12 (see {@link #sameScale}) */
    public static boolean sameFactor(double a, double b) {
        return Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
    }

    /** @return this unit to a whole-number power; °C^2 is a difference unit; the power 1 returns this unit */
    public Unit pow(int power) {
        if (power == 1) {
            return this;
        }
        if (power == 0) {
            return ONE;
        }
        return new Unit(Symbols.power(symbol, Integer.toString(power)), dimension.pow(power),
                Math.pow(factor, power), 0.0);
    }

    /**
     * @return this unit to the power {@code numerator/denominator}; the square root of m^2 is m
     * @throws UnitException when the power does not give whole exponents (the square root of m)
     */
    public Unit pow(int numerator, int denominator) {
        Dimension d = dimension.pow(numerator, denominator);
        if (denominator < 0) {
            numerator = -numerator;
            denominator = -denominator;
        }
        int g = gcd(Math.abs(numerator), denominator);
        numerator /= g;
        denominator /= g;
        if (denominator == 1) {
            return pow(numerator);
        }
        String exponent = "(" + numerator + "/" + denominator + ")";
        return new Unit(Symbols.power(symbol, exponent), d,
                Math.pow(factor, (double) numerator / denominator), 0.0);
    }

    /** @return the square root of this unit (m for m^2) */
    public Unit sqrt() {
        return pow(1, 2);
    }

    private static int gcd(int a, int b) {
        return b == 0 ? Math.max(a, 1) : gcd(b, a % b);
    }

    // ---- display -----------------------------------------------------------------------------------------

    /**
     * @return the symbol followed, when it is not already written in SI base units, by the dimension in SI
     *     base units: {@code m^3/h (m^3/s)}, {@code kg/s}
     */
    public String describe() {
        String base = dimension.toString();
        return base.equals(symbol) ? symbol : symbol + " (" + base + ")";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Unit u && symbol.equals(u.symbol) && dimension.equals(u.dimension)
                && factor == u.factor && offset == u.offset;
    }

    @Override
    public int hashCode() {
        return Objects.hash(symbol, dimension, factor, offset);
    }

    /** @return the symbol */
    @Override
    public String toString() {
        return symbol;
    }
}
