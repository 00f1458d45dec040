package org.statesum.api.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.statesum.api.config.ServiceConfig;
import org.statesum.testing.OpsFixtures;
import org.statesum.testing.TestServer;

/**
 * A slow-client attack does not take the service from other clients. One attacker address (127.0.0.2,
 * loopback on Linux) keeps 40 connections open, each sending its body at one byte a second and opening
 * a new one whenever the server ends it; meanwhile a normal client (127.0.0.1) sends small requests.
 * Bodies still arriving hold no compute admission, one address may send at most
 * STATESUM_MAX_BODIES_PER_CLIENT (here 8) bodies at once (429 beyond, at once), and the body pace
 * ends the slow ones with 408; the normal client must get at least 90 % of its answers.
 */
class SlowClientAttackApiTest {

    private static final String ATTACKER = "127.0.0.2";
    private static final int ATTACK_CONNECTIONS = 40;
    private static final long ATTACK_MILLIS = 6_000;
    private static TestServer server;

    @BeforeAll
    static void start() {
        ServiceConfig defaults = ServiceConfig.defaults();
        server = TestServer.with(defaults.withPort(0).withOperations(defaults.operations()
                .withConcurrency(2, 4, 2_000).withBodyPace(2_000, 1_000).withBodiesPerClient(8)));
    }

    @AfterAll
    static void stop() {
        server.stop();
    }

    /** A connection from {@code address} that promises a 200-byte spectrum body and sends its first byte. */
    private static Socket slowBody(String address) throws IOException {
        Socket socket = new Socket();
        socket.bind(new InetSocketAddress(address, 0));
        socket.connect(new InetSocketAddress("127.0.0.1", server.port()), 2_000);
        socket.setSoTimeout(20_000);
        OutputStream out = socket.getOutputStream();
        out.write(("POST /v1/spectrum HTTP/1.1\r\nHost: localhost\r\nContent-Type: application/json\r\n"
                + "Content-Length: 200\r\n\r\n{").getBytes(StandardCharsets.US_ASCII));
        out.flush();
        return socket;
    }

    /** One attacking connection: a byte a second until the server answers, then again on a new one. */
    private static void attack(AtomicBoolean running, AtomicInteger refusedAtOnce) {
        while (running.get()) {
            try (Socket socket = slowBody(ATTACKER)) {
                InputStream in = socket.getInputStream();
                OutputStream out = socket.getOutputStream();
                while (running.get() && in.available() == 0) {
                    Thread.sleep(1_000);
                    if (in.available() == 0) {
                        out.write(' ');
                        out.flush();
                    }
                }
                byte[] head = new byte[12];
                if (in.available() > 0 && in.read(head) == 12
                        && new String(head, StandardCharsets.US_ASCII).endsWith("429")) {
                    refusedAtOnce.incrementAndGet();
                }
            } catch (IOException e) {
                // the server closed the connection: open the next one
            } catch (InterruptedException e) {
                return;
            }
            try {
                Thread.sleep(50);
            } catch (InterruptedException e) {
                return;
            }
        }
    }

    /** The answer's head and body, read until the body's JSON object closes (or the server closes). */
    private static String answer(InputStream in) throws IOException {
        StringBuilder text = new StringBuilder();
        byte[] buffer = new byte[1024];
        for (int n; (n = in.read(buffer)) > 0; ) {
            text.append(new String(buffer, 0, n, StandardCharsets.UTF_8));
            if (text.indexOf("\r\n\r\n") > 0 && text.toString().endsWith("}")) {
                break;
            }
        }
        return text.toString();
    }

    @Test
    void aNormalClientKeepsGettingAnswersDuringASlowClientAttack() throws Exception {
        AtomicBoolean running = new AtomicBoolean(true);
        AtomicInteger refusedAtOnce = new AtomicInteger();
        List<Thread> attackers = new ArrayList<>();
        for (int i = 0; i < ATTACK_CONNECTIONS; i++) {
            Thread thread = new Thread(() -> attack(running, refusedAtOnce));
            thread.setDaemon(true);
            thread.start();
            attackers.add(thread);
        }
        Thread.sleep(500); // the attack is under way
        int probes = 0;
        int answered = 0;
        long start = System.nanoTime();
        try {
            while ((System.nanoTime() - start) / 1e6 < ATTACK_MILLIS) {
                HttpResponse<String> response = OpsFixtures.post(server.port(), "/v1/spectrum", "application/json",
                        OpsFixtures.smallSpectrum());
                probes++;
                if (response.statusCode() == 200) {
                    answered++;
                }
                Thread.sleep(100);
            }
        } finally {
            running.set(false);
            for (Thread thread : attackers) {
                thread.interrupt();
            }
        }
        if (Boolean.getBoolean("statesum.verbose")) {
            System.out.printf("slow-client attack: %d of %d probes answered, %d attacking connections refused at once%n",
                    answered, probes, refusedAtOnce.get());
        }
        assertTrue(answered >= 0.9 * probes, answered + " of " + probes + " probes answered");
        assertTrue(refusedAtOnce.get() > 0, "the attacker's connections beyond the cap were refused at once");
    }

    @Test
    void oneAddressMaySendOnlyItsCapOfBodiesAtOnce() throws Exception {
        List<Socket> held = new ArrayList<>();
        try {
            for (int i = 0; i < 8; i++) {
                held.add(slowBody("127.0.0.3"));
            }
            Thread.sleep(300); // the eight are being read
            try (Socket ninth = slowBody("127.0.0.3")) {
                String text = answer(ninth.getInputStream());
                assertTrue(text.startsWith("HTTP/1.1 429 "), text);
                assertTrue(text.contains("Retry-After: "), text);
                assertTrue(text.contains("too-many-bodies"), text);
            }
            HttpResponse<String> other = OpsFixtures.post(server.port(), "/v1/spectrum", "application/json",
                    OpsFixtures.smallSpectrum());
            assertEquals(200, other.statusCode(), "another address is not affected");
        } finally {
            for (Socket socket : held) {
                socket.close();
            }
        }
    }
}
