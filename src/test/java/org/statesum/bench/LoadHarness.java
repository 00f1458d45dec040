package org.statesum.bench;

import io.javalin.Javalin;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.statesum.api.App;
import org.statesum.api.config.ServiceConfig;

/**
 * The two servers of {@code bench/load.sh}, in one JVM so that both see the same JIT, GC and heap:
 * statesum as shipped (settings from {@code STATESUM_*}, port chosen freely) and, as the baseline, a
 * bare Javalin endpoint that answers every POST with a fixed JSON object and nothing else (no request
 * ids, metrics, access log, limits or parsing). Writes "statesumPort barePort" to the file named by
 * the first argument and runs until killed. Not a product route: it exists only here.
 */
public final class LoadHarness {

    private static final byte[] FIXED = "{\"status\":\"up\",\"service\":\"baseline\"}".getBytes(StandardCharsets.UTF_8);

    private LoadHarness() {
    }

    public static void main(String[] args) throws Exception {
        Javalin statesum = App.create(ServiceConfig.fromEnvironment(System.getenv()).withPort(0)).start();
        Javalin bare = Javalin.create(config -> {
            config.startup.showJavalinBanner = false;
            config.routes.post("/fixed", ctx -> ctx.contentType("application/json").result(FIXED));
        }).start(0);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            bare.stop();
            statesum.stop();
        }));
        Files.writeString(Path.of(args[0]), statesum.port() + " " + bare.port() + "\n");
        Thread.currentThread().join();
    }
}
