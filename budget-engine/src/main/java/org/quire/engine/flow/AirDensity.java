package org.quire.engine.flow;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;

/**
 * Density of moist air by the CIPM-2007 formula: {@code air_density(p, t, h[, x_co2])}.
 *
 * <pre>
 * rho_a = p M_a / (Z R T) [1 - x_v (1 - M_v / M_a)]                                    (eq. 1)
 * T = t + 273.15 K
 * M_a = [28.96546 + 12.011 (x_CO2 - 0.0004)] 10^-3 kg/mol,  M_v = 18.01528 10^-3 kg/mol  (eqs. 2, 3)
 * R = 8.314472 J/(mol K)
 * x_v = h f(p, t) p_sv(T) / p                                                           (eq. A1.2)
 * p_sv = 1 Pa exp(A T^2 + B T + C + D/T),  A = 1.2378847e-5 K^-2, B = -1.9121316e-2 K^-1,
 *        C = 33.93711047, D = -6.3431645e3 K                                            (eq. A1.3)
 * f = alpha + beta p + gamma t^2,  alpha = 1.00062, beta = 3.14e-8 Pa^-1, gamma = 5.6e-7 K^-2    (eq. A1.4)
 * Z = 1 - p/T [a0 + a1 t + a2 t^2 + (b0 + b1 t) x_v + (c0 + c1 t) x_v^2] + p^2/T^2 (d + e x_v^2)  (eq. A1.5)
 *     a0 = 1.58123e-6 K/Pa, a1 = -2.9331e-8 /Pa, a2 = 1.1043e-10 /(K Pa), b0 = 5.707e-6 K/Pa,
 *     b1 = -2.051e-8 /Pa, c0 = 1.9898e-4 K/Pa, c1 = -2.376e-6 /Pa, d = 1.83e-11 K^2/Pa^2, e = -0.765e-8 K^2/Pa^2
 * </pre>
 * p is the absolute pressure in Pa, t the temperature in °C (ITS-90), h the relative humidity as a fraction
 * from 0 to 1 and x_co2 the mole fraction of carbon dioxide (default 0.0004, the value of the CIPM reference
 * composition). The formula is stated for 600 hPa to 1100 hPa and 15 °C to 27 °C (the range of validity of
 * CIPM-81/91, kept by CIPM-2007; from memory); arguments outside are refused. x_co2 is accepted from 0 to 0.01,
 * the neighbourhood of 0.0004 where the linear molar-mass formula holds (a Quire choice).
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: A. Picard, R. S. Davis, M. Gläser, K. Fujii, "Revised formula for the density of moist air
 * (CIPM-2007)", Metrologia 45 (2008) 149-155: eq. (1) and the appendix giving p_sv, f, Z and their constants (equation numbers quoted
 * here from memory);
 * R. S. Davis, "Equation for the determination of the density of moist air (1981/91)", Metrologia 29 (1992)
 * 67-70 (range of validity).
 */
public final class AirDensity extends FlowFunction {

    static final double A = 1.2378847e-5;
    static final double B = -1.9121316e-2;
    static final double C = 33.93711047;
    static final double D = -6.3431645e3;
    static final double ALPHA = 1.00062;
    static final double BETA = 3.14e-8;
    static final double GAMMA = 5.6e-7;
    static final double A0 = 1.58123e-6;
    static final double A1 = -2.9331e-8;
    static final double A2 = 1.1043e-10;
    static final double B0 = 5.707e-6;
    static final double B1 = -2.051e-8;
    static final double C0 = 1.9898e-4;
    static final double C1 = -2.376e-6;
    static final double DD = 1.83e-11;
    static final double E = -0.765e-8;
    static final double R = 8.314472;
    static final double MV = 18.01528e-3;
    /** Mole fraction of CO2 of the reference composition, used when x_co2 is not given. */
    public static final double X_CO2_REFERENCE = 0.0004;

    private static final String FORMULA = "the CIPM-2007 air-density formula";

    AirDensity() {
        super("air_density", List.of("p", "t", "h", "x_co2"), 3, List.of("Pa", "°C", "1", "1"), "kg/m^3",
                "Density of moist air at absolute pressure p, temperature t, relative humidity h (a fraction "
                        + "0 to 1) and CO2 mole fraction x_co2 (default 0.0004): CIPM-2007, Picard et al. "
                        + "(2008), Metrologia 45, 149, eq. (1).");
    }

    /** @return the saturation vapour pressure of water, Pa, at thermodynamic temperature {@code kelvin} (eq. A1.3) */
    public static double saturationVapourPressure(double kelvin) {
        return Math.exp(A * kelvin * kelvin + B * kelvin + C + D / kelvin);
    }

    /** @return the enhancement factor f(p, t) (eq. A1.4), p in Pa, t in °C */
    public static double enhancementFactor(double p, double t) {
        return ALPHA + BETA * p + GAMMA * t * t;
    }

    /** @return the mole fraction of water vapour x_v (eq. A1.2), p in Pa, t in °C, h a fraction */
    public static double waterVapourMoleFraction(double p, double t, double h) {
        return h * enhancementFactor(p, t) * saturationVapourPressure(t + 273.15) / p;
    }

