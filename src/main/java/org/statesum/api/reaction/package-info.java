/** {@code POST /v1/reaction}: species given inline by any model kind, with stoichiometric coefficients. */
package org.statesum.api.reaction;
