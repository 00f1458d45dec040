package org.statesum.api.request;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpResponseException;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ConcurrentSkipListSet;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.statesum.engine.DomainException;

/**
 * The one place where exceptions become answers: a {@link ProblemException} as it is, a
 * {@link DomainException} as 422 naming its field, Javalin's own HTTP exceptions with their status, and
 * anything else as a bare 500 that says nothing about the inside (the cause goes to the log).
 */
public final class ProblemMapper {

    private static final Logger LOG = LoggerFactory.getLogger(ProblemMapper.class);

    private static final byte[] INTERNAL_ERROR = ("{\"type\":\"https://statesum.org/problems/internal-error\","
            + "\"title\":\"Internal error\",\"status\":500,\"detail\":\"the service failed to answer this request; "
            + "it has been logged\",\"errors\":[]}").getBytes(java.nio.charset.StandardCharsets.UTF_8);

    private final ObjectMapper mapper;
    /** The methods each path serves, for the Allow header of a 405 (RFC 9110, section 15.5.6). */
    private final Map<String, Set<String>> allowed = new ConcurrentHashMap<>();

    public ProblemMapper(ObjectMapper mapper) {
        this.mapper = mapper;
    }

    /** Records that {@code path} serves {@code method}; returns the path. */
    public String allow(String method, String path) {
        allowed.computeIfAbsent(path, p -> new ConcurrentSkipListSet<>()).add(method);
        return path;
    }

    /** The methods {@code path} serves, in alphabetical order; empty for a path that serves nothing. */
    public Set<String> methods(String path) {
        Set<String> methods = allowed.get(path);
        return methods == null ? Set.of() : Collections.unmodifiableSet(methods);
    }

    public void register(JavalinConfig config) {
        config.routes.exception(ProblemException.class, (e, ctx) -> write(ctx, e.problem()));
        config.routes.exception(DomainException.class, (e, ctx) -> write(ctx, Problem.of("invalid-request",
                "Invalid request", 422, e.getMessage(), List.of(new FieldError(e.field(), e.getMessage())))));
        config.routes.exception(HttpResponseException.class, (e, ctx) -> write(ctx, fromStatus(e.getStatus())));
        config.routes.exception(Exception.class, (e, ctx) -> {
            LOG.error("unhandled exception on {} {}", ctx.method(), ctx.path(), e);
            write(ctx, fromStatus(500));
        });
        // An Error (out of memory, say) bypasses the exception mappers; answer it with the same bare 500.
        config.router.javaLangErrorHandler((res, error) -> {
            LOG.error("unhandled error", error);
            try {
                res.setStatus(500);
                res.setContentType(Problem.MEDIA_TYPE);
                res.getOutputStream().write(INTERNAL_ERROR);
            } catch (java.io.IOException | IllegalStateException e) {
                LOG.error("could not write a problem", e);
            }
        });
        for (int status : new int[] {404, 405}) {
            config.routes.error(status, "*", ctx -> {
                if (status == 405 && allowed.containsKey(ctx.path())) {
                    ctx.header("Allow", String.join(", ", allowed.get(ctx.path())));
                }
                if (!Problem.MEDIA_TYPE.equals(ctx.res().getContentType())) {
                    write(ctx, fromStatus(status));
                }
            });
        }
    }

    public void write(Context ctx, Problem problem) {
        try {
            ctx.status(problem.status()).contentType(Problem.MEDIA_TYPE).result(mapper.writeValueAsBytes(problem));
        } catch (Exception e) {
            LOG.error("could not write a problem", e);
            ctx.status(500).contentType(Problem.MEDIA_TYPE).result(INTERNAL_ERROR);
        }
    }

    public static Problem fromStatus(int status) {
        return switch (status) {
            case 400 -> Problem.of("bad-request", "Bad request", 400, "the request could not be read", List.of());
            case 404 -> Problem.of("not-found", "Not found", 404, "no such resource; see /openapi.yaml", List.of());
            case 405 -> Problem.of("method-not-allowed", "Method not allowed", 405,
                    "this method is not allowed here; see /openapi.yaml", List.of());
            case 413 -> Problem.of("body-too-large", "Request body too large", 413,
                    "the request body exceeds the configured limit", List.of(new FieldError("", "body too large")));
            case 415 -> Problem.of("unsupported-media-type", "Unsupported media type", 415,
                    "send the body as application/json", List.of(new FieldError("", "unsupported media type")));
            case 503 -> Problem.of("overloaded", "Service overloaded", 503, "try again later", List.of());
            default -> status >= 400 && status < 500
                    ? Problem.of("client-error", "Client error", status, "the request was not accepted", List.of())
                    : Problem.of("internal-error", "Internal error", 500,
                            "the service failed to answer this request; it has been logged", List.of());
        };
    }
}
