package org.statesum.models.reaction;

import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.engine.Series;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;

/** A phase without a pV term (a level set, a harmonic solid at zero pressure): G = F, H = U, C_p = C_V. */
final class WithoutPv {

    private WithoutPv() {
    }

    /** {@code r} with the Gibbs energy, enthalpy and isobaric heat capacity a reaction needs. */
    static ThermoResult of(ThermoResult r) {
        Map<Quantity, Series> series = new LinkedHashMap<>(r.series());
        series.put(Quantity.GIBBS_ENERGY, r.series().get(Quantity.HELMHOLTZ_ENERGY));
        series.put(Quantity.ENTHALPY, r.series().get(Quantity.INTERNAL_ENERGY));
        series.put(Quantity.ISOBARIC_HEAT_CAPACITY, r.series().get(Quantity.ISOCHORIC_HEAT_CAPACITY));
        return new ThermoResult(r.temperaturesKelvin(), series, r.precision(), r.warnings(), null);
    }
}
