package org.statesum.api.request;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Checks the {@code Content-Type} of a request body: the media type must be {@code application/json}
 * (any case, RFC 9110 section 8.3.1), and the parameters well-formed {@code name=value} pairs (token or
 * quoted string, section 5.6.6). JSON is UTF-8 (RFC 8259, section 8.1), so a {@code charset} parameter,
 * which the registration does not define, is accepted only when it names UTF-8 or its subset US-ASCII;
 * anything else is a 415 that names the parameter. Reads the raw header value, never the container's
 * parsed form (which throws on a charset the JVM does not know).
 */
public final class JsonMediaType {

    private JsonMediaType() {
    }

    /** Throws a 415 problem unless {@code contentType} (the raw header value, or null) is JSON in UTF-8. */
    public static void require(String contentType) {
        String value = contentType == null ? "" : contentType;
        List<String> parts = split(value);
        String type = parts.get(0).trim().toLowerCase(Locale.ROOT);
        if (!type.equals("application/json")) {
            throw refused("send the body as application/json (got '" + value + "')",
                    "Content-Type must be application/json");
        }
        String charset = null;
        for (String part : parts.subList(1, parts.size())) {
            String parameter = part.trim();
            if (parameter.isEmpty()) {
                continue; // "application/json;" and ";;" are harmless
            }
            int equals = parameter.indexOf('=');
            if (equals <= 0) {
                throw refused("the Content-Type parameter '" + parameter + "' is not name=value (RFC 9110, section 5.6.6)",
                        "malformed Content-Type parameter '" + parameter + "'");
            }
            String name = parameter.substring(0, equals).trim().toLowerCase(Locale.ROOT);
            String raw = unquote(parameter.substring(equals + 1).trim());
            if (name.equals("charset")) {
                String named = raw.toLowerCase(Locale.ROOT);
                if (!(named.equals("utf-8") || named.equals("us-ascii")) || (charset != null && !charset.equals(named))) {
                    throw refused("JSON is UTF-8 (RFC 8259, section 8.1): send charset=utf-8 or no charset (got charset="
                            + raw + ")", "Content-Type parameter charset=" + raw + " is not UTF-8");
                }
                charset = named;
            }
        }
    }

    /** The header split at semicolons outside quoted strings. */
    private static List<String> split(String value) {
        List<String> parts = new ArrayList<>();
        StringBuilder part = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < value.length(); i++) {
            char c = value.charAt(i);
            if (quoted && c == '\\' && i + 1 < value.length()) {
                part.append(c).append(value.charAt(++i));
                continue;
            }
            if (c == '"') {
                quoted = !quoted;
            } else if (c == ';' && !quoted) {
                parts.add(part.toString());
                part.setLength(0);
                continue;
            }
            part.append(c);
        }
        parts.add(part.toString());
        return parts;
    }

    private static String unquote(String value) {
        if (value.length() >= 2 && value.startsWith("\"") && value.endsWith("\"")) {
            return value.substring(1, value.length() - 1).replaceAll("\\\\(.)", "$1");
        }
        return value;
    }

    private static ProblemException refused(String detail, String message) {
        return new ProblemException(Problem.of("unsupported-media-type", "Unsupported media type", 415, detail,
                List.of(new FieldError("", message))));
    }
}
