package org.statesum.engine;

/**
 * A level set rearranged for repeated evaluation: the energies as given, the same energies shifted to
 * the lowest level (dE_i = E_i - E_0 >= 0, used only to pick the dominant level), and per level the
 * bounds on the input errors used by the error analysis of {@link CanonicalKernel}.
 *
 * <p>Input errors, relative to the exact values the caller meant (zero when the inputs are exact):
 * <ul>
 *   <li>{@code energyErrorTerms[i]} = rho |E_i| (kelvin), rho being the declared relative error of
 *       the energies ({@link LevelSet#withEnergyRelativeError}, e.g. from a unit conversion);</li>
 *   <li>{@code logDegeneracyErrorTerms[i]} = 2 u |ln g_i| when ln g_i was formed here by Math.log
 *       (specified to within 1 ulp, and ulp(x) <= 2 u |x|), 0 when ln g_i was given.</li>
 * </ul>
 * u = 2^-53 is the unit roundoff of binary64.
 */
final class PreparedLevels {

    static final double UNIT_ROUNDOFF = 0x1.0p-53;

    final int size;
    final double[] energies;
    final double[] shiftedEnergies;
    final double[] logDegeneracies;
    final double[] energyErrorTerms;
    /** Whether any energy carries an input error (rho > 0); when not, every energyErrorTerms[i] is 0. */
    final boolean energiesInexact;
    final double[] logDegeneracyErrorTerms;
    final double groundEnergy;
    final double groundEnergyError;
    final int topIndex;
    /** ln of the summed degeneracy of every level at exactly the lowest energy (the T = 0 limit of S/k). */
    final double logGroundDegeneracy;
    final double logGroundDegeneracyError;
    /** Smallest and log-sum-exp of the ln g_i, and the largest input error of any ln g_i: S / k_B lies between. */
    final double minLogDegeneracy;
    final double logTotalDegeneracy;
    final double maxLogDegeneracyError;

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
        energiesInexact = relative != 0;
        double logErrorFactor = levels.logDegeneraciesExact() ? 0 : 2 * u;
        energies = new double[size];
        shiftedEnergies = new double[size];
        logDegeneracies = new double[size];
        energyErrorTerms = new double[size];
        logDegeneracyErrorTerms = new double[size];
        double groundMax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < size; i++) {
            double e = levels.energyKelvin(i);
            energies[i] = e;
            shiftedEnergies[i] = e - groundEnergy;
            logDegeneracies[i] = levels.logDegeneracy(i);
            energyErrorTerms[i] = relative * Math.abs(e);
            logDegeneracyErrorTerms[i] = logErrorFactor * Math.abs(logDegeneracies[i]);
            if (e == groundEnergy) {
                groundMax = Math.max(groundMax, logDegeneracies[i]);
            }
        }
        // ln sum_{E_i = E_0} g_i by log-sum-exp about the largest ground-level ln g. Each term
        // exp(ln g_i - groundMax) carries the input error of both logarithms, |ln g_i - groundMax| u
        // from the subtraction and 2 u from exp; the sum of k terms adds k u; ln adds 2 u |result|
        // and the final addition u |result|.
        double rest = 0;
        double errorWeighted = 0;
        int terms = 0;
        double groundMaxError = logErrorFactor * Math.abs(groundMax);
        for (int i = 0; i < size; i++) {
            if (energies[i] == groundEnergy) {
                double z = logDegeneracies[i] - groundMax;
                double w = Math.exp(z);
                rest += w;
                errorWeighted += w * (logDegeneracyErrorTerms[i] + groundMaxError + u * Math.abs(z) + 2 * u);
                terms++;
            }
        }
        double lnRest = Math.log(rest);
        double minLog = Double.POSITIVE_INFINITY;
        double maxLog = Double.NEGATIVE_INFINITY;
        double worst = 0;
        for (int i = 0; i < size; i++) {
            minLog = Math.min(minLog, logDegeneracies[i]);
            maxLog = Math.max(maxLog, logDegeneracies[i]);
            worst = Math.max(worst, logDegeneracyErrorTerms[i]);
        }
        double total = 0;
        for (int i = 0; i < size; i++) {
            total += Math.exp(logDegeneracies[i] - maxLog);
        }
        minLogDegeneracy = minLog;
        logTotalDegeneracy = maxLog + Math.log(total);
        maxLogDegeneracyError = worst;
        logGroundDegeneracy = groundMax + lnRest;
        logGroundDegeneracyError = 1.0625 * (errorWeighted / rest + (terms + 1) * u + 2 * u * Math.abs(lnRest)
                + u * Math.abs(logGroundDegeneracy));
    }
}
