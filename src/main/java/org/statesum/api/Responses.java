package org.statesum.api;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.http.Context;
import java.io.IOException;

/** Writes JSON answers with the service's own mapper. */
final class Responses {

    private Responses() {
    }

    static void json(Context ctx, ObjectMapper mapper, Object body) throws IOException {
        ctx.contentType("application/json").result(mapper.writeValueAsBytes(body));
    }
}
