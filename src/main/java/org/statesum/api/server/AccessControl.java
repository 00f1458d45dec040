package org.statesum.api.server;

import io.javalin.http.Context;
import io.javalin.http.HandlerType;
import java.util.List;
import java.util.Set;
import org.statesum.api.config.BearerTokens;
import org.statesum.api.config.OperationsConfig;
import org.statesum.api.request.FieldError;
import org.statesum.api.request.Problem;
import org.statesum.api.request.ProblemException;
import org.statesum.api.request.ProblemMapper;

/**
 * Runs before every route: answers CORS preflights, adds CORS headers for allowed browser origins
 * ({@code STATESUM_CORS_ORIGINS}; none by default, so browsers may not call across origins), and
 * requires a bearer token when tokens are configured ({@code STATESUM_AUTH_TOKENS},
 * {@code STATESUM_AUTH_TOKENS_FILE}; off by default). The probes stay open so that an orchestrator can
 * reach them without a token.
 */
public final class AccessControl {

    private static final Set<String> OPEN_PATHS = Set.of("/health/live", "/health/ready");
    private static final String ALLOW_HEADERS = "Authorization, Content-Type, Content-Encoding, X-Request-Id";
    private static final String EXPOSE_HEADERS = "X-Request-Id, Retry-After";
    /** How long a browser may cache a preflight answer, s (common practice: minutes, not days). */
    private static final String PREFLIGHT_MAX_AGE_SECONDS = "600";

    private final BearerTokens tokens;
    private final List<String> origins;
    private final ServiceMetrics metrics;
    private final ProblemMapper problems;

    /** @param problems knows the methods each path serves (the Allow of an OPTIONS answer) */
    AccessControl(OperationsConfig ops, ServiceMetrics metrics, ProblemMapper problems) {
        this.tokens = ops.tokens();
        this.origins = ops.corsOrigins();
        this.metrics = metrics;
        this.problems = problems;
    }

    void before(Context ctx) {
        String origin = ctx.header("Origin");
        boolean allowedOrigin = origin != null && (origins.contains("*") || origins.contains(origin));
        if (allowedOrigin) {
            ctx.header("Access-Control-Allow-Origin", origins.contains("*") ? "*" : origin);
            ctx.header("Access-Control-Expose-Headers", EXPOSE_HEADERS);
            ctx.header("Vary", "Origin");
        }
        if (ctx.method() == HandlerType.OPTIONS) {
            preflight(ctx, origin, allowedOrigin);
            return;
        }
        if (tokens.enabled() && !OPEN_PATHS.contains(ctx.path())) {
            authenticate(ctx);
        }
    }

    /**
     * OPTIONS on a path: 404 where nothing is served, else 204 with the path's own methods in
     * {@code Allow} (RFC 9110, section 9.3.7) and, for an allowed origin, the CORS preflight headers.
     */
    private void preflight(Context ctx, String origin, boolean allowedOrigin) {
        Set<String> methods = problems.methods(ctx.path());
        if (methods.isEmpty()) {
            throw new ProblemException(ProblemMapper.fromStatus(404));
        }
        String allow = String.join(", ", methods) + ", OPTIONS";
        if (origin != null && !allowedOrigin) {
            throw new ProblemException(Problem.of("origin-not-allowed", "Origin not allowed", 403,
                    "browser calls from origin '" + origin + "' are not allowed (STATESUM_CORS_ORIGINS)",
                    List.of(new FieldError("", "origin not in the allow-list"))));
        }
        if (allowedOrigin) {
            ctx.header("Access-Control-Allow-Methods", allow);
            ctx.header("Access-Control-Allow-Headers", ALLOW_HEADERS);
            ctx.header("Access-Control-Max-Age", PREFLIGHT_MAX_AGE_SECONDS);
        }
        ctx.header("Allow", allow);
        ctx.status(204);
        ctx.skipRemainingHandlers();
    }

    private void authenticate(Context ctx) {
        String header = ctx.header("Authorization");
        boolean presented = header != null && header.regionMatches(true, 0, "Bearer ", 0, 7);
        if (presented && tokens.accepts(header.substring(7).trim())) {
            return;
        }
        metrics.rejected("unauthorized");
        ctx.header("WWW-Authenticate", presented ? "Bearer realm=\"statesum\", error=\"invalid_token\""
                : "Bearer realm=\"statesum\"");
        throw new ProblemException(Problem.of("unauthorized", "Unauthorized", 401, presented
                ? "the bearer token is not valid" : "send 'Authorization: Bearer <token>'; this service requires one",
                List.of()));
    }
}
