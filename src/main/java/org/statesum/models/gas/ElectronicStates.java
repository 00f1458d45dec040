package org.statesum.models.gas;

import java.util.Map;
import org.statesum.engine.CanonicalEnsemble;
import org.statesum.engine.CanonicalTable;
import org.statesum.engine.LevelSet;

/**
 * Electronic levels (energies relative to any reference, degeneracies) summed exactly by
 * {@link CanonicalEnsemble}, plus an optional absolute electronic energy E_el that shifts U, H, F and
 * G (not S or C) so that they are absolute, for example on the scale of a quantum-chemistry code.
 *
 * @param levels the levels, energies as E / k_B
 * @param absoluteEnergyJoule E_el per molecule, J (0 when not given)
 * @param absoluteEnergyErrorJoule the rounding bound of E_el after its unit conversion, J
 */
public record ElectronicStates(LevelSet levels, double absoluteEnergyJoule, double absoluteEnergyErrorJoule) {

    /** The part at every temperature. */
    public GasPart evaluate(double[] temperaturesKelvin) {
        CanonicalTable table = CanonicalEnsemble.evaluate(levels, temperaturesKelvin, false);
        return new GasPart(table.internalEnergyKelvin(), table.entropyOverBoltzmann(),
                table.heatCapacityOverBoltzmann());
    }

    void describe(Map<String, Object> precision) {
        precision.put("electronic", levels.size() + " level(s), exact sum"
                + (absoluteEnergyJoule != 0 ? "; absolute electronic energy added to U, H, F and G" : ""));
    }
}
