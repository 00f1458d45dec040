package org.statesum.api;

import jakarta.servlet.http.HttpServletResponse;

/**
 * Headers that make a JSON API safe to call from browsers: no content sniffing, no framing, no
 * referrer, no caching of answers (they may be private), and a content security policy that allows
 * nothing, since the service serves no pages.
 */
final class SecurityHeaders {

    private SecurityHeaders() {
    }

    static void apply(HttpServletResponse res) {
        res.setHeader("X-Content-Type-Options", "nosniff");
        res.setHeader("X-Frame-Options", "DENY");
        res.setHeader("Referrer-Policy", "no-referrer");
        res.setHeader("Cache-Control", "no-store");
        res.setHeader("Content-Security-Policy", "default-src 'none'; frame-ancestors 'none'");
    }
}
