package org.statesum.models.solid;

import java.util.ArrayList;
import java.util.List;
import org.statesum.engine.DomainException;
import org.statesum.engine.HarmonicModes;
import org.statesum.engine.LinearDensityOfStates;
import org.statesum.units.FrequencyUnit;

/**
 * Builds {@link Crystal}s from the quantities a client has: an Einstein or Debye temperature, an Einstein
 * frequency, phonon frequencies on a q-point mesh, or a phonon density of states. Frequencies go to
 * theta = h nu / k_B with a relative error of at most 3 u (the unit's factor, the product, the quotient).
 */
public final class Crystals {

    /**
     * Largest relative difference between int g d nu and 3 x atoms that "check" accepts: a grid that
     * resolves the spectrum integrates to that within 1e-3 (common practice: sampling noise of the DOS).
     */
    public static final double NORMALISATION_TOLERANCE = 1e-3;

    /**
     * Kept modes need h nu / k_B of at least this, K: below it a mode is thermally a zero mode (its ln(1 - e^-x)
     * would only add an arbitrary ln x), so it is left out with the near-zero ones.
     */
    public static final double MIN_MODE_KELVIN = 1e-6;

    private static final double CONVERSION_ERROR = 3 * 0x1.0p-53;

    private Crystals() {
    }

    /** Einstein crystal: 3 x atoms modes at theta_E (K). */
    public static Crystal einstein(double thetaKelvin, double thetaRelativeError, int atoms) {
        return new Crystal("einstein", new Vibrations.Modes(HarmonicModes.of(new double[] {thetaKelvin},
                new double[] {3.0 * atoms}, thetaRelativeError)), atoms, ModeScreen.none(), null);
    }

    /** Einstein crystal from its frequency. */
    public static Crystal einstein(double frequency, FrequencyUnit unit, int atoms) {
        return einstein(unit.toKelvin(frequency), CONVERSION_ERROR, atoms);
    }

    /** Debye crystal: every atom a Debye solid with theta_D (K). */
    public static Crystal debye(double thetaKelvin, int atoms) {
        return new Crystal("debye", new Vibrations.Debye(thetaKelvin, 0, atoms), atoms, ModeScreen.none(), null);
    }

    /**
     * Phonons on a q-point mesh: frequencies[q][b] with q-point weights (normalised here to sum 1), so
     * that every q-point carries one formula unit's 3 x atoms branches.
     *
     * @throws DomainException ("dynamically-unstable") if a mode is below -tolerance
     */
    public static Crystal phonons(double[][] frequencies, double[] qWeights, FrequencyUnit unit, double tolerance,
            int atoms) {
        double total = 0;
        for (double w : qWeights) {
            total += w;
        }
        List<double[]> kept = new ArrayList<>();
        double nearZero = 0;
        double imaginary = 0;
        for (int q = 0; q < frequencies.length; q++) {
            double w = qWeights[q] / total;
            for (int b = 0; b < frequencies[q].length; b++) {
                double nu = frequencies[q][b];
                switch (kind(nu, tolerance, unit)) {
                    case KEPT -> kept.add(new double[] {unit.toKelvin(nu), w});
                    case NEAR_ZERO -> nearZero += w;
                    case SMALL_IMAGINARY -> imaginary += w;
                    default -> throw new DomainException("dynamically-unstable", "/qPoints/" + q
                            + "/frequencies/" + b, "imaginary mode beyond the tolerance: dynamically unstable");
                }
            }
        }
        return new Crystal("phonons", new Vibrations.Modes(modes(kept)), atoms,
                new ModeScreen(nearZero, imaginary, unit.toKelvin(tolerance)), null);
    }

