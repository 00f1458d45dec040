package org.statesum.models;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.engine.CanonicalTable;
import org.statesum.engine.DomainException;
import org.statesum.engine.LevelSet;
import org.statesum.engine.ParticleStatistics;
import org.statesum.engine.QuantumCanonical;
import org.statesum.engine.Series;
import org.statesum.units.PhysicalConstants;

/**
 * A level set holding N identical bosons or fermions, counted exactly ({@link QuantumCanonical}): ln Z,
 * F, U, S, C_V and the chemical potential mu = F_N - F_{N-1} on the temperature grid, in SI per entity of
 * the basis (the N-particle system, or per particle), mu per particle in either.
 */
public final class QuantumLevelSetModel {

    /** Largest N counted exactly: the work per temperature grows as N times the states (see the budget). */
    public static final int MAX_PARTICLES = 1_000_000;
    /**
     * Most numbers the fermion populations may hold at once: (levels + 1) x (N + 1) prefix coefficients and
     * their bounds, 4e6 of each (64 MB).
     */
    public static final double MAX_POPULATION_WORKSPACE = 4e6;

    private QuantumLevelSetModel() {
    }

    /**
     * @param levels energies and integer degeneracies (given as degeneracies, not logarithms)
     * @throws DomainException when the degeneracies came as logarithms or N is out of range
     */
    public static ThermoResult evaluate(LevelSet levels, double[] temperaturesKelvin, Particles particles,
            boolean withPopulations) {
        double[] g = levels.degeneracies();
        if (g == null) {
            throw new DomainException("DEGENERACY_NOT_INTEGRAL", "/levels/logDegeneracies", "exact quantum "
                    + "statistics counts single-particle states: give integer 'degeneracies', not logarithms");
        }
        if (!(particles.count() <= MAX_PARTICLES)) {
            throw new DomainException("PARTICLE_COUNT_INVALID", "/particles/count", "exact quantum statistics "
                    + "takes at most " + MAX_PARTICLES + " particles; beyond, the Boltzmann limit or a grand-canonical "
                    + "treatment applies");
        }
        int n = (int) particles.count();
        QuantumCanonical.Kind kind = particles.statistics() == ParticleStatistics.FERMI_DIRAC
                ? QuantumCanonical.Kind.FERMIONS : QuantumCanonical.Kind.BOSONS;
        QuantumCanonical system = QuantumCanonical.of(levels.energiesKelvin(), g, n, kind, levels.energyRelativeError());
        int size = temperaturesKelvin.length;
        double[][] cols = new double[12][size];
        for (int j = 0; j < size; j++) {
            QuantumCanonical.Point p = system.at(temperaturesKelvin[j]);
            double[] row = {p.logZ(), p.logZBound(), p.helmholtz(), p.helmholtzBound(), p.energy(), p.energyBound(),
                p.entropy(), p.entropyBound(), p.heatCapacity(), p.heatCapacityBound(), p.chemicalPotential(),
                p.chemicalPotentialBound()};
            for (int q = 0; q < 12; q++) {
                cols[q][j] = row[q];
            }
        }
        double per = particles.perParticle() ? 1.0 / n : 1.0;
        CanonicalTable table = new CanonicalTable(temperaturesKelvin.clone(), scaled(cols[0], cols[1], per),
                scaled(cols[2], cols[3], per), scaled(cols[4], cols[5], per), scaled(cols[6], cols[7], per),
                scaled(cols[8], cols[9], per), null, null, null, null);
        Map<Quantity, Series> si = LevelSetModel.toSi(table);
        si.put(Quantity.CHEMICAL_POTENTIAL, new Series(cols[10], cols[11]).scaled(PhysicalConstants.BOLTZMANN_J_PER_K));
        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "exact canonical Z_N: the generating function prod (1 + x t)^g (fermions) or "
                + "prod (1 - x t)^-g (bosons) expanded level by level, every coefficient a sum of positive terms "
                + "kept as its logarithm; energy mean and variance merged about their means");
        precision.put("errorAnalysis", "first-order running error bound per coefficient, doubled");
        precision.put("levels", levels.size());
        precision.put("particles", n);
        precision.put("workPerTemperature", QuantumCanonical.cost(g, n));
        List<org.statesum.engine.Warning> warnings = new java.util.ArrayList<>();
        double[] undefined = java.util.stream.IntStream.range(0, size).filter(j -> Double.isNaN(cols[0][j]))
                .mapToDouble(j -> temperaturesKelvin[j]).toArray();
        if (undefined.length > 0) {
            warnings.add(new org.statesum.engine.Warning("LOG_PARTITION_FUNCTION_UNDEFINED", "at T = 0 ln Z "
                    + "diverges unless the ground configuration has zero energy; reported as null (F, U, S, C_V and "
                    + "the chemical potential keep their limits)", undefined));
        }
        ThermoResult.Populations populations = null;
        if (withPopulations) {
            double[][] values = new double[size][];
            double[][] bounds = new double[size][];
            for (int j = 0; j < size; j++) {
                double[][] p = system.populations(temperaturesKelvin[j]);
                values[j] = p[0];
                bounds[j] = p[1];
            }
            populations = new ThermoResult.Populations(values, bounds);
        }
        return new ThermoResult(table.temperaturesKelvin(), si, precision, warnings, populations);
    }

    private static Series scaled(double[] values, double[] bounds, double factor) {
        Series s = new Series(values, bounds);
        return factor == 1.0 ? s : s.scaled(factor);
    }
}
