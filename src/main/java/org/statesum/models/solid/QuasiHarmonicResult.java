package org.statesum.models.solid;

import java.util.List;
import java.util.Map;
import org.statesum.engine.Warning;

/**
 * What {@link QuasiHarmonicModel} returns.
 *
 * @param temperaturesKelvin the grid, K
 * @param states one per pressure, in the order given
 * @param maxResidualJoule largest |fit - data| of the F(V) fit at each temperature, J per formula unit or atom
 * @param rmsResidualJoule root-mean-square residual at each temperature, same unit
 * @param precision how it was computed
 * @param warnings per-temperature conditions
 */
public record QuasiHarmonicResult(double[] temperaturesKelvin, List<PressureState> states, double[] maxResidualJoule,
        double[] rmsResidualJoule, Map<String, Object> precision, List<Warning> warnings) {
}
