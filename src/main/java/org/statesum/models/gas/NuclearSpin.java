package org.statesum.models.gas;

/**
 * Nuclear-spin statistics of a homonuclear linear molecule with two nuclei of spin I. Of the (2I + 1)^2
 * nuclear spin states, (I + 1)(2I + 1) are symmetric and I (2I + 1) antisymmetric under exchange. For a
 * Sigma_g^+ electronic state, even J goes with symmetric spin functions for bosons (integer I) and with
 * antisymmetric ones for fermions (half-integer I); a Sigma_g^- state (as in O2) swaps the parities.
 * Weights are divided by (2I + 1)^2 so that at high T the sum tends to T / (2 theta), the convention of
 * the thermochemical tables (nuclear-spin entropy left out). H2 (I = 1/2): even 1/4, odd 3/4.
 *
 * <p>The modification: {@code EQUILIBRIUM} interconverts (one sum over all J); {@code FROZEN} is a
 * mixture of the even-J and odd-J species at a fixed odd-J fraction x, with ideal mixing:
 * ln Z = sum_s x_s (ln Z_s - ln x_s), U, C_V the x-weighted means. The "normal" mixture is frozen at
 * the high-temperature ratio x = w_odd / (w_even + w_odd) (3/4 for H2).
 * Reference: D. A. McQuarrie, Statistical Mechanics (1976), section 6-5.
 *
 * @param spin I, a non-negative multiple of 1/2
 * @param antisymmetricElectronicState whether the electronic state is Sigma_g^- (swaps parities)
 * @param equilibrium whether the modifications interconvert
 * @param oddFraction x, the odd-J fraction of a frozen mixture, in [0, 1] (ignored at equilibrium)
 */
public record NuclearSpin(double spin, boolean antisymmetricElectronicState, boolean equilibrium,
        double oddFraction) {

    /** Weight of even J, divided by (2I + 1)^2. */
    public double evenWeight() {
        return bosonLike() ? symmetric() : antisymmetric();
    }

    /** Weight of odd J, divided by (2I + 1)^2. */
    public double oddWeight() {
        return bosonLike() ? antisymmetric() : symmetric();
    }

    /** The odd-J fraction of the normal (high-temperature) mixture. */
    public double normalOddFraction() {
        return oddWeight() / (evenWeight() + oddWeight());
    }

    private boolean bosonLike() {
        boolean boson = Math.rint(2 * spin) % 2 == 0;
        return boson != antisymmetricElectronicState;
    }

    private double symmetric() {
        return (spin + 1) / (2 * spin + 1);
    }

    private double antisymmetric() {
        return spin / (2 * spin + 1);
    }
}
