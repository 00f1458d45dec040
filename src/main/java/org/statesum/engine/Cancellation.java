package org.statesum.engine;

import java.util.function.Supplier;

/**
 * A cheap, cooperative stop for long engine loops. The caller installs a check for the current thread
 * with {@link #during}; engine loops call {@link #checkpoint()} (or, across a fork, the check captured by
 * {@link #current()} on the calling thread) between independent units of work, for example between two
 * temperatures. A check returns normally to go on, or throws an unchecked exception of the caller's
 * choosing (a time limit reached, a client gone) that unwinds the loop; the engine never catches it.
 *
 * <p>Cost: one thread-local read per call to {@link #checkpoint()} plus whatever the installed check
 * does (a clock read and a flag read in the service). Without an installed check, {@link #checkpoint()}
 * does nothing. Thread-safe: every thread has its own check.
 */
public final class Cancellation {

    private static final Runnable NEVER = () -> { };
    private static final ThreadLocal<Runnable> CHECK = ThreadLocal.withInitial(() -> NEVER);

    private Cancellation() {
    }

    /** Runs {@code work} on this thread with {@code check} installed, restoring the previous check after. */
    public static <T> T during(Runnable check, Supplier<T> work) {
        Runnable previous = CHECK.get();
        CHECK.set(check);
        try {
            return work.get();
        } finally {
            CHECK.set(previous);
        }
    }

    /** The check installed on this thread (a no-op if none); capture it before handing work to other threads. */
    public static Runnable current() {
        return CHECK.get();
    }

    /** Runs this thread's check: returns to go on, or throws to stop. */
    public static void checkpoint() {
        CHECK.get().run();
    }
}
