/** {@code POST /v1/crystal} and {@code POST /v1/quasi-harmonic}: harmonic and quasi-harmonic solids. */
package org.statesum.api.solid;
