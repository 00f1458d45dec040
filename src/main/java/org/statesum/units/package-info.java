/**
 * Units and physical constants: one table, CODATA 2018 exact SI values, used by every other package
 * and using none of them. Served as it is by {@code GET /v1/constants}.
 */
package org.statesum.units;
