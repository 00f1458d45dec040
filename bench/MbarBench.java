import java.util.Arrays;
import java.util.Random;
import java.util.concurrent.ForkJoinPool;
import org.statesum.engine.sampling.FreeEnergyEstimate;
import org.statesum.engine.sampling.Mbar;
import org.statesum.engine.sampling.ReducedPotentials;

/**
 * MBAR cost as a multiple of one log-sum-exp pass over the same K x N matrix, in one run.
 *
 * <p>Data: K = 10 harmonic wells u_k = (kappa_k / 2)(x - c_k)^2 with N / K exact samples each
 * (seeded). Baseline: for every sample n, ln sum_k exp(-u_kn) about its maximum, on one thread (the
 * same K exponentials per sample that one MBAR pass needs). Solve: {@code Mbar.estimate}, i.e. the
 * full solve with the covariance, overlap matrix and effective sample sizes, on the common pool, and
 * again confined to a one-worker pool to show what the second core brings.
 * Both are warmed up, then timed alternately; medians are reported.
 *
 * <p>Run with {@code bench/mbar.sh} (arguments: pooled samples, default 1000000; rounds, default 7).
 */
public final class MbarBench {

    public static void main(String[] args) throws Exception {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 1_000_000;
        int rounds = args.length > 1 ? Integer.parseInt(args[1]) : 7;
        int k = 10;
        int perState = n / k;
        double[] springs = new double[k];
        double[] centres = new double[k];
        for (int s = 0; s < k; s++) {
            springs[s] = 1 + 0.3 * s;
            centres[s] = 0.35 * s;
        }
        Random random = new Random(2026);
        double[] x = new double[perState * k];
        int[] counts = new int[k];
        for (int s = 0; s < k; s++) {
            counts[s] = perState;
            for (int i = 0; i < perState; i++) {
                x[s * perState + i] = centres[s] + random.nextGaussian() / Math.sqrt(springs[s]);
            }
        }
        double[][] u = new double[k][x.length];
        for (int s = 0; s < k; s++) {
            for (int i = 0; i < x.length; i++) {
                double d = x[i] - centres[s];
                u[s][i] = 0.5 * springs[s] * d * d;
            }
        }
        ReducedPotentials data = ReducedPotentials.of(u, counts);
        double sink = 0;
        for (int w = 0; w < 3; w++) {
            sink += logSumExpPass(u);
            sink += Mbar.estimate(data).values()[1];
        }
        ForkJoinPool oneThread = new ForkJoinPool(1);
        long[] pass = new long[rounds];
        long[] solve = new long[rounds];
        long[] serial = new long[rounds];
        FreeEnergyEstimate last = null;
        for (int r = 0; r < rounds; r++) {
            long t0 = System.nanoTime();
            sink += logSumExpPass(u);
            long t1 = System.nanoTime();
            last = Mbar.estimate(data);
            long t2 = System.nanoTime();
            // Parallel streams started inside a pool's task run in that pool: one worker here.
            sink += oneThread.submit(() -> Mbar.estimate(data)).get().values()[1];
            long t3 = System.nanoTime();
            pass[r] = t1 - t0;
            solve[r] = t2 - t1;
            serial[r] = t3 - t2;
        }
        oneThread.shutdown();
        double passMs = median(pass) / 1e6;
        double solveMs = median(solve) / 1e6;
        System.out.printf("K = %d, N = %d, processors = %d, rounds = %d%n", k, x.length,
                Runtime.getRuntime().availableProcessors(), rounds);
        System.out.printf("log-sum-exp pass (1 thread): median %.1f ms%n", passMs);
        System.out.printf("MBAR solve with uncertainties: median %.1f ms%n", solveMs);
        double serialMs = median(serial) / 1e6;
        System.out.printf("MBAR solve on one thread: median %.1f ms%n", serialMs);
        System.out.printf("ratio solve / pass: %.1f (target: at most 30); one-thread solve / pass: %.1f%n",
                solveMs / passMs, serialMs / passMs);
        System.out.println("precision: " + last.precision());
        System.out.println("f_9 - f_0 = " + last.values()[k - 1] + " +/- " + last.uncertainties()[k - 1]
                + " (analytic " + 0.5 * Math.log(springs[k - 1] / springs[0]) + ")");
        System.out.println("(checksum " + sink + ")");
    }

    /** sum_n ln sum_k exp(-u_kn), each inner sum about its largest term. */
    static double logSumExpPass(double[][] u) {
        int k = u.length;
        int n = u[0].length;
        double total = 0;
        double[] a = new double[k];
        for (int i = 0; i < n; i++) {
            double max = Double.NEGATIVE_INFINITY;
            for (int s = 0; s < k; s++) {
                a[s] = -u[s][i];
                max = Math.max(max, a[s]);
            }
            double sum = 0;
            for (int s = 0; s < k; s++) {
                sum += Math.exp(a[s] - max);
            }
            total += max + Math.log(sum);
        }
        return total;
    }

    private static double median(long[] values) {
        long[] sorted = values.clone();
        Arrays.sort(sorted);
        return sorted[sorted.length / 2];
    }
}
