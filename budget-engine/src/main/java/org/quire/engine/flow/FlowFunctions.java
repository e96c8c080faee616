package org.quire.engine.flow;

import java.util.List;
import java.util.Optional;
import org.quire.engine.model.ModelFunction;

/**
 * The built-in flow-metrology functions the model compiler registers.
 *
 * <table>
 *   <caption>Functions, argument units and result unit</caption>
 *   <tr><th>function</th><th>arguments</th><th>result</th></tr>
 *   <tr><td>water_density(t[, p])</td><td>°C, Pa</td><td>kg/m^3</td></tr>
 *   <tr><td>water_density_air_saturated(t[, p])</td><td>°C, Pa</td><td>kg/m^3</td></tr>
 *   <tr><td>air_density(p, t, h[, x_co2])</td><td>Pa, °C, 1, 1</td><td>kg/m^3</td></tr>
 *   <tr><td>buoyancy_factor(rho_a, rho_w[, rho_ref])</td><td>kg/m^3 each</td><td>1</td></tr>
 *   <tr><td>conventional_mass(m, rho)</td><td>kg, kg/m^3</td><td>kg</td></tr>
 *   <tr><td>linear_expansion / area_expansion / volume_expansion(alpha, t[, t_ref])</td>
 *       <td>/°C, °C, °C</td><td>1</td></tr>
 *   <tr><td>induced_voltage(k, b, d, v)</td><td>1, T, m, m/s</td><td>V</td></tr>
 *   <tr><td>pipe_flow(d, v)</td><td>m, m/s</td><td>m^3/s</td></tr>
 *   <tr><td>velocity_from_flow(q, d)</td><td>m^3/s, m</td><td>m/s</td></tr>
 *   <tr><td>pulse_volume(pulses, k_factor)</td><td>1, 1/L</td><td>L</td></tr>
 * </table>
 *
 * <p>Stateless and thread-safe; the list and its functions are immutable.
 */
public final class FlowFunctions {

    private static final List<ModelFunction> ALL = List.of(
            WaterDensity.airFree(),
            WaterDensity.airSaturated(),
            new AirDensity(),
            new BuoyancyFactor(),
            new ConventionalMass(),
            ThermalExpansion.linear(),
            ThermalExpansion.area(),
            ThermalExpansion.volume(),
            new MeterRelations.InducedVoltage(),
            new MeterRelations.PipeFlow(),
            new MeterRelations.VelocityFromFlow(),
            new MeterRelations.PulseVolume());

    private FlowFunctions() {
    }

    /** @return every flow function, in a fixed order; names are unique */
    public static List<ModelFunction> all() {
        return ALL;
    }

    /** @return the function called {@code name}, if there is one */
    public static Optional<ModelFunction> named(String name) {
        return ALL.stream().filter(f -> f.name().equals(name)).findFirst();
    }
}
