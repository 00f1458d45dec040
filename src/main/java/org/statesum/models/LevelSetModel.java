package org.statesum.models;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.engine.CanonicalEnsemble;
import org.statesum.engine.CanonicalTable;
import org.statesum.engine.CompositeSystem;
import org.statesum.engine.LevelSet;
import org.statesum.engine.ParticleStatistics;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;
import org.statesum.units.PhysicalConstants;

/**
 * A discrete level set (energies in J per particle, degeneracies) as N non-interacting particles in
 * the canonical ensemble: F = -k_B T ln Z_N, with Z_N from {@link CompositeSystem}.
 *
 * <p>Warnings: {@code LEVEL_SET_TRUNCATED} where the highest level holds more than
 * {@link #TRUNCATION_POPULATION} of the particles (the set probably stops short of levels that
 * matter), and {@code NOT_DILUTE} for indistinguishable particles where N / Z' exceeds
 * {@link #DILUTE_OCCUPANCY}, Z' being the number of thermally reachable states counted from the lowest
 * level: Boltzmann counting Z_1^N / N! then misses corrections of order N / Z'.
 */
public final class LevelSetModel {

    /** Population of the top level above which the set looks truncated (its neglect costs ~1e-3 of U). */
    public static final double TRUNCATION_POPULATION = 1e-3;
    /** Mean occupancy per reachable state above which the dilute (Boltzmann-counting) limit fails. */
    public static final double DILUTE_OCCUPANCY = 0.01;

    private LevelSetModel() {
    }

