/**
 * Pure numerics on plain arrays and records: log-sum-exp partition sums, moments about the mean,
 * composite N-particle partition functions and running error bounds. No HTTP, no JSON, no units
 * beyond the reduced ones named in each signature (energies as E / k_B in kelvin, entropies in k_B).
 *
 * <p>References: N. J. Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed. (SIAM, 2002),
 * chapters 3 (rounding error analysis) and 4 (summation); the log-sum-exp shift as in P. Blanchard,
 * D. J. Higham, N. J. Higham, "Accurately computing the log-sum-exp and softmax functions", IMA J.
 * Numer. Anal. 41 (2021) 2311; two-pass variance as in T. F. Chan, G. H. Golub, R. J. LeVeque,
 * "Algorithms for computing the sample variance", Am. Stat. 37 (1983) 242. Rotor level sums are cut
 * where the integral test (the tail of a decreasing series is below the integral from the last kept
 * term) bounds the rest; sign changes are located by R. P. Brent, Algorithms for Minimization without
 * Derivatives (Prentice-Hall, 1973), ch. 4, as implemented by commons-math3.
 */
package org.statesum.engine;
