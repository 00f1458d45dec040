package org.statesum.api;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.javalin.Javalin;
import org.eclipse.jetty.server.ServerConnector;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.ServiceConfig;

/** STATESUM_HOST chooses the interface the service listens on; by default it listens on every one. */
class ListeningAddressApiTest {

    private static String boundHost(ServiceConfig config) {
        Javalin app = App.create(config.withPort(0)).start();
        try {
            return ((ServerConnector) app.jettyServer().server().getConnectors()[0]).getHost();
        } finally {
            app.stop();
        }
    }

    @Test
    void theServiceListensWhereItIsTold() {
        ServiceConfig defaults = ServiceConfig.defaults();
        assertEquals("127.0.0.1", boundHost(defaults.withOperations(defaults.operations().withHost("127.0.0.1"))));
        assertEquals(null, boundHost(defaults), "no host: every interface");
    }
}
