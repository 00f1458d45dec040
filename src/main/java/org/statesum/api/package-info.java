/**
 * HTTP: the application assembly. {@link org.statesum.api.App} wires the rooms below into one Javalin
 * application; {@link org.statesum.api.Main} starts it. The only package tree that imports Javalin or
 * Jackson; no physics here.
 *
 * <p>The rooms, and what each may import (held by {@code ArchitectureTest}):
 * <ul>
 * <li>{@code config}: the settings read from {@code STATESUM_} variables; imports no other room.</li>
 * <li>{@code request}: reading JSON bodies field by field, RFC 9457 problems naming every bad field by
 *     JSON Pointer (RFC 6901), the shared answer shape; imports {@code config}.</li>
 * <li>{@code server}: the machinery every route runs through (admission, memory budget, body pace,
 *     time limits, metrics, access log, access control, protocol errors); imports {@code config} and
 *     {@code request}, never an endpoint.</li>
 * <li>{@code species}: one reader per species model, shared by every endpoint that evaluates or
 *     composes species; imports {@code config} and {@code request}.</li>
 * <li>endpoint rooms ({@code spectrum}, {@code gas}, {@code solid}, {@code reaction}, {@code sampled},
 *     {@code constants}, {@code batch}): a controller and its answer; they import {@code config},
 *     {@code request} and {@code species}, never one another. {@code batch} runs other endpoints' jobs
 *     and so also imports {@code server}.</li>
 * </ul>
 *
 * <p>Standards followed: RFC 8259 (JSON), RFC 9457 (problem details), RFC 6901 (JSON Pointer), RFC 9110
 * (HTTP semantics), RFC 6750 (bearer tokens), NDJSON, the Prometheus text exposition format 0.0.4 and
 * OpenAPI 3.1 with JSON Schema 2020-12 for the contract.
 */
package org.statesum.api;
