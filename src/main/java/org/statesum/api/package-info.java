/**
 * HTTP: routes, request reading and validation, error mapping to RFC 9457 problems, the answer
 * shape, and serving the OpenAPI document. The only package that imports Javalin or Jackson; no
 * physics here.
 *
 * <p>Standards followed: RFC 8259 (JSON; NaN and Infinity are not JSON numbers, so they are named as
 * invalid), RFC 9457 (problem details, {@code application/problem+json}), RFC 6901 (JSON Pointer, for
 * the bad fields of a request), RFC 9110 (HTTP semantics: 405 with Allow, 413, 415), and OpenAPI 3.1
 * with JSON Schema 2020-12 for the contract. Every limit is a {@link org.statesum.api.ServiceConfig}
 * setting.
 */
package org.statesum.api;
