package org.statesum.engine;

/**
 * The one exception that the engine and the models throw for input they cannot accept. It names a
 * stable machine-readable {@code code}, the offending {@code field} as a JSON-Pointer-like path
 * relative to the request (for example {@code "/levels/energies/3"}, or {@code ""} for the whole
 * request), and a message fit to show a client.
 */
public final class DomainException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String code;
    private final String field;

    public DomainException(String code, String field, String message) {
        super(message, null, false, false);
        this.code = code;
        this.field = field;
    }

    public String code() {
        return code;
    }

    public String field() {
        return field;
    }
}
