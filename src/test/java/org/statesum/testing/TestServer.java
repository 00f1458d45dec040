package org.statesum.testing;

import static org.junit.jupiter.api.Assertions.fail;

import io.javalin.Javalin;
import io.restassured.RestAssured;
import io.restassured.builder.RequestSpecBuilder;
import io.restassured.config.JsonConfig;
import io.restassured.config.RestAssuredConfig;
import io.restassured.filter.Filter;
import io.restassured.path.json.config.JsonPathConfig;
import io.restassured.specification.RequestSpecification;
import java.util.List;
import org.statesum.api.App;
import org.statesum.api.config.ServiceConfig;

/**
 * The real application on a free port, with every answer it gives checked against the OpenAPI
 * document. One server per configuration; tests share the default one.
 */
public final class TestServer {

    private static TestServer shared;

    private final Javalin app;
    private final RequestSpecification spec;

    private TestServer(ServiceConfig config) {
        app = App.create(config.withPort(0)).start();
        spec = new RequestSpecBuilder().setBaseUri("http://localhost").setPort(app.port())
                .addFilter(contractFilter())
                .setConfig(RestAssuredConfig.config().jsonConfig(
                        JsonConfig.jsonConfig().numberReturnType(JsonPathConfig.NumberReturnType.DOUBLE)))
                .build();
    }

    /** The shared server with default limits. */
    public static synchronized TestServer shared() {
        if (shared == null) {
            shared = new TestServer(ServiceConfig.defaults());
        }
        return shared;
    }

    /** A separate server with other settings; the caller stops it. */
    public static TestServer with(ServiceConfig config) {
        return new TestServer(config);
    }

    public int port() {
        return app.port();
    }

    /** A REST Assured request to this server, contract-checked. */
    public RequestSpecification request() {
        return RestAssured.given(spec);
    }

    public void stop() {
        app.stop();
    }

    private static Filter contractFilter() {
        return (requestSpec, responseSpec, ctx) -> {
            var response = ctx.next(requestSpec, responseSpec);
            String path = requestSpec.getUserDefinedPath();
            List<String> errors = ContractValidator.get().check(path, requestSpec.getMethod(),
                    response.statusCode(), response.contentType(), response.asString());
            if (!errors.isEmpty()) {
                fail("answer to " + requestSpec.getMethod() + " " + path + " (" + response.statusCode()
                        + ") breaks the OpenAPI contract: " + errors + "\nbody: " + abbreviate(response.asString()));
            }
            return response;
        };
    }

    private static String abbreviate(String s) {
        return s.length() > 2000 ? s.substring(0, 2000) + "..." : s;
    }
}
