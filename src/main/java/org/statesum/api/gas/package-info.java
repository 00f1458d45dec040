/** {@code POST /v1/ideal-gas}: one molecular species as an ideal gas. */
package org.statesum.api.gas;
