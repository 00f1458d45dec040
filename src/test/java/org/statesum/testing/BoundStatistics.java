package org.statesum.testing;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Tallies, for one quantity, the true error of each value against the extended-precision reference
 * and its reported bound: violations (error > bound), tightness ratios bound / max(error, ulp(value)),
 * and values less accurate than 1e-12 relative or 1e-13 of the quantity's natural scale.
 */
public final class BoundStatistics {

    /** Relative accuracy expected of every value (about 4500 ulps: room for n-term sums and cancellation). */
    public static final double RELATIVE_ACCURACY = 1e-12;
    /** Absolute accuracy, in the quantity's natural scale (kT for energies, k for S and C_V, 1 for ln Z). */
    public static final double SCALE_ACCURACY = 1e-13;
    /** Relative precision of the extended-precision reference (50 digits, 45 guaranteed). */
    static final double REFERENCE_PRECISION = 1e-45;

    public final String name;
    private final List<Double> ratios = new ArrayList<>();
    public final List<String> violations = new ArrayList<>();
    public final List<String> inaccurate = new ArrayList<>();
    private double worstRatio;
    /** Largest true error / bound seen: how close any bound came to being exceeded. */
    private double worstUse;
    public String worst = "";

    public BoundStatistics(String name) {
        this.name = name;
    }

    public void add(double value, double bound, BigDecimal exact, double scale, Object context) {
        double err = new BigDecimal(value).subtract(exact).abs().doubleValue();
        // The reference itself is good to 45 digits or more; it may not be blamed on the engine.
        if (!(err <= bound + REFERENCE_PRECISION * exact.abs().doubleValue())) {
            if (violations.size() < 20) {
                violations.add(name + ": value " + value + " exact " + exact.doubleValue() + " err " + err
                        + " bound " + bound + " at " + context);
            } else {
                violations.add("");
            }
        }
        if (bound > 0) {
            worstUse = Math.max(worstUse, err / bound);
            if (Boolean.getBoolean("statesum.dump") && err / bound > 0.7) {
                System.out.println("CLOSE " + name + " v=" + value + " exact=" + exact.doubleValue() + " err=" + err
                        + " bound=" + bound + " " + String.valueOf(context).substring(0, Math.min(300, String.valueOf(context).length())));
            }
        }
        double floor = Math.max(err, Math.ulp(exact.doubleValue()));
        if (floor > 0) {
            ratios.add(bound / floor);
            if (Boolean.getBoolean("statesum.dump") && bound / floor > 1e6) {
                System.out.println("LOOSE " + name + " v=" + value + " exact=" + exact.doubleValue() + " err=" + err
                        + " bound=" + bound + " " + String.valueOf(context).substring(0, Math.min(400, String.valueOf(context).length())));
            }
            if (bound / floor > worstRatio) {
                worstRatio = bound / floor;
                worst = name + ": value " + value + " exact " + exact.doubleValue() + " err " + err + " bound " + bound
                        + " at " + context;
            }
        }
        if (!(err <= RELATIVE_ACCURACY * Math.abs(exact.doubleValue()) || err <= SCALE_ACCURACY * scale)) {
            if (inaccurate.size() < 20) {
                inaccurate.add(name + ": value " + value + " exact " + exact.doubleValue() + " err " + err
                        + " scale " + scale + " at " + context);
            } else {
                inaccurate.add("");
            }
        }
    }

    /** Ratio at quantile q in [0, 1]. */
    public double quantile(double q) {
        double[] sorted = ratios.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        return sorted.length == 0 ? Double.NaN : sorted[(int) Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
    }

    public int count() {
        return ratios.size();
    }

    public String summary() {
        return String.format("%-16s n=%6d  bound/max(err,ulp): median %.3g  p90 %.3g  max %.3g  max err/bound %.3g"
                + "  violations %d  inaccurate %d", name, count(), quantile(0.5), quantile(0.9), quantile(1.0), worstUse,
                violations.size(), inaccurate.size());
    }

    public static String firstFew(List<String> lines) {
        return String.join("\n", lines.subList(0, Math.min(5, lines.size()))) + (lines.size() > 5 ? "\n..." : "");
    }

    /** Prints every summary and fails naming any exceeded bound, inaccurate value or loose quantity. */
    public static void assertAllHonest(Map<String, BoundStatistics> stats) {
        assertAllHonest(stats, true);
    }

    /**
     * As {@link #assertAllHonest(Map)}; without the accuracy check when the inputs themselves carry
     * declared errors (then accuracy is limited by the inputs, and only the bounds are checked).
     */
    public static void assertAllHonest(Map<String, BoundStatistics> stats, boolean checkAccuracy) {
        StringBuilder report = new StringBuilder();
        stats.values().forEach(s -> report.append(s.summary()).append('\n'));
        if (Boolean.getBoolean("statesum.verbose")) {
            stats.values().forEach(s -> report.append(s.worst).append('\n'));
        }
        System.out.println(report);
        StringBuilder failures = new StringBuilder();
        for (BoundStatistics s : stats.values()) {
            if (!s.violations.isEmpty()) {
                failures.append("bound exceeded\n").append(BoundStatistics.firstFew(s.violations)).append('\n');
            }
            if (checkAccuracy && !s.inaccurate.isEmpty()) {
                failures.append("inaccurate\n").append(BoundStatistics.firstFew(s.inaccurate)).append('\n');
            }
            // At the 90th percentile a bound is within 1e4 of the larger of the true error and one
            // ulp of the value: honest bounds that are not uselessly loose (the project's standard).
            if (!(s.quantile(0.9) <= 1e4)) {
                failures.append("too loose: ").append(s.summary()).append('\n');
            }
        }
        assertTrue(failures.length() == 0, failures::toString);
    }
}