    /**
     * Evaluates the level set.
     *
     * @param levels the levels, energies already in J per particle / k_B (see {@link #toKelvin})
     * @param temperaturesKelvin the grid, K
     * @param particles count, statistics and basis
     * @param withPopulations whether to report level populations
     */
    public static ThermoResult evaluate(LevelSet levels, double[] temperaturesKelvin, Particles particles,
            boolean withPopulations) {
        if (particles.statistics().quantum()) {
            return QuantumLevelSetModel.evaluate(levels, temperaturesKelvin, particles, withPopulations);
        }
        CanonicalTable one = CanonicalEnsemble.evaluate(levels, temperaturesKelvin, withPopulations);
        CanonicalTable table = CompositeSystem.of(one, particles.count(), particles.statistics(),
                particles.perParticle());
        List<Warning> warnings = new ArrayList<>();
        truncationWarning(one).ifPresent(warnings::add);
        if (particles.statistics() == ParticleStatistics.INDISTINGUISHABLE && particles.count() > 1) {
            diluteWarning(one, particles.count()).ifPresent(warnings::add);
        }
        undefinedLogZ(table).ifPresent(warnings::add);
        if (particles.statistics() == ParticleStatistics.INDISTINGUISHABLE) {
            refuseNegativeEntropy(table);
        }
        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "log-sum-exp about the dominant level; moments about the mean (two-pass); "
                + "ln Z assembled in double-double");
        precision.put("errorAnalysis", "running error bound per term (input, rounding and underflow errors), "
                + "capped by always-valid interval bounds");
        precision.put("levels", levels.size());
        precision.put("termsKept", levels.size());
        precision.put("truncationBound", 0.0);
        precision.put("logFactorial", particles.statistics() == ParticleStatistics.INDISTINGUISHABLE
                ? "lnGamma(N + 1), Lanczos (commons-math3)" : "not used");
        return new ThermoResult(table.temperaturesKelvin(), toSi(table), precision, warnings,
                withPopulations ? new ThermoResult.Populations(one.populations(), one.populationBounds()) : null);
    }

    /** Converts energies in J per particle to E / k_B in kelvin (one rounding each). */
    public static double[] toKelvin(double[] energiesJoule) {
        double[] kelvin = new double[energiesJoule.length];
        for (int i = 0; i < kelvin.length; i++) {
            kelvin[i] = energiesJoule[i] / PhysicalConstants.BOLTZMANN_J_PER_K;
        }
        return kelvin;
    }

    public static Map<Quantity, Series> toSi(CanonicalTable table) {
        double k = PhysicalConstants.BOLTZMANN_J_PER_K;
        Map<Quantity, Series> series = new LinkedHashMap<>();
        series.put(Quantity.LOG_PARTITION_FUNCTION, table.logPartitionFunction());
        series.put(Quantity.HELMHOLTZ_ENERGY, table.helmholtzEnergyKelvin().scaled(k));
        series.put(Quantity.INTERNAL_ENERGY, table.internalEnergyKelvin().scaled(k));
        series.put(Quantity.ENTROPY, table.entropyOverBoltzmann().scaled(k));
        series.put(Quantity.ISOCHORIC_HEAT_CAPACITY, table.heatCapacityOverBoltzmann().scaled(k));
        return series;
    }

    /**
     * Boltzmann counting Z_1^N / N! gives S &lt; 0 where it does not hold (N comparable to or above the
     * states within reach): such an answer is refused, naming the exact statistics as the way out.
     */
    private static void refuseNegativeEntropy(CanonicalTable table) {
        double[] t = table.temperaturesKelvin();
        double[] s = table.entropyOverBoltzmann().values();
        double[] b = table.entropyOverBoltzmann().errorBounds();
        double[] hits = filter(t, j -> s[j] + b[j] < 0);
        if (hits.length > 0) {
            throw new org.statesum.engine.DomainException("BOLTZMANN_COUNTING_INVALID", "/particles/statistics",
                    "Boltzmann counting (Z_1^N / N!) gives a negative entropy at T = " + java.util.Arrays.toString(hits)
                            + " K: the particles are far from the dilute limit; count them exactly with "
                            + "\"bose-einstein\" or \"fermi-dirac\" (integer degeneracies, N up to "
                            + QuantumLevelSetModel.MAX_PARTICLES + ")");
        }
    }

    private static java.util.Optional<Warning> truncationWarning(CanonicalTable one) {
        double[] t = one.temperaturesKelvin();
        double[] top = one.topLevelPopulation();
        double[] hits = filter(t, j -> top[j] > TRUNCATION_POPULATION && t[j] > 0);
        if (hits.length == 0) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new Warning("LEVEL_SET_TRUNCATED",
                "the highest level holds more than " + TRUNCATION_POPULATION + " of the population: if the "
                        + "real spectrum continues above it, the results miss those levels", hits));
    }

    private static java.util.Optional<Warning> diluteWarning(CanonicalTable one, double count) {
        double[] t = one.temperaturesKelvin();
        double[] logRel = one.logRelativePartitionFunction();
        double logThreshold = Math.log(count / DILUTE_OCCUPANCY);
        double[] hits = filter(t, j -> logRel[j] < logThreshold);
        if (hits.length == 0) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new Warning("NOT_DILUTE",
                "indistinguishable particles outside the dilute limit: N exceeds " + DILUTE_OCCUPANCY
                        + " of the thermally reachable states, so Z_1^N / N! is not accurate", hits));
    }

    private static java.util.Optional<Warning> undefinedLogZ(CanonicalTable table) {
        double[] t = table.temperaturesKelvin();
        double[] lnZ = table.logPartitionFunction().values();
        double[] hits = filter(t, j -> Double.isNaN(lnZ[j]));
        if (hits.length == 0) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new Warning("LOG_PARTITION_FUNCTION_UNDEFINED",
                "at T = 0 ln Z diverges unless the lowest level is at zero energy; reported as null "
                        + "(F, U, S and C_V keep their limits)", hits));
    }

    /** The temperatures where {@code keep} holds, in grid order (a loop: three per request, most find none). */
    private static double[] filter(double[] temperatures, java.util.function.IntPredicate keep) {
        double[] kept = new double[temperatures.length];
        int n = 0;
        for (int j = 0; j < temperatures.length; j++) {
            if (keep.test(j)) {
                kept[n++] = temperatures[j];
            }
        }
        return n == kept.length ? kept : java.util.Arrays.copyOf(kept, n);
    }
}
