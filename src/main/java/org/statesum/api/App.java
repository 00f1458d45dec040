package org.statesum.api;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.Javalin;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Map;
import org.statesum.api.batch.BatchController;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.constants.ConstantsController;
import org.statesum.api.ensemble.EnsembleController;
import org.statesum.api.gas.IdealGasController;
import org.statesum.api.ranking.RankingController;
import org.statesum.api.reaction.ReactionController;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.request.JsonSupport;
import org.statesum.api.request.ProblemMapper;
import org.statesum.api.sampled.SampledController;
import org.statesum.api.server.BodyReader;
import org.statesum.api.server.ComputeRoutes;
import org.statesum.api.server.Operations;
import org.statesum.api.server.ProtocolErrors;
import org.statesum.api.server.ReadRoutes;
import org.statesum.api.solid.CrystalController;
import org.statesum.api.solid.QuasiHarmonicController;
import org.statesum.api.spectrum.SpectrumController;

/** Builds the statesum HTTP application; {@code App.create(config).start()} serves it. */
public final class App {

    private static final String OPENAPI_RESOURCE = "/openapi/statesum.yaml";

    private App() {
    }

    public static Javalin create(ServiceConfig config) {
        ObjectMapper mapper = JsonSupport.mapper(config);
        BodyReader bodies = new BodyReader(mapper, config);
        ComputeRoutes compute = routes(config);
        SampledController sampled = new SampledController(mapper);
        compute.add("/v1/sampled", sampled);
        ConstantsController constants;
        try {
            constants = new ConstantsController(mapper);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        byte[] openApi = resource(OPENAPI_RESOURCE);
        ProblemMapper problems = new ProblemMapper(mapper);
        Operations operations = new Operations(config, mapper, bodies, problems);
        return Javalin.create(javalin -> {
            javalin.startup.showJavalinBanner = false;
            javalin.startup.showOldJavalinVersionWarning = false;
            javalin.jetty.port = config.port();
            if (!config.operations().host().isEmpty()) {
                javalin.jetty.host = config.operations().host();
            }
            javalin.http.maxRequestSize = config.maxBodyBytes();
            javalin.http.prefer405over404 = true;
            problems.register(javalin);
            // errors Jetty answers itself, before any route (bad request line, oversized headers)
            javalin.jetty.modifyServer(server -> server.setErrorHandler(new ProtocolErrors(mapper)));
            // /v1/sampled is streamed rather than parsed into a tree: its matrices reach 1e7 numbers (see
            // SampledBodyParser); in a batch, where the job body is a tree already, it reads the tree.
            operations.install(javalin, compute, Map.of("/v1/sampled", sampled::answer));
            BatchController.install(javalin, mapper, bodies, compute, operations, problems);
            ReadRoutes.add(javalin, problems, "/v1/constants", constants::get);
            ReadRoutes.add(javalin, problems, "/openapi.yaml", ctx -> ctx.contentType("application/yaml").result(openApi));
        });
    }

    private static ComputeRoutes routes(ServiceConfig config) {
        return new ComputeRoutes()
                .add("/v1/spectrum", new SpectrumController(config))
                .add("/v1/ideal-gas", new IdealGasController(config))
                .add("/v1/reaction", new ReactionController(config))
                .add("/v1/ensemble", new EnsembleController(config))
                .add("/v1/ranking", new RankingController(config))
                .add("/v1/crystal", new CrystalController(config))
                .add("/v1/quasi-harmonic", new QuasiHarmonicController(config));
    }

    /** The compute endpoint served at {@code path} (null if none), for in-process callers such as benchmarks. */
    public static ComputeEndpoint endpoint(ServiceConfig config, String path) {
        return routes(config).find(path);
    }

    /**
     * Starts the service from environment variables; SIGTERM (the JVM's shutdown hook) stops it
     * gracefully: readiness fails, new work is refused, work in flight finishes, then the server stops.
     */
    public static Javalin start(Map<String, String> environment) {
        Javalin app = create(ServiceConfig.fromEnvironment(environment)).start();
        Runtime.getRuntime().addShutdownHook(new Thread(app::stop, "statesum-shutdown"));
        return app;
    }

    private static byte[] resource(String name) {
        try (InputStream in = App.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + name);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
