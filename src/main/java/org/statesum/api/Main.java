package org.statesum.api;

/** Entry point of {@code java -jar target/statesum.jar}: settings from {@code STATESUM_*} variables. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        try {
            App.start(System.getenv());
        } catch (IllegalArgumentException e) {
            System.err.println("statesum: bad configuration: " + e.getMessage());
            System.exit(2);
        }
    }
}
