package org.quire.engine.flow;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;

/**
 * Conventional mass of a body: {@code conventional_mass(m, rho)} = m (1 - 1.2/rho) / (1 - 1.2/8000), the mass
 * of a weight of density 8000 kg/m^3 that balances the body in air of density 1.2 kg/m^3 at 20 °C.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: OIML D 28:2004 "Conventional value of the result of weighing in air" (definition; from
 * memory); OIML R 111-1:2004 (weights specified by conventional mass).
 */
public final class ConventionalMass extends FlowFunction {

    private static final double DENOMINATOR =
            1.0 - BuoyancyFactor.RHO_AIR_CONVENTIONAL / BuoyancyFactor.RHO_CONVENTIONAL;

    ConventionalMass() {
        super("conventional_mass", List.of("m", "rho"), 2, List.of("kg", "kg/m^3"), "kg",
                "Conventional mass of a body of mass m and density rho: m (1 - 1.2/rho) / (1 - 1.2/8000), "
                        + "OIML D 28.");
    }

    /** @return m (1 - 1.2/rho) / (1 - 1.2/8000) */
    public static double of(double m, double rho) {
        return m * (1.0 - BuoyancyFactor.RHO_AIR_CONVENTIONAL / rho) / DENOMINATOR;
    }

    @Override
    String problem(double[] a) {
        if (!(a[1] > BuoyancyFactor.RHO_AIR_CONVENTIONAL)) {
            return FlowMessages.mustExceed("density of the body", "rho", a[1],
                    "reference air density of conventional mass", BuoyancyFactor.RHO_AIR_CONVENTIONAL, "kg/m^3");
        }
        return null;
    }

    @Override
    double compute(double[] a) {
        return of(a[0], a[1]);
    }

    @Override
    DerivativeStructure compute(DerivativeStructure[] a) {
        return a[0].multiply(a[1].reciprocal().multiply(-BuoyancyFactor.RHO_AIR_CONVENTIONAL).add(1.0))
                .divide(DENOMINATOR);
    }
}
