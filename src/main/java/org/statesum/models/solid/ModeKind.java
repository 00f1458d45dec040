package org.statesum.models.solid;

/**
 * How a phonon frequency is treated. Imaginary modes arrive as negative numbers (common practice in
 * lattice-dynamics output). With a tolerance tau &gt;= 0 in the same unit:
 * nu &gt; tau is kept; 0 &lt;= nu &lt;= tau is a (near-)zero acoustic mode, left out (it would give ln 0);
 * -tau &lt;= nu &lt; 0 is a small imaginary mode, usually numerical noise near Gamma, left out and reported;
 * nu &lt; -tau makes the structure dynamically unstable, and the harmonic free energy is undefined.
 */
public enum ModeKind {
    KEPT,
    NEAR_ZERO,
    SMALL_IMAGINARY,
    UNSTABLE;

    /** Classifies one frequency against the tolerance (same unit for both). */
    public static ModeKind of(double frequency, double tolerance) {
        if (frequency > tolerance) {
            return KEPT;
        }
        if (frequency >= 0) {
            return NEAR_ZERO;
        }
        return frequency >= -tolerance ? SMALL_IMAGINARY : UNSTABLE;
    }
}
