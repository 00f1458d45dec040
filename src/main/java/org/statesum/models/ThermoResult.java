package org.statesum.models;

import java.util.List;
import java.util.Map;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;

/**
 * What a model returns: quantities on a temperature grid in SI units per entity of the chosen basis
 * (J, J/K; ln Z dimensionless), how they were computed, and warnings.
 *
 * @param temperaturesKelvin the grid, K
 * @param series the quantities, in the order they should be reported
 * @param precision how the numbers were computed (arithmetic, summation, terms kept, bounds), as
 *        name-value pairs whose values are strings, numbers or booleans
 * @param warnings conditions the caller should know about
 * @param populations level populations per temperature, or null
 */
public record ThermoResult(
        double[] temperaturesKelvin,
        Map<Quantity, Series> series,
        Map<String, Object> precision,
        List<Warning> warnings,
        Populations populations) {

    /** Level populations p_i(T): rows are temperatures, columns levels; bounds side by side. */
    public record Populations(double[][] values, double[][] errorBounds) {
    }
}
