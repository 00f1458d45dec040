package org.statesum.testing;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.IntStream;

/** Request bodies and small helpers shared by the operations tests. */
public final class OpsFixtures {

    private static final HttpClient CLIENT = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();

    private OpsFixtures() {
    }

    /** A two-level system at two temperatures: microseconds of work. */
    public static String smallSpectrum() {
        return "{\"levels\":{\"energies\":[0,1]},\"energyUnit\":\"K\",\"temperatures\":{\"values\":[1,2]}}";
    }

    /** {@code levels} evenly spaced levels on a grid of {@code temperatures}: work grows as their product. */
    public static String spectrum(int levels, int temperatures) {
        String energies = IntStream.range(0, levels).mapToObj(i -> Double.toString(i * 0.37))
                .collect(Collectors.joining(","));
        return "{\"levels\":{\"energies\":[" + energies + "]},\"energyUnit\":\"K\","
                + "\"temperatures\":{\"start\":1,\"stop\":1000,\"count\":" + temperatures + "}}";
    }

    public static String job(String id, String path, String body) {
        return "{\"id\":\"" + id + "\",\"path\":\"" + path + "\",\"body\":" + body + "}";
    }

    /** The value of one unlabelled or labelled series in a Prometheus exposition, 0 if absent. */
    public static double metric(int port, String series) throws IOException, InterruptedException {
        String text = get(port, "/metrics").body();
        Matcher m = Pattern.compile("^" + Pattern.quote(series) + " ([0-9.eE+-]+)$", Pattern.MULTILINE).matcher(text);
        return m.find() ? Double.parseDouble(m.group(1)) : 0;
    }

    public static HttpResponse<String> get(int port, String path) throws IOException, InterruptedException {
        return CLIENT.send(HttpRequest.newBuilder(URI.create("http://localhost:" + port + path)).GET()
                .timeout(Duration.ofSeconds(30)).build(), HttpResponse.BodyHandlers.ofString());
    }

    public static HttpResponse<String> post(int port, String path, String contentType, String body)
            throws IOException, InterruptedException {
        return CLIENT.send(HttpRequest.newBuilder(URI.create("http://localhost:" + port + path))
                .header("Content-Type", contentType).timeout(Duration.ofSeconds(30))
                .POST(HttpRequest.BodyPublishers.ofString(body)).build(), HttpResponse.BodyHandlers.ofString());
    }

    /**
     * Sends {@code request} as it is on a new connection and returns the whole answer, as ISO-8859-1
     * text, read until the server closes or 2 s pass without a byte.
     */
    public static String raw(int port, String request) throws IOException {
        return raw(port, request.getBytes(java.nio.charset.StandardCharsets.ISO_8859_1));
    }

    public static String raw(int port, byte[] request) throws IOException {
        try (java.net.Socket socket = new java.net.Socket("localhost", port)) {
            socket.setSoTimeout(2_000);
            socket.getOutputStream().write(request);
            socket.getOutputStream().flush();
            java.io.InputStream in = socket.getInputStream();
            java.io.ByteArrayOutputStream answer = new java.io.ByteArrayOutputStream();
            byte[] buffer = new byte[8192];
            try {
                for (int n; (n = in.read(buffer)) > 0; ) {
                    answer.write(buffer, 0, n);
                }
            } catch (java.net.SocketTimeoutException e) {
                // a kept-alive connection: what arrived is the answer
            }
            return answer.toString(java.nio.charset.StandardCharsets.ISO_8859_1);
        }
    }

    /** Polls until the condition holds or the timeout passes; returns whether it held. */
    public static boolean eventually(Duration timeout, Check check) throws Exception {
        long end = System.nanoTime() + timeout.toNanos();
        while (System.nanoTime() < end) {
            if (check.holds()) {
                return true;
            }
            Thread.sleep(10);
        }
        return check.holds();
    }

    @FunctionalInterface
    public interface Check {
        boolean holds() throws Exception;
    }
}
