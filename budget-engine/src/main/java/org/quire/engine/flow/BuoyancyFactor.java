package org.quire.engine.flow;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;

/**
 * Air-buoyancy correction of a weighing: {@code buoyancy_factor(rho_a, rho_w[, rho_ref])}, the factor by which a
 * balance indication is multiplied to give the (true) mass of the weighed body, e.g. the water collected in a
 * gravimetric flow calibration.
 *
 * <p>The balance is adjusted with reference weights whose conventional mass it indicates. With weights of
 * density {@code rho_ref} (default 8000 kg/m^3, the reference density of conventional mass):
 * <pre>
 * m = I × [(1 - rho_0 / 8000) / (1 - rho_0 / rho_ref)] × (1 - rho_a / rho_ref) / (1 - rho_a / rho_w)
 * </pre>
 * with rho_0 = 1.2 kg/m^3. The bracket converts the weights' conventional mass to their true mass (OIML D 28);
 * it is exactly 1 for rho_ref = 8000 kg/m^3, when the factor reduces to the familiar
 * {@code (1 - rho_a/8000) / (1 - rho_a/rho_w)}. {@link ConventionalMass} gives the convention itself.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: OIML D 28:2004 "Conventional value of the result of weighing in air", clauses 4 and 5
 * (definition m_c = m (1 - 1.2/rho)/(1 - 1.2/8000); from memory); OIML R 111-1:2004 (reference density
 * 8000 kg/m^3, reference air density 1.2 kg/m^3); ISO 4787:2021 (gravimetric calibration of volumetric
 * instruments, the same buoyancy factor; from memory).
 */
public final class BuoyancyFactor extends FlowFunction {

    /** Reference density of conventional mass, kg/m^3 (OIML D 28). */
    public static final double RHO_CONVENTIONAL = 8000.0;
    /** Reference air density of conventional mass, kg/m^3 (OIML D 28). */
    public static final double RHO_AIR_CONVENTIONAL = 1.2;

    BuoyancyFactor() {
        super("buoyancy_factor", List.of("rho_a", "rho_w", "rho_ref"), 2,
                List.of("kg/m^3", "kg/m^3", "kg/m^3"), "1",
                "Air-buoyancy factor turning a balance indication into mass, for a body of density rho_w weighed "
                        + "in air of density rho_a on a balance adjusted with weights of density rho_ref (default "
                        + "8000 kg/m^3) of known conventional mass: OIML D 28, OIML R 111-1.");
    }

    /** @return the buoyancy factor for weights of density 8000 kg/m^3: (1 - rho_a/8000) / (1 - rho_a/rho_w) */
    public static double factor(double rhoA, double rhoW) {
        return (1.0 - rhoA / RHO_CONVENTIONAL) / (1.0 - rhoA / rhoW);
    }

    /** @return the buoyancy factor for weights of density {@code rhoRef} (see the class description) */
    public static double factor(double rhoA, double rhoW, double rhoRef) {
        double conventional = (1.0 - RHO_AIR_CONVENTIONAL / RHO_CONVENTIONAL) / (1.0 - RHO_AIR_CONVENTIONAL / rhoRef);
        return conventional * (1.0 - rhoA / rhoRef) / (1.0 - rhoA / rhoW);
    }

    @Override
    String problem(double[] a) {
        double rhoA = a[0];
        double rhoW = a[1];
        if (rhoA < 0.0) {
            return FlowMessages.negative("air density", "rho_a", rhoA, "kg/m^3");
        }
        if (!(rhoW > 0.0)) {
            return FlowMessages.notPositive("density of the weighed body", "rho_w", rhoW, "kg/m^3", "");
        }
        if (!(rhoA < rhoW)) {
            return FlowMessages.notLessThan("air density", "rho_a", rhoA, "density of the weighed body", "rho_w",
                    rhoW, "kg/m^3");
        }
        if (a.length > 2) {
            double rhoRef = a[2];
            if (!(rhoRef > RHO_AIR_CONVENTIONAL)) {
                return FlowMessages.mustExceed("density of the reference weights", "rho_ref", rhoRef,
                        "reference air density of conventional mass", RHO_AIR_CONVENTIONAL, "kg/m^3");
            }
            if (!(rhoA < rhoRef)) {
                return FlowMessages.notLessThan("air density", "rho_a", rhoA, "density of the reference weights",
                        "rho_ref", rhoRef, "kg/m^3");
            }
        }
        return null;
    }

    @Override
    double compute(double[] a) {
        return a.length > 2 ? factor(a[0], a[1], a[2]) : factor(a[0], a[1]);
    }

    /** The domain of {@link #problem}: 0 &lt;= rho_a &lt; rho_w, rho_w finite; rho_a &lt; rho_ref, rho_ref finite, &gt; 1.2. */
    @Override
    boolean computeBlock(double[][] args, int n, double[] out) {
        double[] a = args[0];
        double[] w = args[1];
        double[] ref = args.length > 2 ? args[2] : null;
        for (int i = 0; i < n; i++) {
            double rhoA = a[i];
            double rhoW = w[i];
            boolean ok = rhoA >= 0.0 && rhoA < rhoW && rhoW <= Double.MAX_VALUE;
            double f;
            if (ref == null) {
                f = factor(rhoA, rhoW);
            } else {
                double rhoRef = ref[i];
                ok &= rhoRef > RHO_AIR_CONVENTIONAL && rhoA < rhoRef && rhoRef <= Double.MAX_VALUE;
                f = factor(rhoA, rhoW, rhoRef);
            }
            out[i] = ok ? f : Double.NaN;
        }
        return true;
    }

    @Override
    DerivativeStructure compute(DerivativeStructure[] a) {
        DerivativeStructure rhoA = a[0];
        DerivativeStructure denominator = rhoA.divide(a[1]).negate().add(1.0);
        if (a.length == 2) {
            return rhoA.divide(RHO_CONVENTIONAL).negate().add(1.0).divide(denominator);
        }
        DerivativeStructure rhoRef = a[2];
        DerivativeStructure conventional = rhoRef.reciprocal().multiply(-RHO_AIR_CONVENTIONAL).add(1.0).reciprocal()
                .multiply(1.0 - RHO_AIR_CONVENTIONAL / RHO_CONVENTIONAL);
        return conventional.multiply(rhoA.divide(rhoRef).negate().add(1.0)).divide(denominator);
    }
}
