/**
 * One reader per species model (level set, ideal gas, crystal, quasi-harmonic), turning a request body
 * into model values with every bad field named; the model kinds a composite endpoint (reactions today)
 * may name in {@code "model"} ({@link org.statesum.api.species.SpeciesKinds}).
 */
package org.statesum.api.species;
