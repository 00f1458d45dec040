/**
 * Reactions over species given by any model: Delta_r X = sum_i nu_i X_i for X = G, H, S, C_p, and
 * ln K = -Delta_r G / (R T) (IUPAC Green Book, 3rd ed., 2007, section 2.11.1), with the temperatures
 * where Delta_r G changes sign found by Brent's bracketing method (R. P. Brent, Algorithms for
 * Minimization without Derivatives, 1973, ch. 4) on the re-evaluated model.
 */
package org.statesum.models.reaction;
