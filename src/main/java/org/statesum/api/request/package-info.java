/**
 * Request reading and problems: the one configured Jackson mapper, the replacement of non-finite
 * numbers (RFC 8259 has no NaN or Infinity), field-by-field readers that collect every bad field as a
 * JSON Pointer (RFC 6901) before answering, RFC 9457 problem documents and their one mapper, the
 * temperature grid, measured values with units, and the shared shape of thermodynamic answers.
 * {@link org.statesum.api.request.ComputeEndpoint} is the interface every compute route implements.
 */
package org.statesum.api.request;
