package org.statesum.api.server;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.ByteBuffer;
import java.util.List;
import java.util.regex.Pattern;
import org.eclipse.jetty.http.HttpFields;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.server.handler.ErrorHandler;
import org.eclipse.jetty.util.Callback;
import org.statesum.api.request.FieldError;
import org.statesum.api.request.Problem;
import org.statesum.api.request.ProblemMapper;

/**
 * Answers the errors Jetty raises before a request reaches a route (a malformed request line or
 * header, a URI or header block over Jetty's limits, a bad Content-Length) with the same RFC 9457
 * problem documents as every other error, instead of Jetty's HTML page: 400 {@code malformed-request},
 * 414 {@code uri-too-long}, 431 {@code header-fields-too-large}, 505 {@code http-version-not-supported},
 * others by status. Jetty's reason goes
 * into the detail only when it is a short plain phrase; nothing else about the server is shown.
 */
public final class ProtocolErrors extends ErrorHandler {

    /** A reason worth passing on: a short phrase of letters, digits, spaces and light punctuation. */
    private static final Pattern PLAIN = Pattern.compile("[A-Za-z0-9 ,.:'()-]{1,120}");

    private final ObjectMapper mapper;

    public ProtocolErrors(ObjectMapper mapper) {
        this.mapper = mapper;
    }

    /** Every method gets its problem document (Jetty's default skips all but GET, POST and HEAD). */
    @Override
    public boolean errorPageForMethod(String method) {
        return true;
    }

    @Override
    protected void generateResponse(Request request, Response response, int code, String message, Throwable cause,
            Callback callback) {
        byte[] body = body(code, message);
        SecurityHeaders.apply(response.getHeaders());
        response.getHeaders().put(HttpHeader.CONTENT_TYPE, Problem.MEDIA_TYPE);
        response.write(true, ByteBuffer.wrap(body), callback);
    }

    @Override
    public ByteBuffer badMessageError(int status, String reason, HttpFields.Mutable fields) {
        SecurityHeaders.apply(fields);
        fields.put(HttpHeader.CONTENT_TYPE, Problem.MEDIA_TYPE);
        return ByteBuffer.wrap(body(status, reason));
    }

    private byte[] body(int status, String reason) {
        try {
            return mapper.writeValueAsBytes(problem(status, reason));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a problem is always writable", e);
        }
    }

    static Problem problem(int status, String reason) {
        String said = reason != null && PLAIN.matcher(reason).matches() ? ": " + reason : "";
        return switch (status) {
            case 400 -> Problem.of("malformed-request", "Malformed request", 400,
                    "the request is not well-formed HTTP/1.1" + said, List.of(new FieldError("", "malformed request")));
            case 414 -> Problem.of("uri-too-long", "URI too long", 414,
                    "the request target is longer than the server accepts" + said, List.of());
            case 431 -> Problem.of("header-fields-too-large", "Request header fields too large", 431,
                    "the request's header fields are larger than the server accepts" + said, List.of());
            case 505 -> Problem.of("http-version-not-supported", "HTTP version not supported", 505,
                    "send HTTP/1.1" + said, List.of());
            default -> status >= 400 && status < 500 || status == 500 ? ProblemMapper.fromStatus(status)
                    : Problem.of("server-error", "Server error", status, "the request could not be served" + said,
                            List.of());
        };
    }
}
