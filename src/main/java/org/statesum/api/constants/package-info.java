/** {@code GET /v1/constants}: the CODATA 2018 constants, the units and the cautions. */
package org.statesum.api.constants;
