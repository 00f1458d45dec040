package org.statesum.engine;

import org.apache.commons.math3.special.Gamma;

/**
 * The N-particle (composite) partition function of non-interacting particles built from the
 * one-particle table: ln Z_N = N ln Z_1 for distinguishable particles, and ln Z_N = N ln Z_1 - ln N!
 * for indistinguishable ones (valid in the dilute limit Z_1 / N >> 1).
 *
 * <p>Then F_N = N F_1 + k_B T ln N!, S_N = N S_1 - k_B ln N!, U_N = N U_1, C_V,N = N C_V,1. The
 * per-particle basis divides every extensive quantity by N. ln N! = lnGamma(N + 1) (commons-math3
 * {@link Gamma#logGamma}, Lanczos approximation, a few ulps), exact in the sense that no Stirling
 * truncation is made, for any N up to {@link #MAX_PARTICLES}.
 */
public final class CompositeSystem {

    /** Largest particle count accepted (beyond a mole by seven orders of magnitude). */
    public static final double MAX_PARTICLES = 1e30;
    private static final double U = PreparedLevels.UNIT_ROUNDOFF;
    /** Relative error bound of Gamma.logGamma plus the rounding of N + 1 (d lnGamma / dx = psi(x)). */
    private static final double LOG_FACTORIAL_RELATIVE_ERROR = 8 * U;

    private CompositeSystem() {
    }

    /** ln N! for an integral N >= 1 (as a double), with lnGamma(N + 1). */
    public static double logFactorial(double n) {
        return n == 1 ? 0 : Gamma.logGamma(n + 1);
    }

    /** A bound on the absolute error of {@link #logFactorial}. */
    public static double logFactorialError(double n) {
        return n == 1 ? 0 : LOG_FACTORIAL_RELATIVE_ERROR * Math.abs(logFactorial(n)) + 4 * U;
    }

    /**
     * The N-particle table.
     *
     * @param one the one-particle table
     * @param count N, integral, 1 <= N <= 1e30
     * @param statistics particle counting
     * @param perParticle whether to divide every extensive quantity by N
     * @throws DomainException PARTICLE_COUNT_INVALID when N is not an integer in range
     */
    public static CanonicalTable of(CanonicalTable one, double count, ParticleStatistics statistics,
            boolean perParticle) {
        if (!(count >= 1 && count <= MAX_PARTICLES && Math.rint(count) == count)) {
            throw new DomainException("PARTICLE_COUNT_INVALID", "/particles/count",
                    "the particle count must be an integer from 1 to " + MAX_PARTICLES);
        }
        boolean indistinguishable = statistics == ParticleStatistics.INDISTINGUISHABLE;
        double lnFact = indistinguishable ? logFactorial(count) : 0;
        double lnFactErr = indistinguishable ? logFactorialError(count) : 0;
        double scale = perParticle ? 1 : count;
        // The ln N! term per unit of the chosen basis.
        double correction = perParticle ? lnFact / count : lnFact;
        double correctionErr = perParticle ? lnFactErr / count + U * correction : lnFactErr;
        double[] t = one.temperaturesKelvin();
        int size = t.length;
        double[] lnZ = new double[size];
        double[] lnZb = new double[size];
        double[] f = new double[size];
        double[] fb = new double[size];
        double[] s = new double[size];
        double[] sb = new double[size];
        for (int j = 0; j < size; j++) {
            double lz = one.logPartitionFunction().values()[j];
            double lzScaled = scale * lz;
            lnZ[j] = lzScaled - correction;
            lnZb[j] = scale * one.logPartitionFunction().errorBounds()[j] + correctionErr
                    + U * (Math.abs(lzScaled) + Math.abs(correction)) + U * Math.abs(lnZ[j]);
            double fScaled = scale * one.helmholtzEnergyKelvin().values()[j];
            double tCorr = t[j] * correction;
            f[j] = fScaled + tCorr;
            fb[j] = scale * one.helmholtzEnergyKelvin().errorBounds()[j] + t[j] * correctionErr
                    + 2 * U * (Math.abs(fScaled) + Math.abs(tCorr)) + U * Math.abs(f[j]);
            double sScaled = scale * one.entropyOverBoltzmann().values()[j];
            s[j] = sScaled - correction;
            sb[j] = scale * one.entropyOverBoltzmann().errorBounds()[j] + correctionErr
                    + U * (Math.abs(sScaled) + Math.abs(correction)) + U * Math.abs(s[j]);
        }
        return new CanonicalTable(t, new Series(lnZ, lnZb), new Series(f, fb),
                scaleSeries(one.internalEnergyKelvin(), scale), new Series(s, sb),
                scaleSeries(one.heatCapacityOverBoltzmann(), scale), one.logRelativePartitionFunction(),
                one.topLevelPopulation(), one.populations(), one.populationBounds());
    }

    private static Series scaleSeries(Series series, double scale) {
        return scale == 1 ? series : series.scaled(scale);
    }
}
