package org.statesum.engine;

/**
 * A level set rearranged for repeated evaluation: energies shifted to the lowest level
 * (dE_i = E_i - E_0 >= 0) and, per level, the first-order rounding bounds used by the error analysis.
 *
 * <p>With u = 2^-53 the unit roundoff, the exponent y_i = ln g_i - dE_i / T of level i carries an
 * absolute error of at most beta A_i + B_i, where
 * <ul>
 *   <li>A_i = 4 u dE_i + r (|E_i| + |E_0|) (kelvin) covers the subtraction E_i - E_0, the division by T,
 *       the rounding of y_i, and the relative input error r of each energy;</li>
 *   <li>B_i = u |ln g_i| (+ 2 u |ln g_i| when ln g_i came from Math.log, accurate to one ulp).</li>
 * </ul>
 */
final class PreparedLevels {

    static final double UNIT_ROUNDOFF = 0x1.0p-53;

    final int size;
    final double[] shiftedEnergies;
    final double[] logDegeneracies;
    final double[] energyErrorTerms;
    final double[] logDegeneracyErrorTerms;
    final double groundEnergy;
    final double groundEnergyError;
    final int topIndex;
    /** ln of the summed degeneracy of every level at exactly the lowest energy (the T = 0 limit of S/k). */
    final double logGroundDegeneracy;
    final double logGroundDegeneracyError;

    PreparedLevels(LevelSet levels) {
        double u = UNIT_ROUNDOFF;
        size = levels.size();
        int lowest = 0;
        int highest = 0;
        for (int i = 1; i < size; i++) {
            if (levels.energyKelvin(i) < levels.energyKelvin(lowest)) {
                lowest = i;
            }
            if (levels.energyKelvin(i) > levels.energyKelvin(highest)) {
                highest = i;
            }
        }
        topIndex = highest;
        groundEnergy = levels.energyKelvin(lowest);
        double relative = levels.energyRelativeError();
        groundEnergyError = relative * Math.abs(groundEnergy);
        double logErrorFactor = levels.logDegeneraciesExact() ? u : 3 * u;
        shiftedEnergies = new double[size];
        logDegeneracies = new double[size];
        energyErrorTerms = new double[size];
        logDegeneracyErrorTerms = new double[size];
        double groundMax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < size; i++) {
            double e = levels.energyKelvin(i);
            double shifted = e - groundEnergy;
            shiftedEnergies[i] = shifted;
            logDegeneracies[i] = levels.logDegeneracy(i);
            energyErrorTerms[i] = 4 * u * shifted + relative * (Math.abs(e) + Math.abs(groundEnergy));
            logDegeneracyErrorTerms[i] = logErrorFactor * Math.abs(logDegeneracies[i]);
            if (shifted == 0) {
                groundMax = Math.max(groundMax, logDegeneracies[i]);
            }
        }
        // ln sum_{dE_i = 0} g_i by log-sum-exp about the largest ground-level ln g.
        double rest = 0;
        double errorWeighted = 0;
        int terms = 0;
        for (int i = 0; i < size; i++) {
            if (shiftedEnergies[i] == 0) {
                double w = Math.exp(logDegeneracies[i] - groundMax);
                rest += w;
                errorWeighted += w * (logDegeneracyErrorTerms[i] + logErrorFactor * Math.abs(groundMax));
                terms++;
            }
        }
        logGroundDegeneracy = groundMax + Math.log(rest);
        logGroundDegeneracyError = 2 * (errorWeighted / rest + (terms + 3) * u
                + 2 * u * Math.abs(logGroundDegeneracy));
    }
}
