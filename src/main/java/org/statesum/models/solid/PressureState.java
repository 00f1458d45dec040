package org.statesum.models.solid;

import java.util.Map;
import org.statesum.engine.Series;
import org.statesum.models.Quantity;

/**
 * The quasi-harmonic answer at one pressure, on the temperature grid, SI per formula unit or per atom.
 *
 * @param pressurePascal P, Pa
 * @param thermo G, H, F, S, C_V and C_P (J, J/K)
 * @param volumeCubicMetre V(T), m^3
 * @param bulkModulusPascal B(T), Pa
 * @param thermalExpansionPerKelvin alpha(T) = (1/V) dV/dT, 1/K
 */
public record PressureState(double pressurePascal, Map<Quantity, Series> thermo, Series volumeCubicMetre,
        Series bulkModulusPascal, Series thermalExpansionPerKelvin) {
}
