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
    private final double[] out = new double[8];

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

    void sample(double temperatureKelvin) {
        for (int i = 0; i < v.length; i++) {
            vibrations[i].evaluateAt(temperatureKelvin, out);
            f[i] = e0[i] + out[0];
            fb[i] = e0b[i] + out[4] + U * Math.abs(f[i]);
            s[i] = out[2];
            sb[i] = out[6];
            c[i] = out[3];
            cb[i] = out[7];
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
