package org.statesum.bench;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.statesum.api.App;
import org.statesum.api.config.ServiceConfig;
import org.statesum.engine.EquationOfState;

/**
 * The quasi-harmonic job of the performance target: 15 volumes x 2 016 phonon frequencies (84 q-points x 24
 * branches) x 500 temperatures, read, validated, fitted and mapped to the answer tree, against a baseline in
 * the same run: the harmonic crystal endpoint summing the same number of (mode, temperature) terms
 * (2 016 modes x 7 500 temperatures), so the ratio is the cost of the fits and minimisations on top.
 * Run with {@code bench/quasi-harmonic.sh}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class QuasiHarmonicBenchmark {

    private static final int VOLUMES = 15;
    private static final int Q_POINTS = 84;
    private static final int ATOMS = 8;
    private static final int TEMPERATURES = 500;

    private JsonNode quasiHarmonic;
    private JsonNode crystal;
    private org.statesum.api.request.ComputeEndpoint qhaEndpoint;
    private org.statesum.api.request.ComputeEndpoint crystalEndpoint;

    @Setup
    public void setUp() {
        ObjectMapper mapper = new ObjectMapper();
        Random random = new Random(20261201);
        double[][] reference = new double[Q_POINTS][3 * ATOMS];
        for (double[] q : reference) {
            for (int b = 0; b < q.length; b++) {
                q[b] = 1 + 14 * random.nextDouble();
            }
        }
        ObjectNode body = mapper.createObjectNode();
        body.put("atomsPerFormulaUnit", ATOMS).put("volumeUnit", "A^3").put("energyUnit", "eV")
                .put("equationOfState", "vinet");
        ArrayNode volumes = body.putArray("volumes");
        ArrayNode energies = body.putArray("staticEnergies");
        ArrayNode phonons = body.putArray("phonons");
        for (int i = 0; i < VOLUMES; i++) {
            double v = 120 * (0.93 + 0.01 * i);
            volumes.add(v);
            // A Vinet crystal: E0 = -60 eV, V0 = 121 A^3, B0 = 0.75 eV/A^3 (120 GPa), B0' = 4.5.
            energies.add(EquationOfState.VINET.energy(v, new double[] {-60, 121, 0.75, 4.5}));
            double scale = Math.pow(v / 120, -1.5);
            phonons.add(mesh(mapper, reference, scale));
        }
        body.putObject("pressures").put("unit", "GPa").putArray("values").add(0);
        body.putObject("temperatures").put("start", 0).put("stop", 1500).put("count", TEMPERATURES);
        quasiHarmonic = body;
        ObjectNode c = mapper.createObjectNode();
        c.put("atomsPerFormulaUnit", ATOMS);
        c.set("vibrations", mesh(mapper, reference, 1));
        c.putObject("temperatures").put("start", 0.1).put("stop", 1500).put("count", VOLUMES * TEMPERATURES);
        crystal = c;
        qhaEndpoint = App.endpoint(ServiceConfig.defaults(), "/v1/quasi-harmonic");
        crystalEndpoint = App.endpoint(ServiceConfig.defaults(), "/v1/crystal");
    }

    private static ObjectNode mesh(ObjectMapper mapper, double[][] reference, double scale) {
        ObjectNode vib = mapper.createObjectNode().put("model", "phonons").put("frequencyUnit", "THz");
        ArrayNode qs = vib.putArray("qPoints");
        for (double[] q : reference) {
            ObjectNode point = qs.addObject().put("weight", 1);
            ArrayNode f = point.putArray("frequencies");
            for (double nu : q) {
                f.add(nu * scale);
            }
        }
        return vib;
    }

    @Benchmark
    public Object quasiHarmonic15x2016x500() {
        return qhaEndpoint.answer(quasiHarmonic);
    }

    @Benchmark
    public Object baselineCrystal2016x7500() {
        return crystalEndpoint.answer(crystal);
    }

    public static void main(String[] args) throws Exception {
        org.openjdk.jmh.Main.main(args);
    }
}
