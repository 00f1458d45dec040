/** {@code POST /v1/ranking}: candidates ordered by G on a temperature grid, with ties and exchange temperatures. */
package org.statesum.api.ranking;
