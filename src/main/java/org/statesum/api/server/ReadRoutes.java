package org.statesum.api.server;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Handler;
import org.statesum.api.request.ProblemMapper;

/**
 * Registers a read-only route for GET and for HEAD with the same handler, so that HEAD answers the
 * status and header fields GET would (content type and length included) without the content, which
 * Jetty drops (RFC 9110, section 9.3.2). Without it Javalin answers HEAD with an empty text/plain 200
 * whatever GET would say. Both methods go into the Allow header of a 405 on the path.
 */
public final class ReadRoutes {

    private ReadRoutes() {
    }

    public static void add(JavalinConfig javalin, ProblemMapper problems, String path, Handler handler) {
        javalin.routes.get(problems.allow("GET", path), handler);
        javalin.routes.head(problems.allow("HEAD", path), handler);
    }
}
