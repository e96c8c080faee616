package org.quire.engine.flow;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;

/**
 * Density of water by the formula of Tanaka et al. (2001): {@code water_density(t)} for air-free standard mean
 * ocean water (SMOW) at 101325 Pa, {@code water_density(t, p)} with the compressibility correction to absolute
 * pressure {@code p}, and {@code water_density_air_saturated(t)} / {@code water_density_air_saturated(t, p)}
 * for water saturated with dissolved air.
 *
 * <pre>
 * rho(t)    = a5 [1 - (t + a1)^2 (t + a2) / (a3 (t + a4))]                                (eq. 1)
 * rho(t, p) = rho(t) [1 + (k0 + k1 t + k2 t^2)(p - 101325 Pa)]                            (compressibility)
 * air-saturated: rho + s0 + s1 t                                                        (dissolved air)
 * a1 = -3.983035 °C, a2 = 301.797 °C, a3 = 522528.9 °C^2, a4 = 69.34881 °C, a5 = 999.974950 kg/m^3;
 * k0 = 50.74e-11 /Pa, k1 = -0.326e-11 /(Pa °C), k2 = 0.00416e-11 /(Pa °C^2);
 * s0 = -4.612e-3 kg/m^3, s1 = 0.106e-3 kg/(m^3 °C)
 * </pre>
 * t is the temperature on ITS-90 in °C, valid from 0 °C to 40 °C (air-saturated: 0 °C to 25 °C). The isotopic
 * composition of laboratory water differs from SMOW; model that as a separate correction.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: M. Tanaka, G. Girard, R. Davis, A. Peuto, N. Bignell, "Recommended table for the density of
 * water between 0 °C and 40 °C based on recent experimental reports", Metrologia 38 (2001) 301-309: the
 * density formula and its coefficients a1..a5, the compressibility coefficients k0, k1, k2 and the dissolved-air
 * correction s0, s1 (equation and section numbers quoted here from memory).
 */
public final class WaterDensity extends FlowFunction {

    /** Tanaka et al. (2001) eq. (1) coefficients. */
    static final double A1 = -3.983035;
    static final double A2 = 301.797;
    static final double A3 = 522528.9;
    static final double A4 = 69.34881;
    static final double A5 = 999.974950;
    /** Compressibility coefficients, Tanaka et al. (2001) section 5. */
    static final double K0 = 50.74e-11;
    static final double K1 = -0.326e-11;
    static final double K2 = 0.00416e-11;
    /** Reference pressure of eq. (1), Pa. */
    static final double P0 = 101325.0;
    /** Dissolved-air correction, Tanaka et al. (2001) section 6. */
    static final double S0 = -4.612e-3;
    static final double S1 = 0.106e-3;

    private static final String FORMULA = "the Tanaka et al. (2001) water-density formula";
    private static final String FORMULA_AIR = "the Tanaka et al. (2001) dissolved-air correction";

    private final boolean airSaturated;

    private WaterDensity(boolean airSaturated) {
        super(airSaturated ? "water_density_air_saturated" : "water_density", List.of("t", "p"), 1,
                List.of("°C", "Pa"), "kg/m^3",
                airSaturated
                        ? "Density of air-saturated water at temperature t (0 to 25 °C) and absolute pressure p "
                                + "(default 101325 Pa): Tanaka et al. (2001), Metrologia 38, 301, eq. (1) with "
                                + "the compressibility and dissolved-air corrections."
                        : "Density of air-free water (SMOW) at temperature t (0 to 40 °C) and absolute pressure p "
                                + "(default 101325 Pa): Tanaka et al. (2001), Metrologia 38, 301, eq. (1) with "
                                + "the compressibility correction.");
        this.airSaturated = airSaturated;
    }

    /** @return {@code water_density(t[, p])}, air-free water */
    public static WaterDensity airFree() {
        return new WaterDensity(false);
    }

    /** @return {@code water_density_air_saturated(t[, p])}, water saturated with dissolved air */
    public static WaterDensity airSaturated() {
        return new WaterDensity(true);
    }

    /** @return true for the air-saturated variant */
    public boolean isAirSaturated() {
        return airSaturated;
    }

    /**
     * @param t temperature, °C (ITS-90)
     * @return density of air-free SMOW at 101325 Pa, kg/m^3, Tanaka et al. (2001) eq. (1); no range check
     */
    public static double tanaka(double t) {
        double u = t + A1;
        return A5 * (1.0 - u * u * (t + A2) / (A3 * (t + A4)));
    }

    /**
     * @param t temperature, °C
     * @param p absolute pressure, Pa
     * @return the factor 1 + (k0 + k1 t + k2 t^2)(p - 101325 Pa) by which compression raises the density
     */
    public static double compressionFactor(double t, double p) {
        return 1.0 + (K0 + t * (K1 + t * K2)) * (p - P0);
    }

    /** @return the dissolved-air correction s0 + s1 t, kg/m^3, added to the air-free density */
    public static double dissolvedAirCorrection(double t) {
        return S0 + S1 * t;
    }

    @Override
    String problem(double[] a) {
        double t = a[0];
        if (t < -273.15) {
            return FlowMessages.belowAbsoluteZero("temperature", "t", t);
        }
        double high = airSaturated ? 25.0 : 40.0;
        if (t < 0.0 || t > high) {
            return FlowMessages.outsideValidity("temperature", "t", t, "°C", 0.0, high,
                    airSaturated ? FORMULA_AIR : FORMULA);
        }
        if (a.length > 1 && !(a[1] > 0.0)) {
            return FlowMessages.notPositive("pressure", "p", a[1], "Pa", " (an absolute pressure)");
        }
        return null;
    }

    @Override
    double compute(double[] a) {
        double t = a[0];
        double rho = tanaka(t);
        if (a.length > 1) {
            rho *= compressionFactor(t, a[1]);
        }
        return airSaturated ? rho + dissolvedAirCorrection(t) : rho;
    }

    /** The domain of {@link #problem}: t in [0, 25 or 40] °C (so finite), p finite and positive. */
    @Override
    boolean computeBlock(double[][] args, int n, double[] out) {
        double[] t = args[0];
        double[] p = args.length > 1 ? args[1] : null;
        double high = airSaturated ? 25.0 : 40.0;
        for (int i = 0; i < n; i++) {
            double ti = t[i];
            double rho = tanaka(ti);
            boolean ok = ti >= 0.0 && ti <= high;
            if (p != null) {
                rho *= compressionFactor(ti, p[i]);
                ok &= positiveFinite(p[i]);
            }
            if (airSaturated) {
                rho += dissolvedAirCorrection(ti);
            }
            out[i] = ok ? rho : Double.NaN;
        }
        return true;
    }

    @Override
    DerivativeStructure compute(DerivativeStructure[] a) {
        DerivativeStructure t = a[0];
        DerivativeStructure u = t.add(A1);
        DerivativeStructure rho = u.multiply(u).multiply(t.add(A2)).divide(t.add(A4).multiply(A3))
                .negate().add(1.0).multiply(A5);
        if (a.length > 1) {
            DerivativeStructure k = t.multiply(K2).add(K1).multiply(t).add(K0);
            rho = rho.multiply(k.multiply(a[1].subtract(P0)).add(1.0));
        }
        return airSaturated ? rho.add(t.multiply(S1).add(S0)) : rho;
    }
}
