/**
 * {@code POST /v1/ensemble}: a conformer (or polymorph) family as one species: the Boltzmann-weighted
 * G, H, S, C_p with the mixing entropy, the fluctuation term of the heat capacity and each member's
 * population.
 */
package org.statesum.api.ensemble;
