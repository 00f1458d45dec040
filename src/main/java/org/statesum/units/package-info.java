/**
 * Units and physical constants: one table, CODATA 2018 exact SI values, used by every other package
 * and using none of them. Served as it is by {@code GET /v1/constants}.
 *
 * <p>Sources: E. Tiesinga, P. J. Mohr, D. B. Newell and B. N. Taylor, "CODATA recommended values of
 * the fundamental physical constants: 2018", Rev. Mod. Phys. 93, 025010 (2021); the thermochemical
 * calorie, 4.184 J exactly (NIST Special Publication 811, 2008 edition, appendix B). A molar unit is
 * per mole of particles (N_A of them).
 */
package org.statesum.units;
