/**
 * The service settings, read once from {@code STATESUM_} environment variables: body and parse limits
 * ({@link org.statesum.api.config.ServiceConfig}), operations (admission, time limits, shutdown, access;
 * {@link org.statesum.api.config.OperationsConfig}) and the bearer tokens (RFC 6750). Records only; no
 * HTTP here.
 */
package org.statesum.api.config;
