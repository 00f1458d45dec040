/**
 * Physical models built on {@code engine}: discrete level sets as N-particle systems; ideal
 * gases ({@code models.gas}) and reactions ({@code models.reaction}) today; crystals and the
 * quasi-harmonic approximation as they are added. SI units at every public boundary (J per entity, J/K per entity, K); no HTTP and no JSON.
 */
package org.statesum.models;
