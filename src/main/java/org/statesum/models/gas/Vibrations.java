package org.statesum.models.gas;

import org.statesum.engine.HarmonicModes;
import org.statesum.units.PhysicalConstants;

/**
 * Harmonic vibrations (with the low-frequency treatment of {@link LowFrequency}), mode i with
 * theta_i = h c nu_i / k_B and x = theta_i / T:
 * U_i / k_B = theta_i / 2 + theta_i / (e^x - 1), S_i / k_B = x / (e^x - 1) - ln(1 - e^-x),
 * C_V,i / k_B = x^2 e^x / (e^x - 1)^2 (McQuarrie, Statistical Mechanics, 1976, ch. 8). Energies
 * include the zero-point energy sum theta_i / 2.
 *
 * <p>The oscillators themselves are {@link HarmonicModes}, the same code and error analysis as the
 * crystals' modes: all modes at once when nothing is interpolated; mode by mode when a low-frequency
 * interpolation weights each one differently, the mixing adding its own rounding to the bounds.
 */
public final class Vibrations {

    /** h c / k_B in K cm (the second radiation constant c_2 = 1.438776877 cm K, exact in the 2019 SI). */
    public static final double KELVIN_PER_WAVENUMBER = PhysicalConstants.PLANCK_J_S
            * PhysicalConstants.SPEED_OF_LIGHT_M_PER_S * 100 / PhysicalConstants.BOLTZMANN_J_PER_K;
    /** Relative error of theta = nu c_2: c_2 from three roundings, and the product one more. */
    private static final double THETA_RELATIVE_ERROR = 4 * GasPart.U;

    private final double[] wavenumbers;
    private final LowFrequency lowFrequency;
    private final int raised;
    /** Every mode with weight 1, for the plain harmonic case. */
    private final HarmonicModes all;
    /** Each mode on its own, for the interpolated case. */
    private final HarmonicModes[] single;

    private Vibrations(double[] wavenumbers, LowFrequency lowFrequency, int raised) {
        this.wavenumbers = wavenumbers;
        this.lowFrequency = lowFrequency;
        this.raised = raised;
        double[] theta = new double[wavenumbers.length];
        double[] ones = new double[wavenumbers.length];
        this.single = new HarmonicModes[wavenumbers.length];
        for (int i = 0; i < theta.length; i++) {
            theta[i] = wavenumbers[i] * KELVIN_PER_WAVENUMBER;
            ones[i] = 1;
            single[i] = HarmonicModes.of(new double[] {theta[i]}, new double[] {1}, THETA_RELATIVE_ERROR);
        }
        this.all = HarmonicModes.of(theta, ones, THETA_RELATIVE_ERROR);
    }

    /**
     * @param wavenumbers real positive wavenumbers, cm^-1, already scaled (may be empty)
     * @param lowFrequency the treatment of low modes
     */
    public static Vibrations of(double[] wavenumbers, LowFrequency lowFrequency) {
        double[] used = wavenumbers.clone();
        int raised = 0;
        for (int i = 0; i < used.length; i++) {
            if (used[i] < lowFrequency.floorWavenumber()) {
                used[i] = lowFrequency.floorWavenumber();
                raised++;
            }
        }
        return new Vibrations(used, lowFrequency, raised);
    }

    /** How many wavenumbers the floor raised. */
    public int raisedCount() {
        return raised;
    }

    public int modeCount() {
        return wavenumbers.length;
    }

    public LowFrequency lowFrequency() {
        return lowFrequency;
    }

    /** The harmonic zero-point energy sum theta_i / 2, K, with its bound. */
    public double[] zeroPointEnergyKelvin() {
        double[] out = new double[8];
        all.evaluateAt(0, out); // at T = 0, U is the zero-point energy and out[5] its bound
        return new double[] {out[1], out[5]};
    }

    /** The part at every temperature (each T > 0). */
    public GasPart evaluate(double[] temperaturesKelvin) {
        GasPart part = GasPart.zero(temperaturesKelvin.length);
        boolean interpolated = lowFrequency.freeRotorEntropy() || lowFrequency.freeRotorEnergy();
        double[] out = new double[8];
        for (int j = 0; j < temperaturesKelvin.length; j++) {
            if (interpolated) {
                evaluateInterpolated(temperaturesKelvin[j], j, part, out);
            } else {
                all.evaluateAt(temperaturesKelvin[j], out);
                set(part, j, out[1], out[5], out[2], out[6], out[3], out[7]);
            }
        }
        return part;
    }

    private static void set(GasPart part, int j, double u, double uBound, double s, double sBound, double c,
            double cBound) {
        part.internalEnergyKelvin().values()[j] = u;
        part.internalEnergyKelvin().errorBounds()[j] = uBound;
        part.entropy().values()[j] = s;
        part.entropy().errorBounds()[j] = sBound;
        part.heatCapacity().values()[j] = c;
        part.heatCapacity().errorBounds()[j] = cBound;
    }

    /** Mode by mode: the harmonic values, mixed with the free rotor's by the damping weight, then summed. */
    private void evaluateInterpolated(double t, int j, GasPart part, double[] out) {
        double u = GasPart.U;
        double sumU = 0;
        double sumS = 0;
        double sumC = 0;
        double absU = 0;
        double absS = 0;
        double absC = 0;
        double bU = 0;
        double bS = 0;
        double bC = 0;
        for (int i = 0; i < wavenumbers.length; i++) {
            single[i].evaluateAt(t, out);
            double energy = out[1];
            double entropy = out[2];
            double heat = out[3];
            double eBound = out[5];
            double sBound = out[6];
            double cBound = out[7];
            double w = lowFrequency.weight(wavenumbers[i]);
            if (lowFrequency.freeRotorEntropy()) {
                double[] free = freeRotorEntropy(wavenumbers[i], t);
                entropy = w * entropy + (1 - w) * free[0];
                sBound = w * sBound + (1 - w) * free[1] + 8 * u * (Math.abs(entropy) + Math.abs(free[0]));
            }
            if (lowFrequency.freeRotorEnergy()) {
                energy = w * energy + (1 - w) * t / 2;
                heat = w * heat + (1 - w) / 2;
                eBound = w * eBound + 8 * u * (energy + t);
                cBound = w * cBound + 8 * u * heat;
            }
            sumU += energy;
            sumS += entropy;
            sumC += heat;
            absU += Math.abs(energy);
            absS += Math.abs(entropy);
            absC += Math.abs(heat);
            bU += eBound;
            bS += sBound;
            bC += cBound;
        }
        int n = wavenumbers.length;
        set(part, j, sumU, bU + n * u * absU, sumS, bS + n * u * absS, sumC, bC + n * u * absC);
    }

    /** S_FR / k_B of Grimme's free rotor for wavenumber nu (cm^-1) at T, and its bound. */
    private double[] freeRotorEntropy(double nu, double t) {
        double h = PhysicalConstants.PLANCK_J_S;
        double k = PhysicalConstants.BOLTZMANN_J_PER_K;
        double frequencyHertz = nu * 100 * PhysicalConstants.SPEED_OF_LIGHT_M_PER_S;
        double mu = h / (8 * Math.PI * Math.PI * frequencyHertz);
        double b = lowFrequency.averageMomentKilogramSquareMetre();
        double reduced = mu * b / (mu + b);
        double logArgument = Math.log(8 * Math.PI * Math.PI * Math.PI * reduced * k * t / (h * h));
        double s = 0.5 + 0.5 * logArgument;
        return new double[] {s, 16 * GasPart.U * (Math.abs(s) + Math.abs(logArgument) + 1)};
    }
}
