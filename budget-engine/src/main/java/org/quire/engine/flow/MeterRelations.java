package org.quire.engine.flow;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;

/**
 * Relations of flow meters between signal, velocity, flow and volume:
 * <ul>
 *   <li>{@code induced_voltage(k, b, d, v)} = k B D v: the electrode voltage of an electromagnetic meter with
 *       magnetic flux density B, electrode spacing (bore) D, mean velocity v and a dimensionless meter
 *       constant k (1 for a uniform field and an axisymmetric flow);
 *   <li>{@code pipe_flow(d, v)} = pi D^2 v / 4: volume flow rate through a circular bore from the mean velocity;
 *   <li>{@code velocity_from_flow(q, d)} = 4 q / (pi D^2): the inverse;
 *   <li>{@code pulse_volume(pulses, k_factor)} = pulses / K: the volume registered by a pulse-output meter with
 *       K-factor K pulses per litre.
 * </ul>
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: Faraday's law of induction, e = B D v for a conductor of length D moving at v across a field B
 * (J. A. Shercliff, "The theory of electromagnetic flow-measurement", Cambridge University Press, 1962,
 * chapter 1; ISO 6817:1992 clause 3, principle of measurement; from memory); continuity q = A v with
 * A = pi D^2 / 4 (ISO 4006:1991, definitions of mean velocity and volume flow rate; from memory); K-factor as
 * pulses per unit volume (OIML R 117-1:2019 terminology; from memory).
 */
public final class MeterRelations {

    private MeterRelations() {
    }

    /** {@code induced_voltage(k, b, d, v)}. */
    static final class InducedVoltage extends FlowFunction {
        InducedVoltage() {
            super("induced_voltage", List.of("k", "b", "d", "v"), 4, List.of("1", "T", "m", "m/s"), "V",
                    "Electrode voltage of an electromagnetic flow meter, k B D v (Faraday's law of induction), "
                            + "with meter constant k, flux density b, electrode spacing d and mean velocity v.");
        }

        @Override
        String problem(double[] a) {
            return a[2] > 0.0 ? null
                    : FlowMessages.notPositive("electrode spacing", "d", a[2], "m", "");
        }

        @Override
        double compute(double[] a) {
            return a[0] * a[1] * a[2] * a[3];
        }

        @Override
        DerivativeStructure compute(DerivativeStructure[] a) {
            return a[0].multiply(a[1]).multiply(a[2]).multiply(a[3]);
        }
    }

    /** {@code pipe_flow(d, v)}. */
    static final class PipeFlow extends FlowFunction {
        PipeFlow() {
            super("pipe_flow", List.of("d", "v"), 2, List.of("m", "m/s"), "m^3/s",
                    "Volume flow rate through a circular bore of diameter d at mean velocity v: pi d^2 v / 4.");
        }

        @Override
        String problem(double[] a) {
            return a[0] > 0.0 ? null : FlowMessages.notPositive("bore diameter", "d", a[0], "m", "");
        }

        @Override
        double compute(double[] a) {
            return pipeFlow(a[0], a[1]);
        }

        @Override
        DerivativeStructure compute(DerivativeStructure[] a) {
            return a[0].multiply(a[0]).multiply(a[1]).multiply(Math.PI / 4.0);
        }
    }

    /** {@code velocity_from_flow(q, d)}. */
    static final class VelocityFromFlow extends FlowFunction {
        VelocityFromFlow() {
            super("velocity_from_flow", List.of("q", "d"), 2, List.of("m^3/s", "m"), "m/s",
                    "Mean velocity in a circular bore of diameter d at volume flow rate q: 4 q / (pi d^2).");
        }

        @Override
        String problem(double[] a) {
            return a[1] > 0.0 ? null : FlowMessages.notPositive("bore diameter", "d", a[1], "m", "");
        }

        @Override
        double compute(double[] a) {
            return velocityFromFlow(a[0], a[1]);
        }

        @Override
        DerivativeStructure compute(DerivativeStructure[] a) {
            return a[0].multiply(4.0 / Math.PI).divide(a[1].multiply(a[1]));
        }
    }

    /** {@code pulse_volume(pulses, k_factor)}. */
    static final class PulseVolume extends FlowFunction {
        PulseVolume() {
            super("pulse_volume", List.of("pulses", "k_factor"), 2, List.of("1", "1/L"), "L",
                    "Volume registered by a pulse-output meter: pulses / k_factor, the K-factor in pulses per "
                            + "litre.");
        }

        @Override
        String problem(double[] a) {
            if (a[0] < 0.0) {
                return FlowMessages.negative("pulse count", "pulses", a[0], "");
            }
            return a[1] > 0.0 ? null : FlowMessages.notPositive("K-factor", "k_factor", a[1], "1/L", "");
        }

        @Override
        double compute(double[] a) {
            return a[0] / a[1];
        }

        /** The domain of {@link #problem}: pulses finite and &gt;= 0, k_factor finite and &gt; 0. */
        @Override
        boolean computeBlock(double[][] args, int n, double[] out) {
            double[] pulses = args[0];
            double[] k = args[1];
            for (int i = 0; i < n; i++) {
                double x = pulses[i];
                double ki = k[i];
                boolean ok = x >= 0.0 && x <= Double.MAX_VALUE && positiveFinite(ki);
                out[i] = ok ? x / ki : Double.NaN;
            }
            return true;
        }

        @Override
        DerivativeStructure compute(DerivativeStructure[] a) {
            return a[0].divide(a[1]);
        }
    }

    /** @return pi d^2 v / 4, the volume flow rate through a circular bore */
    public static double pipeFlow(double d, double v) {
        return Math.PI / 4.0 * d * d * v;
    }

    /** @return 4 q / (pi d^2), the mean velocity in a circular bore */
    public static double velocityFromFlow(double q, double d) {
        return 4.0 / Math.PI * q / (d * d);
    }
}
