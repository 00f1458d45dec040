/**
 * Pure numerics on plain arrays and records: log-sum-exp partition sums, moments about the mean,
 * composite N-particle partition functions and running error bounds. No HTTP, no JSON, no units
 * beyond the reduced ones named in each signature (energies as E / k_B in kelvin, entropies in k_B).
 *
 * <p>References: N. J. Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed. (SIAM, 2002),
 * chapters 3 (rounding error analysis) and 4 (summation); the log-sum-exp shift as in P. Blanchard,
 * D. J. Higham, N. J. Higham, "Accurately computing the log-sum-exp and softmax functions", IMA J.
 * Numer. Anal. 41 (2021) 2311; two-pass variance as in T. F. Chan, G. H. Golub, R. J. LeVeque,
 * "Algorithms for computing the sample variance", Am. Stat. 37 (1983) 242; the exact sum and product
 * splittings (double-double) of T. J. Dekker, "A floating-point technique for extending the available
 * precision", Numer. Math. 18 (1971) 224; the variance cap of T. Popoviciu, "Sur les equations
 * algebriques ayant toutes leurs racines reelles", Mathematica (Cluj) 9 (1935) 129 (variance at most
 * a quarter of the squared range). Rotor level sums are cut
 * where the integral test (the tail of a decreasing series is below the integral from the last kept
 * term) bounds the rest; sign changes are located by R. P. Brent, Algorithms for Minimization without
 * Derivatives (Prentice-Hall, 1973), ch. 4, as implemented by commons-math3.
 *
 * <p>Solids: the Debye function by its Bernoulli power series and the exponential series of its complement
 * (M. Abramowitz, I. A. Stegun, Handbook of Mathematical Functions, 1964, 27.1); compensated summation as
 * in A. Neumaier, Z. Angew. Math. Mech. 54 (1974) 39; equations of state after F. Birch, Phys. Rev. 71
 * (1947) 809, P. Vinet et al., J. Phys. C 19 (1986) L467 and F. D. Murnaghan, Proc. Natl. Acad. Sci. 30
 * (1944) 244; least squares by K. Levenberg, Q. Appl. Math. 2 (1944) 164 and D. W. Marquardt, J. SIAM 11
 * (1963) 431; roots by R. P. Brent, Algorithms for Minimization without Derivatives (1973).
 */
package org.statesum.engine;