    /** @return the compressibility factor Z (eq. A1.5), p in Pa, t in °C, xv the water-vapour mole fraction */
    public static double compressibilityFactor(double p, double t, double xv) {
        double T = t + 273.15;
        double pt = p / T;
        return 1.0 - pt * (A0 + A1 * t + A2 * t * t + (B0 + B1 * t) * xv + (C0 + C1 * t) * xv * xv)
                + pt * pt * (DD + E * xv * xv);
    }

    /** @return the molar mass of dry air with CO2 mole fraction x_co2, kg/mol (eq. 2) */
    public static double molarMassOfDryAir(double xCo2) {
        return (28.96546 + 12.011 * (xCo2 - X_CO2_REFERENCE)) * 1e-3;
    }

    /**
     * @return the density of moist air, kg/m^3, CIPM-2007 eq. (1); p in Pa, t in °C, h a fraction; no range
     *     check
     */
    public static double cipm2007(double p, double t, double h, double xCo2) {
        double T = t + 273.15;
        double xv = waterVapourMoleFraction(p, t, h);
        double z = compressibilityFactor(p, t, xv);
        double ma = molarMassOfDryAir(xCo2);
        return p * ma / (z * R * T) * (1.0 - xv * (1.0 - MV / ma));
    }

    @Override
    String problem(double[] a) {
        double p = a[0];
        double t = a[1];
        double h = a[2];
        if (t < -273.15) {
            return FlowMessages.belowAbsoluteZero("temperature", "t", t);
        }
        if (!(p > 0.0)) {
            return FlowMessages.notPositive("pressure", "p", p, "Pa", " (an absolute pressure)");
        }
        if (h < 0.0 || h > 1.0) {
            return FlowMessages.fractionOutside("relative humidity", "h", h, 1.0,
                    " (give it as a fraction: 50 % is 0.5)");
        }
        if (a.length > 3 && (a[3] < 0.0 || a[3] > 0.01)) {
            return FlowMessages.fractionOutside("CO2 mole fraction", "x_co2", a[3], 0.01,
                    " (a mole fraction: 400 ppm is 0.0004)");
        }
        if (t < 15.0 || t > 27.0) {
            return FlowMessages.outsideValidity("temperature", "t", t, "°C", 15.0, 27.0, FORMULA);
        }
        if (p < 60000.0 || p > 110000.0) {
            return FlowMessages.outsideValidity("pressure", "p", p, "Pa", 60000.0, 110000.0, FORMULA);
        }
        return null;
    }

    @Override
    double compute(double[] a) {
        return cipm2007(a[0], a[1], a[2], a.length > 3 ? a[3] : X_CO2_REFERENCE);
    }

    /** The domain of {@link #problem}: t in [15, 27] °C, p in [60000, 110000] Pa, h in [0, 1], x_co2 in [0, 0.01]. */
    @Override
    boolean computeBlock(double[][] args, int n, double[] out) {
        double[] p = args[0];
        double[] t = args[1];
        double[] h = args[2];
        double[] x = args.length > 3 ? args[3] : null;
        for (int i = 0; i < n; i++) {
            double pi = p[i];
            double ti = t[i];
            double hi = h[i];
            double xi = x == null ? X_CO2_REFERENCE : x[i];
            boolean ok = ti >= 15.0 && ti <= 27.0 && pi >= 60000.0 && pi <= 110000.0 && hi >= 0.0 && hi <= 1.0
                    && xi >= 0.0 && xi <= 0.01;
            out[i] = ok ? cipm2007(pi, ti, hi, xi) : Double.NaN;
        }
        return true;
    }

    @Override
    DerivativeStructure compute(DerivativeStructure[] a) {
        DerivativeStructure p = a[0];
        DerivativeStructure t = a[1];
        DerivativeStructure h = a[2];
        DerivativeStructure xco2 = a.length > 3 ? a[3] : constant(p, X_CO2_REFERENCE);
        DerivativeStructure T = t.add(273.15);
        DerivativeStructure psv = T.multiply(A).add(B).multiply(T).add(C).add(T.reciprocal().multiply(D)).exp();
        DerivativeStructure f = p.multiply(BETA).add(t.multiply(t).multiply(GAMMA)).add(ALPHA);
        DerivativeStructure xv = h.multiply(f).multiply(psv).divide(p);
        DerivativeStructure pt = p.divide(T);
        DerivativeStructure bracket = t.multiply(A2).add(A1).multiply(t).add(A0)
                .add(t.multiply(B1).add(B0).multiply(xv))
                .add(t.multiply(C1).add(C0).multiply(xv.multiply(xv)));
        DerivativeStructure z = pt.multiply(bracket).negate().add(1.0)
                .add(pt.multiply(pt).multiply(xv.multiply(xv).multiply(E).add(DD)));
        DerivativeStructure ma = xco2.subtract(X_CO2_REFERENCE).multiply(12.011).add(28.96546).multiply(1e-3);
        DerivativeStructure moist = xv.multiply(ma.reciprocal().multiply(MV).negate().add(1.0)).negate().add(1.0);
        return p.multiply(ma).divide(z.multiply(T).multiply(R)).multiply(moist);
    }
}
