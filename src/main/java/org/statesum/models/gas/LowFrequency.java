package org.statesum.models.gas;

/**
 * How low-frequency vibrations are treated.
 * <ul>
 *   <li>{@code freeRotorEntropy} (Grimme 2012): S_i = w S_HO + (1 - w) S_FR with the damping
 *       w = 1 / (1 + (omega_0 / nu)^alpha) and the free-rotor entropy S_FR / k_B = 1/2 +
 *       ln sqrt(8 pi^3 mu' k_B T / h^2), mu = h / (8 pi^2 nu), mu' = mu B_av / (mu + B_av).</li>
 *   <li>{@code freeRotorEnergy} (Li, Gomes, Sharada, Bell, Head-Gordon 2015): U_i = w U_HO + (1 - w)
 *       k_B T / 2, U_HO including the zero-point energy, with the same damping.</li>
 *   <li>{@code floorWavenumber} (Ribeiro, Marenich, Cramer, Truhlar 2011): every wavenumber below it is
 *       raised to it before anything else (0: none).</li>
 * </ul>
 * The interpolations give S and U directly; they are not derivatives of one free energy, so
 * S = -dF/dT does not hold for them (F is defined as U - TS).
 *
 * @param freeRotorEntropy whether to interpolate the entropy
 * @param freeRotorEnergy whether to interpolate the energy
 * @param cutoffWavenumber omega_0, cm^-1, positive (published default 100)
 * @param alpha the damping exponent, positive (published default 4)
 * @param averageMomentKilogramSquareMetre B_av, kg m^2, positive (published default 1e-44)
 * @param floorWavenumber cm^-1, >= 0
 */
public record LowFrequency(boolean freeRotorEntropy, boolean freeRotorEnergy, double cutoffWavenumber,
        double alpha, double averageMomentKilogramSquareMetre, double floorWavenumber) {

    /** Grimme's published cut-off, cm^-1. */
    public static final double DEFAULT_CUTOFF = 100;
    /** Grimme's published damping exponent. */
    public static final double DEFAULT_ALPHA = 4;
    /** Grimme's published average moment of inertia, kg m^2. */
    public static final double DEFAULT_AVERAGE_MOMENT = 1e-44;

    /** Plain harmonic oscillators. */
    public static LowFrequency harmonic() {
        return new LowFrequency(false, false, DEFAULT_CUTOFF, DEFAULT_ALPHA, DEFAULT_AVERAGE_MOMENT, 0);
    }

    /** The damping weight of the harmonic term at wavenumber nu, cm^-1. */
    double weight(double wavenumber) {
        return 1 / (1 + Math.pow(cutoffWavenumber / wavenumber, alpha));
    }

    /** For the precision block. */
    public String describe() {
        if (!freeRotorEntropy && !freeRotorEnergy && floorWavenumber == 0) {
            return "harmonic";
        }
        StringBuilder s = new StringBuilder();
        if (floorWavenumber > 0) {
            s.append("wavenumbers below ").append(floorWavenumber).append(" cm-1 raised to it; ");
        }
        if (freeRotorEntropy) {
            s.append("entropy interpolated to a free rotor (Grimme 2012); ");
        }
        if (freeRotorEnergy) {
            s.append("energy interpolated to a free rotor (Li, Gomes, Sharada, Bell, Head-Gordon 2015); ");
        }
        if (freeRotorEntropy || freeRotorEnergy) {
            s.append("omega0 = ").append(cutoffWavenumber).append(" cm-1, alpha = ").append(alpha);
            if (freeRotorEntropy) {
                s.append(", Bav = ").append(averageMomentKilogramSquareMetre).append(" kg m^2");
            }
        } else {
            s.append("otherwise harmonic");
        }
        return s.toString();
    }
}
