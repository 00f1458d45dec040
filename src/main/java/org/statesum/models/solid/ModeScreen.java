package org.statesum.models.solid;

/**
 * What was left out of a phonon set: weighted counts of near-zero acoustic modes and of small imaginary
 * modes below the tolerance (per formula unit), and the tolerance itself as h nu / k_B (K).
 */
public record ModeScreen(double nearZeroModes, double smallImaginaryModes, double toleranceKelvin) {

    public static ModeScreen none() {
        return new ModeScreen(0, 0, 0);
    }

    public ModeScreen plus(ModeScreen other) {
        return new ModeScreen(nearZeroModes + other.nearZeroModes, smallImaginaryModes + other.smallImaginaryModes,
                Math.max(toleranceKelvin, other.toleranceKelvin));
    }
}
