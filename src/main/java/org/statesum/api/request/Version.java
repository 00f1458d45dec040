package org.statesum.api.request;

/** The service version, from the jar manifest (the POM version), or "dev" when run from classes. */
public final class Version {

    /** Read once: the manifest does not change while the service runs, and every answer names it. */
    private static final String CURRENT = read();

    private Version() {
    }

    static String current() {
        return CURRENT;
    }

    private static String read() {
        String version = Version.class.getPackage().getImplementationVersion();
        return version == null ? "dev" : version;
    }
}
