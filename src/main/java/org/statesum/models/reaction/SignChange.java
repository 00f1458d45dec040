package org.statesum.models.reaction;

/**
 * A temperature where Delta_r G changes sign.
 *
 * @param temperatureKelvin the root found, K
 * @param solverToleranceKelvin the bracketing solver's bound on its distance from the root of the
 *        computed Delta_r G, K
 * @param errorBoundKelvin that tolerance plus the shift the numerical error of Delta_r G can cause,
 *        |error bound of Delta_r G| / |Delta_r S| at the root, K
 * @param rising whether Delta_r G goes from negative to positive as T rises
 * @param evaluations model evaluations spent
 */
public record SignChange(double temperatureKelvin, double solverToleranceKelvin, double errorBoundKelvin,
        boolean rising, int evaluations) {
}
