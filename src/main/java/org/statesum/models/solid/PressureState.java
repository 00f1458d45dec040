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
 * @param thermoFitEstimates the fit-error estimate of each thermo series, same units (an estimate of how far
 *        the chosen equation of state's best fit may move the answer; not a bound)
 * @param volumeFitEstimate, bulkModulusFitEstimate, thermalExpansionFitEstimate the same for V, B, alpha
 */
public record PressureState(double pressurePascal, Map<Quantity, Series> thermo, Series volumeCubicMetre,
        Series bulkModulusPascal, Series thermalExpansionPerKelvin, Map<Quantity, double[]> thermoFitEstimates,
        double[] volumeFitEstimate, double[] bulkModulusFitEstimate, double[] thermalExpansionFitEstimate) {
}
