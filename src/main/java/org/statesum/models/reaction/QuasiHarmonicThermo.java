package org.statesum.models.reaction;

import org.statesum.models.ThermoResult;
import org.statesum.models.solid.QuasiHarmonicCrystal;
import org.statesum.models.solid.QuasiHarmonicModel;
import org.statesum.models.solid.QuasiHarmonicResult;

/**
 * A quasi-harmonic crystal in a reaction, per formula unit, as a pure solid at one pressure: G(T, P),
 * H, S and C_p from {@link QuasiHarmonicModel}, activity 1.
 *
 * @param crystal the sampled crystal
 * @param pressurePascal the pressure, Pa
 */
public record QuasiHarmonicThermo(QuasiHarmonicCrystal crystal, double pressurePascal) implements SpeciesThermo {

    @Override
    public ThermoResult at(double[] temperaturesKelvin) {
        QuasiHarmonicResult r = QuasiHarmonicModel.evaluate(crystal, temperaturesKelvin,
                new double[] {pressurePascal}, false);
        return new ThermoResult(r.temperaturesKelvin(), r.states().get(0).thermo(), r.precision(), r.warnings(), null);
    }

    @Override
    public String standardState() {
        return "pure solid per formula unit at P = " + pressurePascal + " Pa, quasi-harmonic (activity 1)";
    }
}
