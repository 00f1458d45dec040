package org.statesum.models.solid;

import org.statesum.units.PhysicalConstants;

/**
 * F, S and C_V with their bounds at every sampled volume for one temperature, in the quasi-harmonic
 * loop's working units (E / k_B in K, volumes in cubic angstrom). Reused across temperatures; not
 * thread-safe.
 */
final class Sampler {

    private static final double U = 0x1.0p-53;

    final double[] v;
    final double[] f;
    final double[] fb;
    final double[] s;
    final double[] sb;
    final double[] c;
    final double[] cb;
    private final double[] e0;
    private final double[] e0b;
    private final Vibrations[] vibrations;
    private double[][][] table;

    Sampler(QuasiHarmonicCrystal crystal) {
        int n = crystal.volumesCubicMetre().length;
        v = new double[n];
        f = new double[n];
        fb = new double[n];
        s = new double[n];
        sb = new double[n];
        c = new double[n];
        cb = new double[n];
        e0 = new double[n];
        e0b = new double[n];
        vibrations = crystal.vibrations();
        for (int i = 0; i < n; i++) {
            v[i] = crystal.volumesCubicMetre()[i] / 1e-30;
            e0[i] = crystal.staticEnergiesJoule()[i] / PhysicalConstants.BOLTZMANN_J_PER_K;
            e0b[i] = Math.abs(e0[i]) * (crystal.staticEnergyRelativeError() + 2 * U);
        }
    }

    /**
     * Evaluates the vibrations at every (volume, temperature) up front: temperatures are independent, so a
     * large grid goes over the cores (bit-identical to a serial run); {@link #select} then picks one.
     */
    void sampleAll(double[] temperaturesKelvin) {
        int nt = temperaturesKelvin.length;
        table = new double[nt][][];
        long terms = (long) nt * modes();
        java.util.stream.IntStream range = java.util.stream.IntStream.range(0, nt);
        if (terms >= org.statesum.engine.HarmonicModes.PARALLEL_TERMS) {
            range = range.parallel();
        }
        range.forEach(j -> {
            double[] o = new double[8];
            double[][] row = new double[v.length][];
            for (int i = 0; i < v.length; i++) {
                vibrations[i].evaluateAt(temperaturesKelvin[j], o);
                row[i] = o.clone();
            }
            table[j] = row;
        });
    }

    /** Makes temperature {@code j} of {@link #sampleAll} current. */
    void select(int j) {
        for (int i = 0; i < v.length; i++) {
            double[] o = table[j][i];
            f[i] = e0[i] + o[0];
            fb[i] = e0b[i] + o[4] + U * Math.abs(f[i]);
            s[i] = o[2];
            sb[i] = o[6];
            c[i] = o[3];
            cb[i] = o[7];
        }
    }

    /** max F - min F over the samples, K. */
    double span() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double x : f) {
            lo = Math.min(lo, x);
            hi = Math.max(hi, x);
        }
        return hi - lo;
    }

    double minVolume() {
        double m = Double.POSITIVE_INFINITY;
        for (double x : v) {
            m = Math.min(m, x);
        }
        return m;
    }

    double maxVolume() {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m;
    }

    int modes() {
        int m = 0;
        for (Vibrations vib : vibrations) {
            m += vib.modeCount();
        }
        return m;
    }
}
