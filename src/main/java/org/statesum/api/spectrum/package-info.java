/** {@code POST /v1/spectrum}: a discrete level set; the answer writes itself to the generator for speed. */
package org.statesum.api.spectrum;
