package org.statesum.models.gas;

import org.statesum.units.PhysicalConstants;

/**
 * Harmonic vibrations (with the low-frequency treatment of {@link LowFrequency}), mode i with
 * theta_i = h c nu_i / k_B and x = theta_i / T:
 * U_i / k_B = theta_i / 2 + theta_i / (e^x - 1), S_i / k_B = x / (e^x - 1) - ln(1 - e^-x),
 * C_V,i / k_B = (x / (2 sinh(x / 2)))^2 (McQuarrie, Statistical Mechanics, 1976, ch. 8), with expm1
 * and log1p so that neither very low nor very high x loses digits. Energies include the zero-point
 * energy sum theta_i / 2.
 *
 * <p>Accuracy: each term to (10 + 3 (x + 1)) u relative (u = 2^-53), the 3 (x + 1) covering the
 * relative rounding of theta and of x, amplified by x in e^-x; the sum adds n u times the sum of |terms|.
 */
public final class Vibrations {

    /** h c / k_B in K cm (the second radiation constant c_2 = 1.438776877 cm K, exact in the 2019 SI). */
    public static final double KELVIN_PER_WAVENUMBER = PhysicalConstants.PLANCK_J_S
            * PhysicalConstants.SPEED_OF_LIGHT_M_PER_S * 100 / PhysicalConstants.BOLTZMANN_J_PER_K;

    private final double[] wavenumbers;
    private final LowFrequency lowFrequency;
    private final int raised;

    private Vibrations(double[] wavenumbers, LowFrequency lowFrequency, int raised) {
        this.wavenumbers = wavenumbers;
        this.lowFrequency = lowFrequency;
        this.raised = raised;
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
        double sum = 0;
        for (double nu : wavenumbers) {
            sum += 0.5 * nu * KELVIN_PER_WAVENUMBER;
        }
        return new double[] {sum, (wavenumbers.length + 3) * GasPart.U * sum};
    }

    /** The part at every temperature (each T > 0). */
    public GasPart evaluate(double[] temperaturesKelvin) {
        GasPart part = GasPart.zero(temperaturesKelvin.length);
        for (int j = 0; j < temperaturesKelvin.length; j++) {
            evaluateAt(temperaturesKelvin[j], j, part);
        }
        return part;
    }

    private void evaluateAt(double t, int j, GasPart part) {
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
        for (double nu : wavenumbers) {
            double theta = nu * KELVIN_PER_WAVENUMBER;
            double x = theta / t;
            double rel = (10 + 3 * (x + 1)) * u;
            double em = Math.expm1(x);
            double thermal = theta / em;
            double energy = theta / 2 + thermal;
            double logTerm = logOneMinusExpMinus(x);
            double entropy = x / em - logTerm;
            double half = x / (2 * Math.sinh(x / 2));
            double heat = half * half;
            // theta / 2 carries only the rounding of theta; the thermal part the x-amplified one.
            double eBound = 4 * u * theta / 2 + rel * thermal + 2 * u * energy;
            // ln(1 - e^-x) to 2 u + u |ln| absolute for x < ln 2 (a relative error d of x moves it by
            // x d / (e^x - 1) <= d), and to (x + 2) u |e^-x| times 2 above: covered by rel |ln| (plus 8 u below ln 2).
            double sBound = rel * (x / em + Math.abs(logTerm)) + (x < LN2 ? 8 * u : 0);
            double cBound = rel * heat;
            boolean interpolate = lowFrequency.freeRotorEntropy() || lowFrequency.freeRotorEnergy();
            double w = interpolate ? lowFrequency.weight(nu) : 1;
            if (lowFrequency.freeRotorEntropy()) {
                double[] free = freeRotorEntropy(nu, t);
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
        part.internalEnergyKelvin().values()[j] = sumU;
        part.internalEnergyKelvin().errorBounds()[j] = bU + n * u * absU;
        part.entropy().values()[j] = sumS;
        part.entropy().errorBounds()[j] = bS + n * u * absS;
        part.heatCapacity().values()[j] = sumC;
        part.heatCapacity().errorBounds()[j] = bC + n * u * absC;
    }

    /**
     * ln(1 - e^-x) for x > 0 without cancellation: ln(-expm1(-x)) for x < ln 2, log1p(-e^-x) above
     * (M. Maechler, "Accurately computing log(1 - exp(-|a|))", R package Rmpfr vignette, 2012).
     */
    static double logOneMinusExpMinus(double x) {
        return x < LN2 ? Math.log(-Math.expm1(-x)) : Math.log1p(-Math.exp(-x));
    }

    private static final double LN2 = Math.log(2);

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
