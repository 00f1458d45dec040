/**
 * Physical models built on {@code engine}: discrete level sets as N-particle systems today; ideal
 * gases, crystals, the quasi-harmonic approximation and reactions as they are added. SI units at
 * every public boundary (J per entity, J/K per entity, K); no HTTP and no JSON.
 */
package org.statesum.models;
