/**
 * HTTP: routes, request reading and validation, error mapping to RFC 9457 problems, the answer
 * shape, and serving the OpenAPI document. The only package that imports Javalin or Jackson; no
 * physics here. Operations (admission control, time limits, the NDJSON batch, metrics, access
 * control, graceful shutdown) live here too.
 *
 * <p>References: RFC 9457 (problem details), RFC 6901 (JSON Pointer), RFC 6750 (bearer tokens),
 * RFC 9110 section 10.2.3 ({@code Retry-After}), the NDJSON format (ndjson.org, newline-delimited
 * JSON), and the Prometheus text exposition format 0.0.4.
 */
package org.statesum.api;
