package org.quire.engine.flow;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;

/**
 * Thermal expansion of a length, an area or a volume from the linear expansion coefficient alpha:
 * {@code linear_expansion(alpha, t[, t_ref])} = 1 + alpha (t - t_ref),
 * {@code area_expansion(alpha, t[, t_ref])} = (1 + alpha (t - t_ref))^2 (the bore of a meter or the
 * cross-section of a pipe), {@code volume_expansion(alpha, t[, t_ref])} = (1 + alpha (t - t_ref))^3 (a
 * volumetric standard or prover of isotropic material). t_ref defaults to 20 °C, the standard reference
 * temperature of ISO 1. The factor multiplies the dimension known at t_ref to give it at t.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: ISO 1:2016 (standard reference temperature 20 °C); JCGM 100:2008 H.1 (the linear-expansion
 * term l_s (1 + alpha_s theta_s) of the end-gauge model); the area and volume factors are powers of the linear
 * one for an isotropic solid (common practice).
 */
public final class ThermalExpansion extends FlowFunction {

    /** Standard reference temperature, °C (ISO 1). */
    public static final double T_REF_DEFAULT = 20.0;

    private final int power;

    private ThermalExpansion(String name, int power, String what) {
        super(name, List.of("alpha", "t", "t_ref"), 2, List.of("/°C", "°C", "°C"), "1",
                "Thermal expansion factor of " + what + ": (1 + alpha (t - t_ref))"
                        + (power == 1 ? "" : "^" + power) + ", t_ref default 20 °C (ISO 1).");
        this.power = power;
    }

    /** @return {@code linear_expansion(alpha, t[, t_ref])} */
    public static ThermalExpansion linear() {
        return new ThermalExpansion("linear_expansion", 1, "a length");
    }

    /** @return {@code area_expansion(alpha, t[, t_ref])} */
    public static ThermalExpansion area() {
        return new ThermalExpansion("area_expansion", 2, "an area (bore or pipe cross-section)");
    }

    /** @return {@code volume_expansion(alpha, t[, t_ref])} */
    public static ThermalExpansion volume() {
        return new ThermalExpansion("volume_expansion", 3, "a volume");
    }

    /** @return 1 for length, 2 for area, 3 for volume */
    public int power() {
        return power;
    }

    @Override
    String problem(double[] a) {
        if (a[1] < -273.15) {
            return FlowMessages.belowAbsoluteZero("temperature", "t", a[1]);
        }
        double tRef = a.length > 2 ? a[2] : T_REF_DEFAULT;
        if (tRef < -273.15) {
            return FlowMessages.belowAbsoluteZero("reference temperature", "t_ref", tRef);
        }
        double linear = 1.0 + a[0] * (a[1] - tRef);
        if (!(linear > 0.0)) {
            return FlowMessages.expansionNotPositive(linear);
        }
        return null;
    }

    @Override
    double compute(double[] a) {
        double tRef = a.length > 2 ? a[2] : T_REF_DEFAULT;
        double linear = 1.0 + a[0] * (a[1] - tRef);
        return switch (power) {
            case 1 -> linear;
            case 2 -> linear * linear;
            default -> linear * linear * linear;
        };
    }

    @Override
    DerivativeStructure compute(DerivativeStructure[] a) {
        DerivativeStructure dt = a.length > 2 ? a[1].subtract(a[2]) : a[1].subtract(T_REF_DEFAULT);
        return a[0].multiply(dt).add(1.0).pow(power);
    }
}
