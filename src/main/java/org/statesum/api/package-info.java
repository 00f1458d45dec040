/**
 * HTTP: routes, request reading and validation, error mapping to RFC 9457 problems, the answer
 * shape, and serving the OpenAPI document. The only package that imports Javalin or Jackson; no
 * physics here.
 */
package org.statesum.api;
