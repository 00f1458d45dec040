package org.statesum.api.server;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletRequestWrapper;
import java.util.Collections;
import java.util.Enumeration;
import java.util.Locale;
import java.util.Set;

/**
 * Hides the method-override headers of a request. Javalin runs a request as the method named in
 * {@code X-HTTP-Method-Override}; a GET that carries it would compute as a POST behind proxies and
 * allow-lists that saw a GET. With the headers hidden, every request runs as the method of its request
 * line (a GET on a compute path is then a 405).
 */
final class MethodOverride {

    /** The override headers in use (lower case): Google's, Microsoft's and the older X-Method-Override. */
    private static final Set<String> HEADERS = Set.of("x-http-method-override", "x-http-method", "x-method-override");

    private MethodOverride() {
    }

    /** {@code request}, or a view of it without the override headers when it carries any. */
    static HttpServletRequest hidden(HttpServletRequest request) {
        for (String header : HEADERS) {
            if (request.getHeader(header) != null) {
                return new Hidden(request);
            }
        }
        return request;
    }

    private static final class Hidden extends HttpServletRequestWrapper {

        Hidden(HttpServletRequest request) {
            super(request);
        }

        private static boolean overrides(String name) {
            return name != null && HEADERS.contains(name.toLowerCase(Locale.ROOT));
        }

        @Override
        public String getHeader(String name) {
            return overrides(name) ? null : super.getHeader(name);
        }

        @Override
        public Enumeration<String> getHeaders(String name) {
            return overrides(name) ? Collections.emptyEnumeration() : super.getHeaders(name);
        }

        @Override
        public Enumeration<String> getHeaderNames() {
            return Collections.enumeration(Collections.list(super.getHeaderNames()).stream()
                    .filter(name -> !overrides(name)).toList());
        }
    }
}
