/**
 * {@code POST /v1/batch}: many jobs for any compute endpoint in one request, answered as NDJSON as they
 * finish. Runs jobs on the server machinery, so it is the one endpoint room that imports {@code server}.
 */
package org.statesum.api.batch;
