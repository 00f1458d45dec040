package org.statesum.models.solid;

import java.util.ArrayList;
import java.util.List;
import org.statesum.engine.DomainException;
import org.statesum.engine.HarmonicModes;
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
                new double[] {3.0 * atoms}, thetaRelativeError), null), atoms, ModeScreen.none(), null);
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
        return new Crystal("phonons", new Vibrations.Modes(modes(kept), null), atoms,
                new ModeScreen(nearZero, imaginary, unit.toKelvin(tolerance)), null);
    }

    /**
     * A density of states g(nu) on an increasing grid, read as piecewise linear. The quadrature is the
     * trapezoidal rule on the grid refined by its midpoints, with the unrefined rule kept for the
     * Richardson error estimate (see {@link Vibrations.Modes}).
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
        List<double[]> fine = new ArrayList<>();
        List<double[]> coarse = new ArrayList<>();
        double[] left = new double[3];
        for (int i = 0; i < n; i++) {
            double hl = i > 0 ? grid[i] - grid[i - 1] : 0;
            double hr = i + 1 < n ? grid[i + 1] - grid[i] : 0;
            double g = density[i] * factor;
            add(grid[i], g * (hl + hr) / 4, unit, tolerance, fine, left);
            add(grid[i], g * (hl + hr) / 2, unit, tolerance, coarse, new double[3]);
            if (i + 1 < n) {
                add(0.5 * (grid[i] + grid[i + 1]), 0.5 * hr * 0.5 * (density[i] + density[i + 1]) * factor, unit,
                        tolerance, fine, left);
            }
        }
        if (left[2] > 0) {
            throw new DomainException("dynamically-unstable", "/frequencies",
                    "the density has weight at imaginary frequencies beyond the tolerance: dynamically unstable");
        }
        return new Crystal("density-of-states", new Vibrations.Modes(modes(fine), modes(coarse)), atoms,
                new ModeScreen(left[0], left[1], unit.toKelvin(tolerance)),
                new Crystal.Normalisation(integral, expected, factor, normalise));
    }

    private static void add(double nu, double weight, FrequencyUnit unit, double tolerance, List<double[]> into,
            double[] leftOut) {
        if (weight == 0) {
            return;
        }
        switch (kind(nu, tolerance, unit)) {
            case KEPT -> into.add(new double[] {unit.toKelvin(nu), weight});
            case NEAR_ZERO -> leftOut[0] += weight;
            case SMALL_IMAGINARY -> leftOut[1] += weight;
            default -> leftOut[2] += weight;
        }
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
