package org.statesum.api.server;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.api.request.ComputeEndpoint;

/** The compute endpoints by path, in registration order; App serves each as a POST route. */
public final class ComputeRoutes {

    private final Map<String, ComputeEndpoint> endpoints = new LinkedHashMap<>();

    public ComputeRoutes add(String path, ComputeEndpoint endpoint) {
        endpoints.put(path, endpoint);
        return this;
    }

    Map<String, ComputeEndpoint> all() {
        return Collections.unmodifiableMap(endpoints);
    }

    public ComputeEndpoint find(String path) {
        return endpoints.get(path);
    }
}
