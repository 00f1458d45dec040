package org.statesum.api.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.path.json.JsonPath;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.statesum.testing.TestServer;

/**
 * The two-dimensional Ising model on a 4 x 4 periodic lattice, E = -J sum_(nearest pairs) s_i s_j
 * with J / k_B = 1 K: its exact density of states by enumeration of all 2^16 configurations, sent as
 * {@code logDegeneracies}, must reproduce Kaufman's exact partition function of the finite periodic
 * lattice (B. Kaufman, Phys. Rev. 76 (1949) 1232, eq. 39 as written by P. D. Beale, Phys. Rev. Lett.
 * 76 (1996) 78).
 */
class IsingDensityOfStatesApiTest {

    private static final int SIDE = 4;

    private final TestServer server = TestServer.shared();

    /** Energy (in units of J) -> number of configurations, by enumeration. */
    private static TreeMap<Integer, Long> densityOfStates() {
        TreeMap<Integer, Long> g = new TreeMap<>();
        int sites = SIDE * SIDE;
        for (int config = 0; config < 1 << sites; config++) {
            int energy = 0;
            for (int r = 0; r < SIDE; r++) {
                for (int c = 0; c < SIDE; c++) {
                    int s = spin(config, r, c);
                    energy -= s * (spin(config, r, (c + 1) % SIDE) + spin(config, (r + 1) % SIDE, c));
                }
            }
            g.merge(energy, 1L, Long::sum);
        }
        return g;
    }

    private static int spin(int config, int r, int c) {
        return ((config >> (r * SIDE + c)) & 1) == 1 ? 1 : -1;
    }

    /**
     * Kaufman's ln Z for an m x n periodic lattice at K = J / (k_B T):
     * Z = (1/2) (2 sinh 2K)^(mn/2) [prod_r 2 cosh(m g_{2r+1}/2) + prod_r 2 sinh(m g_{2r+1}/2)
     * + prod_r 2 cosh(m g_{2r}/2) + prod_r 2 sinh(m g_{2r}/2)], r = 0..n-1, with
     * cosh g_k = cosh 2K coth 2K - cos(pi k / n) and g_0 = 2K + ln tanh K (which changes sign at T_c).
     */
    private static double kaufmanLogZ(double temperature) {
        int m = SIDE;
        int n = SIDE;
        double k = 1 / temperature;
        double p1 = 1;
        double p2 = 1;
        double p3 = 1;
        double p4 = 1;
        for (int r = 0; r < n; r++) {
            double odd = gamma(2 * r + 1, k, n);
            double even = gamma(2 * r, k, n);
            p1 *= 2 * Math.cosh(m * odd / 2);
            p2 *= 2 * Math.sinh(m * odd / 2);
            p3 *= 2 * Math.cosh(m * even / 2);
            p4 *= 2 * Math.sinh(m * even / 2);
        }
        return Math.log(0.5) + m * n / 2.0 * Math.log(2 * Math.sinh(2 * k)) + Math.log(p1 + p2 + p3 + p4);
    }

    private static double gamma(int index, double k, int n) {
        if (index == 0) {
            return 2 * k + Math.log(Math.tanh(k));
        }
        double c = Math.cosh(2 * k) / Math.tanh(2 * k) - Math.cos(Math.PI * index / n);
        return Math.log(c + Math.sqrt(c * c - 1));
    }

    private static String body(String temperatures) {
        TreeMap<Integer, Long> g = densityOfStates();
        StringBuilder e = new StringBuilder();
        StringBuilder lnG = new StringBuilder();
        g.forEach((energy, count) -> {
            e.append(e.length() == 0 ? "" : ",").append(energy);
            lnG.append(lnG.length() == 0 ? "" : ",").append(Math.log(count));
        });
        return "{\"levels\": {\"energies\": [" + e + "], \"logDegeneracies\": [" + lnG + "]}, \"energyUnit\": \"K\", "
                + "\"temperatures\": " + temperatures + "}";
    }

