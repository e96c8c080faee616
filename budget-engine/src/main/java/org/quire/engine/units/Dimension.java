package org.quire.engine.units;

import java.util.Arrays;

/**
 * The dimension of a quantity as whole-number exponents of the seven SI base dimensions: length, mass, time,
 * electric current, thermodynamic temperature, amount of substance and luminous intensity.
 *
 * <p>Plane angle (rad) and ratios such as % or ppm are dimensionless. {@link #toString()} writes the dimension
 * in coherent SI base units, e.g. {@code m^3/s}, {@code kg/m^3}, {@code m^2·kg/(s^3·A)}; a dimensionless
 * quantity is written {@code 1}.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: ISO 80000-1:2009 clause 3.7 (dimension of a quantity); BIPM SI Brochure, 9th edition (2019),
 * 2.3.3 (dimensions of quantities) and Table 2 (base units).
 */
public final class Dimension {

    /** The SI base dimensions, in the order of the SI Brochure, with the symbol of their base unit. */
    public enum Base {
        LENGTH("m"),
        MASS("kg"),
        TIME("s"),
        ELECTRIC_CURRENT("A"),
        TEMPERATURE("K"),
        AMOUNT_OF_SUBSTANCE("mol"),
        LUMINOUS_INTENSITY("cd");

        private final String unitSymbol;

        Base(String unitSymbol) {
            this.unitSymbol = unitSymbol;
        }

        /** @return the symbol of the SI base unit, e.g. {@code kg} */
        public String unitSymbol() {
            return unitSymbol;
        }
    }

    private static final int N = Base.values().length;

    /** The dimension of a pure number (also of plane angle, %, ppm). */
    public static final Dimension NONE = new Dimension(new int[N]);
    /** Length, L. */
    public static final Dimension LENGTH = of(Base.LENGTH);
    /** Mass, M. */
    public static final Dimension MASS = of(Base.MASS);
    /** Time, T. */
    public static final Dimension TIME = of(Base.TIME);
    /** Electric current, I. */
    public static final Dimension ELECTRIC_CURRENT = of(Base.ELECTRIC_CURRENT);
    /** Thermodynamic temperature, Θ. */
    public static final Dimension TEMPERATURE = of(Base.TEMPERATURE);
    /** Amount of substance, N. */
    public static final Dimension AMOUNT_OF_SUBSTANCE = of(Base.AMOUNT_OF_SUBSTANCE);
    /** Luminous intensity, J. */
    public static final Dimension LUMINOUS_INTENSITY = of(Base.LUMINOUS_INTENSITY);

    private final int[] exponents;

    private Dimension(int[] exponents) {
        this.exponents = exponents;
    }

    /**
     * @return the dimension with the given exponents of length, mass, time, electric current, temperature,
     *     amount of substance and luminous intensity
     */
    public static Dimension of(int length, int mass, int time, int current, int temperature, int amount,
            int luminousIntensity) {
        return new Dimension(new int[] {length, mass, time, current, temperature, amount, luminousIntensity});
    }

    /** @return the dimension of one base quantity, with exponent 1 */
    public static Dimension of(Base base) {
        if (base == null) {
            throw new IllegalArgumentException("base dimension must not be null");
        }
        int[] e = new int[N];
        e[base.ordinal()] = 1;
        return new Dimension(e);
    }

    /** @return the exponent of {@code base} in this dimension */
    public int exponent(Base base) {
        return exponents[base.ordinal()];
    }

    /** @return true when every exponent is zero */
    public boolean isDimensionless() {
        for (int e : exponents) {
            if (e != 0) {
                return false;
            }
        }
        return true;
    }

    /** @return the dimension of a product of a quantity of this dimension and one of {@code other} */
    public Dimension multiply(Dimension other) {
        int[] e = new int[N];
        for (int i = 0; i < N; i++) {
            e[i] = Math.addExact(exponents[i], other.exponents[i]);
        }
        return new Dimension(e);
    }

    /** @return the dimension of a quotient of a quantity of this dimension by one of {@code other} */
    public Dimension divide(Dimension other) {
        int[] e = new int[N];
        for (int i = 0; i < N; i++) {
            e[i] = Math.subtractExact(exponents[i], other.exponents[i]);
        }
        return new Dimension(e);
    }

    /** @return this dimension raised to a whole-number power */
    public Dimension pow(int power) {
        int[] e = new int[N];
        for (int i = 0; i < N; i++) {
            e[i] = Math.multiplyExact(exponents[i], power);
        }
        return new Dimension(e);
    }

    /**
     * Raises this dimension to the rational power {@code numerator/denominator}, e.g. 1/2 for a square root.
     *
     * @throws UnitException when {@code denominator} is zero or some exponent would not be a whole number
     *     (the square root of m^2 is m; the square root of m has no dimension)
     */
    public Dimension pow(int numerator, int denominator) {
        if (denominator == 0) {
            throw new UnitException(Messages.zeroDenominator(numerator));
        }
        if (denominator < 0) {
            numerator = Math.negateExact(numerator);
            denominator = Math.negateExact(denominator);
        }
        int[] e = new int[N];
        for (int i = 0; i < N; i++) {
            long p = (long) exponents[i] * numerator;
            if (p % denominator != 0) {
                throw new UnitException(Messages.noRoot(toString(), numerator, denominator,
                        Base.values()[i].unitSymbol(), p, denominator));
            }
            e[i] = Math.toIntExact(p / denominator);
        }
        return new Dimension(e);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Dimension d && Arrays.equals(exponents, d.exponents);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(exponents);
    }

    /** @return the dimension in SI base units, e.g. {@code m^3/s}, {@code kg/m^3}; {@code 1} if dimensionless */
    @Override
    public String toString() {
        StringBuilder num = new StringBuilder();
        StringBuilder den = new StringBuilder();
        int denCount = 0;
        for (Base b : Base.values()) {
            int e = exponents[b.ordinal()];
            if (e > 0) {
                appendFactor(num, b.unitSymbol(), e);
            } else if (e < 0) {
                appendFactor(den, b.unitSymbol(), -e);
                denCount++;
            }
        }
        if (num.length() == 0 && den.length() == 0) {
            return "1";
        }
        if (num.length() == 0) {
            num.append('1');
        }
        if (denCount == 0) {
            return num.toString();
        }
        return denCount == 1 ? num + "/" + den : num + "/(" + den + ")";
    }

    private static void appendFactor(StringBuilder sb, String symbol, int exponent) {
        if (sb.length() > 0) {
            sb.append('·');
        }
        sb.append(symbol);
        if (exponent != 1) {
            sb.append('^').append(exponent);
        }
    }
}
