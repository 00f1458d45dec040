/**
 * Physical models built on {@code engine}: discrete level sets as N-particle systems; ideal
 * gases ({@code models.gas}) and reactions ({@code models.reaction}) today; crystals and the
 * quasi-harmonic approximation as they are added. SI units at every public boundary (J per entity, J/K per entity, K); no HTTP and no JSON.
 *
 * <p>The heat-capacity maximum is refined by Brent's method: R. P. Brent, Algorithms for
 * Minimization without Derivatives (Prentice-Hall, 1973), chapter 5, as implemented in commons-math3.
 */
package org.statesum.models;
