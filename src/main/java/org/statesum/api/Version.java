package org.statesum.api;

/** The service version, from the jar manifest (the POM version), or "dev" when run from classes. */
final class Version {

    private Version() {
    }

    static String current() {
        String version = Version.class.getPackage().getImplementationVersion();
        return version == null ? "dev" : version;
    }
}
