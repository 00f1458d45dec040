package org.statesum.bench;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.statesum.engine.CanonicalEnsemble;
import org.statesum.engine.CanonicalTable;
import org.statesum.engine.LevelSet;

/**
 * Spectrum throughput on one core, in (level, temperature) pairs per second, beside the cheapest
 * loop that touches the same pairs: one {@code Math.exp} per pair, summed. Both benchmarks see the
 * same levels and temperatures, so their scores divide into the ratio that {@code bench/jmh.sh}
 * prints (spectrum / bare exp; 1.0 would mean ln Z, U, S, C_V and all five error bounds cost no more
 * than the exponentials alone).
 *
 * <p>The forked JVM sees one processor ({@code -XX:ActiveProcessorCount=1}), so
 * {@link CanonicalEnsemble#evaluate} runs its per-core kernel on the whole grid instead of splitting
 * the temperatures over the cores: the score is a per-core figure.
 *
 * <p>The data: 100 000 levels at E / k_B uniform in [0, 20 000) K in random order (the lowest not
 * first), integer degeneracies 1 to 25, and 100 temperatures evenly from 100 K to 3000 K, so that
 * exp(-E / k_B T) stays in the normal range of doubles (the regime where every exponential costs its
 * full price) for most pairs.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 4, time = 2)
@Measurement(iterations = 6, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-XX:ActiveProcessorCount=1", "-Xms1g", "-Xmx1g"})
public class SpectrumThroughputBenchmark {

    static final int LEVELS = 100_000;
    static final int TEMPERATURES = 100;
    static final int PAIRS = LEVELS * TEMPERATURES;

    private double[] energiesKelvin;
    private double[] logDegeneracies;
    private double[] temperaturesKelvin;
    private LevelSet levels;

    @Setup
    public void prepare() {
        SplittableRandom random = new SplittableRandom(20_261_201L);
        energiesKelvin = new double[LEVELS];
        double[] degeneracies = new double[LEVELS];
        logDegeneracies = new double[LEVELS];
        for (int i = 0; i < LEVELS; i++) {
            energiesKelvin[i] = 20_000.0 * random.nextDouble();
            degeneracies[i] = 1 + random.nextInt(25);
            logDegeneracies[i] = Math.log(degeneracies[i]);
        }
        temperaturesKelvin = new double[TEMPERATURES];
        for (int j = 0; j < TEMPERATURES; j++) {
            temperaturesKelvin[j] = 100.0 + 2900.0 * j / (TEMPERATURES - 1);
        }
        levels = LevelSet.ofDegeneracies(energiesKelvin, degeneracies);
    }

    /** The whole canonical table: ln Z, F, U, S, C_V with their error bounds. */
    @Benchmark
    @OperationsPerInvocation(PAIRS)
    public CanonicalTable spectrum() {
        return CanonicalEnsemble.evaluate(levels, temperaturesKelvin, false);
    }

    /** The baseline: sum_j sum_i exp(ln g_i - E_i / T_j), one exponential per pair and nothing else. */
    @Benchmark
    @OperationsPerInvocation(PAIRS)
    public double bareExp() {
        final double[] e = energiesKelvin;
        final double[] lg = logDegeneracies;
        double total = 0;
        for (double t : temperaturesKelvin) {
            double beta = 1.0 / t;
            double sum = 0;
            for (int i = 0; i < LEVELS; i++) {
                sum += Math.exp(lg[i] - e[i] * beta);
            }
            total += sum;
        }
        return total;
    }
}
