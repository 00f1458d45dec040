/**
 * Free-energy differences between thermodynamic states from sampled reduced potentials
 * u_k(x_n) = beta_k U_k(x_n) (dimensionless, in units of k_B T of each state).
 *
 * <p>References: R. W. Zwanzig, "High-temperature equation of state by a perturbation method. I.
 * Nonpolar gases", J. Chem. Phys. 22 (1954) 1420 (exponential averaging); C. H. Bennett, "Efficient
 * estimation of free energy differences from Monte Carlo data", J. Comput. Phys. 22 (1976) 245 (the
 * acceptance ratio); M. R. Shirts, E. Bair, G. Hooker, V. S. Pande, "Equilibrium free energies from
 * nonequilibrium measurements using maximum-likelihood methods", Phys. Rev. Lett. 91 (2003) 140601
 * (the asymptotic variance of BAR); M. R. Shirts, J. D. Chodera, "Statistically optimal analysis of
 * samples from multiple equilibrium states", J. Chem. Phys. 129 (2008) 124105 (MBAR: the estimating
 * equations, the convex objective, the asymptotic covariance by singular value decomposition and the
 * harmonic-oscillator validation design); L. Kish, Survey Sampling (Wiley, 1965) (effective sample
 * size). Newton's method with backtracking as in J. Nocedal, S. J. Wright, Numerical Optimization,
 * 2nd ed. (Springer, 2006), chapter 3.
 */
package org.statesum.engine.sampling;