    @Test
    void enumeratedDensityOfStatesReproducesKaufmansPartitionFunction() {
        double[] temperatures = {1.0, 2.0, 2.269185314213022, 3.0, 5.0};
        JsonPath answer = server.request().contentType("application/json")
                .body(body("{\"values\": [1.0, 2.0, 2.269185314213022, 3.0, 5.0]}"))
                .post("/v1/spectrum")
                .then().statusCode(200).extract().jsonPath();
        for (int i = 0; i < temperatures.length; i++) {
            double expected = kaufmanLogZ(temperatures[i]);
            // Kaufman's closed form loses a few ulps in its products and in ln of the 2^16 counts;
            // 1e-13 relative is some 500 ulps of ln Z ~ 10-33, and far below any physical difference.
            assertEquals(expected, answer.getDouble("logPartitionFunction.values[" + i + "]"), 1e-13 * expected,
                    "T = " + temperatures[i]);
        }
    }

    @Test
    void theHeatCapacityPeakIsLocatedWhenTheGridBracketsIt() {
        JsonPath answer = server.request().contentType("application/json")
                .body(body("{\"start\": 1.5, \"stop\": 3.5, \"count\": 9}"))
                .post("/v1/spectrum")
                .then().statusCode(200).extract().jsonPath();
        double tMax = answer.getDouble("heatCapacityMaximum.temperature.value");
        double tolerance = answer.getDouble("heatCapacityMaximum.temperature.tolerance");
        // Independent check: golden-section search on C_V(T) = Var(E) / T^2 computed here from the
        // enumerated g(E); the peak is flat, so its location is known to ~sqrt(eps) relative only.
        double[] reference = goldenSectionPeak(1.5, 3.5);
        assertEquals(reference[0], tMax, tolerance + 1e-6);
        assertEquals(reference[1], answer.getDouble("heatCapacityMaximum.isochoricHeatCapacity.value"),
                1e-12 * reference[1]);
        assertEquals("k_B", answer.getString("heatCapacityMaximum.isochoricHeatCapacity.unit"));
        assertTrue(tolerance > 0 && tolerance < 1e-5);
        server.request().contentType("application/json")
                .body(body("{\"start\": 3.0, \"stop\": 5.0, \"count\": 5}"))
                .post("/v1/spectrum")
                .then().statusCode(200).body("heatCapacityMaximum", org.hamcrest.Matchers.nullValue());
    }

    /** {T_max, C_V(T_max) / k_B} by golden-section search from the enumerated density of states. */
    private static double[] goldenSectionPeak(double lo, double hi) {
        TreeMap<Integer, Long> g = densityOfStates();
        java.util.function.DoubleUnaryOperator cv = t -> {
            // Two passes: the mean energy, then the second moment about it.
            double z = 0;
            double e1 = 0;
            double ground = g.firstKey();
            for (var entry : g.entrySet()) {
                double w = entry.getValue() * Math.exp(-(entry.getKey() - ground) / t);
                z += w;
                e1 += w * entry.getKey();
            }
            double mean = e1 / z;
            double variance = 0;
            for (var entry : g.entrySet()) {
                double d = entry.getKey() - mean;
                variance += entry.getValue() * Math.exp(-(entry.getKey() - ground) / t) * d * d;
            }
            return variance / z / (t * t);
        };
        double ratio = (Math.sqrt(5) - 1) / 2;
        double a = lo;
        double b = hi;
        while (b - a > 1e-9) {
            double c = b - ratio * (b - a);
            double d = a + ratio * (b - a);
            if (cv.applyAsDouble(c) > cv.applyAsDouble(d)) {
                b = d;
            } else {
                a = c;
            }
        }
        double t = 0.5 * (a + b);
        return new double[] {t, cv.applyAsDouble(t)};
    }
}
