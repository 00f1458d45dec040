/**
 * The HTTP server machinery every route runs through: admission and compute slots with
 * {@code Retry-After} (RFC 9110 section 10.2.3), the memory budget shared by bodies and answers, body
 * size and pace limits, time limits, gzip of large answers, request ids, security headers, the access
 * log, Prometheus metrics (text format 0.0.4), CORS and bearer tokens (RFC 6750), RFC 9457 problems for
 * errors Jetty raises before any route, probes and graceful shutdown. Knows no endpoint.
 */
package org.statesum.api.server;
