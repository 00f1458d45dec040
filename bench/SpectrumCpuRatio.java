import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.statesum.engine.CanonicalEnsemble;
import org.statesum.engine.LevelSet;

/**
 * The JMH comparison of {@code SpectrumThroughputBenchmark} (same data: 1e5 levels, 100 temperatures),
 * timed by thread CPU time and alternating the two at every call, so that neither the time other
 * processes take from a shared machine nor a change of its load during the run enters the ratio.
 * Run with one visible processor (bench/jmh.sh does) so that the spectrum stays on one core.
 *
 * <p>Usage: {@code java -XX:ActiveProcessorCount=1 -cp target/classes bench/SpectrumCpuRatio.java [calls]}
 */
public final class SpectrumCpuRatio {

    public static void main(String[] args) {
        int calls = args.length > 0 ? Integer.parseInt(args[0]) : 31;
        int levels = 100_000;
        int temperatures = 100;
        SplittableRandom random = new SplittableRandom(20_261_201L);
        double[] energies = new double[levels];
        double[] degeneracies = new double[levels];
        double[] logDegeneracies = new double[levels];
        for (int i = 0; i < levels; i++) {
            energies[i] = 20_000.0 * random.nextDouble();
            degeneracies[i] = 1 + random.nextInt(25);
            logDegeneracies[i] = Math.log(degeneracies[i]);
        }
        double[] grid = new double[temperatures];
        for (int j = 0; j < temperatures; j++) {
            grid[j] = 100.0 + 2900.0 * j / (temperatures - 1);
        }
        LevelSet set = LevelSet.ofDegeneracies(energies, degeneracies);
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        double pairs = (double) levels * temperatures;
        double[] spectrum = new double[calls];
        double[] bare = new double[calls];
        double[] ratio = new double[calls];
        double sink = 0;
        for (int call = -10; call < calls; call++) {
            long t0 = threads.getCurrentThreadCpuTime();
            sink += CanonicalEnsemble.evaluate(set, grid, false).logPartitionFunction().values()[0];
            long t1 = threads.getCurrentThreadCpuTime();
            sink += bareExp(logDegeneracies, energies, grid);
            long t2 = threads.getCurrentThreadCpuTime();
            if (call >= 0) {
                spectrum[call] = pairs / ((t1 - t0) * 1e-9);
                bare[call] = pairs / ((t2 - t1) * 1e-9);
                ratio[call] = spectrum[call] / bare[call];
            }
        }
        Arrays.sort(spectrum);
        Arrays.sort(bare);
        Arrays.sort(ratio);
        System.out.printf("thread CPU time, %d alternating calls (medians): spectrum %.3e pairs/s, bare exp %.3e pairs/s%n",
                calls, spectrum[calls / 2], bare[calls / 2]);
        System.out.printf("CPU-time ratio spectrum / bare exp = %.3f (quartiles %.3f to %.3f)%s%n", ratio[calls / 2],
                ratio[calls / 4], ratio[3 * calls / 4], sink == 0 ? " " : "");
    }

    /** The baseline in a method of its own, compiled as JMH compiles it (not by on-stack replacement). */
    private static double bareExp(double[] logDegeneracies, double[] energies, double[] grid) {
        double total = 0;
        for (double t : grid) {
            double beta = 1.0 / t;
            double sum = 0;
            for (int i = 0; i < energies.length; i++) {
                sum += Math.exp(logDegeneracies[i] - energies[i] * beta);
            }
            total += sum;
        }
        return total;
    }
}
