package org.statesum.engine;

/**
 * A finite set of levels: energies E_i / k_B in kelvin and log-degeneracies ln g_i, with what is
 * known about their input rounding.
 *
 * <p>Energies are carried as E / k_B so that beta E_i = E_i / T needs one division. The
 * {@code energyRelativeError} bounds the relative rounding already present in each energy (for example
 * from a unit conversion); {@code logDegeneraciesExact} says whether ln g_i was given (exact input) or
 * computed here as Math.log(g_i) (within one ulp). Immutable; arrays are copied on the way in.
 */
public final class LevelSet {

    /** Largest |E / k_B| accepted, in kelvin: keeps (E / T)^2 and all moments finite for T >= 1e-12 K. */
    public static final double MAX_ABS_ENERGY_KELVIN = 1e60;
    /** Largest |ln g| accepted: beyond it ln g itself carries more than 1e-4 of rounding. */
    public static final double MAX_ABS_LOG_DEGENERACY = 1e12;

    private final double[] energiesKelvin;
    private final double[] logDegeneracies;
    private final boolean logDegeneraciesExact;
    private final double energyRelativeError;
    /** The degeneracies as given, or null when they came as logarithms. */
    private final double[] degeneracies;

    private LevelSet(double[] energiesKelvin, double[] logDegeneracies, boolean logDegeneraciesExact,
            double energyRelativeError, double[] degeneracies) {
        if (energiesKelvin.length == 0) {
            throw new DomainException("EMPTY_LEVEL_SET", "/levels/energies", "the level set is empty");
        }
        if (energiesKelvin.length != logDegeneracies.length) {
            throw new DomainException("LENGTH_MISMATCH", "/levels",
                    "energies and degeneracies differ in length");
        }
        for (int i = 0; i < energiesKelvin.length; i++) {
            if (!(Math.abs(energiesKelvin[i]) <= MAX_ABS_ENERGY_KELVIN)) {
                throw new DomainException("ENERGY_OUT_OF_RANGE", "/levels/energies/" + i,
                        "energy / k_B must be finite and at most " + MAX_ABS_ENERGY_KELVIN + " K in magnitude");
            }
            if (!(Math.abs(logDegeneracies[i]) <= MAX_ABS_LOG_DEGENERACY)) {
                throw new DomainException("DEGENERACY_OUT_OF_RANGE", "/levels/logDegeneracies/" + i,
                        "ln g must be finite and at most " + MAX_ABS_LOG_DEGENERACY + " in magnitude");
            }
        }
        this.energiesKelvin = energiesKelvin;
        this.logDegeneracies = logDegeneracies;
        this.logDegeneraciesExact = logDegeneraciesExact;
        this.energyRelativeError = energyRelativeError;
        this.degeneracies = degeneracies;
    }

    /** Levels with degeneracies g_i > 0 (finite reals); ln g_i is formed here. */
    public static LevelSet ofDegeneracies(double[] energiesKelvin, double[] degeneracies) {
        double[] logG = new double[degeneracies.length];
        for (int i = 0; i < degeneracies.length; i++) {
            if (!(degeneracies[i] > 0 && degeneracies[i] < Double.POSITIVE_INFINITY)) {
                throw new DomainException("DEGENERACY_NOT_POSITIVE", "/levels/degeneracies/" + i,
                        "a degeneracy must be a finite positive number");
            }
            logG[i] = Math.log(degeneracies[i]);
        }
        return new LevelSet(energiesKelvin.clone(), logG, false, 0.0, degeneracies.clone());
    }

    /** Levels with log-degeneracies ln g_i given directly (for densities of states beyond 1e308). */
    public static LevelSet ofLogDegeneracies(double[] energiesKelvin, double[] logDegeneracies) {
        return new LevelSet(energiesKelvin.clone(), logDegeneracies.clone(), true, 0.0, null);
    }

    /** A copy whose energies are declared to carry this relative rounding error (>= 0). */
    public LevelSet withEnergyRelativeError(double relativeError) {
        return new LevelSet(energiesKelvin, logDegeneracies, logDegeneraciesExact, relativeError, degeneracies);
    }

    public int size() {
        return energiesKelvin.length;
    }

    /** E_i / k_B, K (a copy). */
    public double[] energiesKelvin() {
        return energiesKelvin.clone();
    }

    /** The degeneracies as given (a copy), or null when they were given as logarithms. */
    public double[] degeneracies() {
        return degeneracies == null ? null : degeneracies.clone();
    }

    double energyKelvin(int i) {
        return energiesKelvin[i];
    }

    double logDegeneracy(int i) {
        return logDegeneracies[i];
    }

    boolean logDegeneraciesExact() {
        return logDegeneraciesExact;
    }

    public double energyRelativeError() {
        return energyRelativeError;
    }
}