    /**
     * A density of states g(nu) on an increasing grid, read as piecewise linear and integrated exactly on
     * each segment ({@link LinearDensityOfStates}). Density at imaginary frequencies (given as negative
     * ones) is left out when it lies within the tolerance of 0, and makes the crystal dynamically
     * unstable beyond it; a segment that crosses 0 is split there.
     *
     * @param normalise rescale g so that int g = 3 x atoms; otherwise check it within
     *        {@link #NORMALISATION_TOLERANCE}
     * @throws DomainException ("density-not-normalised") when checking fails
     */
    public static Crystal densityOfStates(double[] grid, double[] density, FrequencyUnit unit, double tolerance,
            int atoms, boolean normalise) {
        int n = grid.length;
        double integral = 0;
        for (int i = 0; i + 1 < n; i++) {
            integral += 0.5 * (grid[i + 1] - grid[i]) * (density[i] + density[i + 1]);
        }
        double expected = 3.0 * atoms;
        if (!normalise && !(Math.abs(integral - expected) <= NORMALISATION_TOLERANCE * expected)) {
            throw new DomainException("density-not-normalised", "/density", "the density integrates to "
                    + integral + " modes per formula unit, not 3 x atoms = " + expected + " (within "
                    + NORMALISATION_TOLERANCE + " relative); set \"normalisation\": \"apply\" to rescale it");
        }
        if (!(integral > 0)) {
            throw new DomainException("density-not-normalised", "/density", "the density integrates to 0");
        }
        double factor = normalise ? expected / integral : 1.0;
        double kelvinPerUnit = unit.toKelvin(1.0);
        List<double[]> nodes = new ArrayList<>(); // (theta K, g per K) at nu >= 0
        double imaginary = 0;
        for (int i = 0; i < n; i++) {
            double nu = grid[i];
            double g = density[i] * factor;
            if (nu < -tolerance && g > 0 || i + 1 < n && nu < -tolerance && grid[i + 1] > -tolerance
                    && density[i + 1] > 0) {
                throw new DomainException("dynamically-unstable", "/frequencies",
                        "the density has weight at imaginary frequencies beyond the tolerance: dynamically unstable");
            }
            if (nu >= 0) {
                if (nodes.isEmpty() && i > 0 && nu > 0) {
                    // the segment from grid[i - 1] < 0 crosses 0: split it there
                    double g0 = density[i - 1] * factor + (g - density[i - 1] * factor) * (-grid[i - 1]) / (nu - grid[i - 1]);
                    imaginary += 0.5 * (-grid[i - 1]) * (density[i - 1] * factor + g0);
                    nodes.add(new double[] {0, g0 / kelvinPerUnit});
                }
                nodes.add(new double[] {unit.toKelvin(nu), g / kelvinPerUnit});
            } else if (i + 1 < n && grid[i + 1] <= 0) {
                imaginary += 0.5 * (grid[i + 1] - nu) * (g + density[i + 1] * factor);
            }
        }
        if (nodes.size() < 2) {
            throw new DomainException("dynamically-unstable", "/frequencies",
                    "the density has no weight at real frequencies");
        }
        double[] theta = new double[nodes.size()];
        double[] perKelvin = new double[nodes.size()];
        for (int i = 0; i < theta.length; i++) {
            theta[i] = nodes.get(i)[0];
            perKelvin[i] = nodes.get(i)[1];
        }
        return new Crystal("density-of-states",
                new Vibrations.Density(LinearDensityOfStates.of(theta, perKelvin, CONVERSION_ERROR)), atoms,
                new ModeScreen(0, imaginary, unit.toKelvin(tolerance)),
                new Crystal.Normalisation(integral, expected, factor, normalise));
    }

    private static ModeKind kind(double nu, double tolerance, FrequencyUnit unit) {
        ModeKind kind = ModeKind.of(nu, tolerance);
        return kind == ModeKind.KEPT && !(unit.toKelvin(nu) >= MIN_MODE_KELVIN) ? ModeKind.NEAR_ZERO : kind;
    }

    private static HarmonicModes modes(List<double[]> kept) {
        double[] theta = new double[kept.size()];
        double[] weight = new double[kept.size()];
        for (int i = 0; i < theta.length; i++) {
            theta[i] = kept.get(i)[0];
            weight[i] = kept.get(i)[1];
        }
        return HarmonicModes.of(theta, weight, CONVERSION_ERROR);
    }
}
