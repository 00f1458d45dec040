/**
 * {@code POST /v1/sampled}: free-energy differences from sampled reduced potentials (EXP, BAR, MBAR); the
 * body is streamed into arrays, not held as a JSON tree.
 */
package org.statesum.api.sampled;
