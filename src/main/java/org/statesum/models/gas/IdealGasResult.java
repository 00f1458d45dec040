package org.statesum.models.gas;

import java.util.Map;
import org.statesum.engine.Series;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;

/**
 * The ideal-gas answer: the totals (SI per molecule) and the same quantities split by factor of the
 * partition function (the pV term counted with translation, E_el with the electronic part).
 */
public record IdealGasResult(ThermoResult total, Map<GasContribution, Map<Quantity, Series>> contributions) {
}
