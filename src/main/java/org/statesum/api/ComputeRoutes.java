package org.statesum.api;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/** The compute endpoints by path, in registration order; App serves each as a POST route. */
final class ComputeRoutes {

    private final Map<String, ComputeEndpoint> endpoints = new LinkedHashMap<>();

    ComputeRoutes add(String path, ComputeEndpoint endpoint) {
        endpoints.put(path, endpoint);
        return this;
    }

    Map<String, ComputeEndpoint> all() {
        return Collections.unmodifiableMap(endpoints);
    }

    ComputeEndpoint find(String path) {
        return endpoints.get(path);
    }
}
