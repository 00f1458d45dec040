/**
 * Stability rankings: candidates (isomers, conformer families, polymorphs) ordered by their Gibbs energy
 * at each temperature, with gaps and their bounds, ties within the bounds, and the temperatures where two
 * candidates exchange places (Brent's method on the re-evaluated models, as reactions find sign changes).
 */
package org.statesum.models.ranking;
