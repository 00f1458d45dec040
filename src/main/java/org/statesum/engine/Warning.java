package org.statesum.engine;

/**
 * A condition the caller should know about that does not stop the computation: a stable code, a
 * message, and the temperatures (K) where it holds (empty when it holds everywhere).
 */
public record Warning(String code, String message, double[] temperatures) {
}
