package org.statesum.engine;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Tallies, for one quantity, the true error of each value against the extended-precision reference
 * and its reported bound: violations (error > bound), tightness ratios bound / max(error, ulp(value)),
 * and values less accurate than 1e-12 relative or 1e-13 of the quantity's natural scale.
 */
final class BoundStatistics {

    /** Relative accuracy expected of every value (about 4500 ulps: room for n-term sums and cancellation). */
    static final double RELATIVE_ACCURACY = 1e-12;
    /** Absolute accuracy, in the quantity's natural scale (kT for energies, k for S and C_V, 1 for ln Z). */
    static final double SCALE_ACCURACY = 1e-13;

    final String name;
    private final List<Double> ratios = new ArrayList<>();
    final List<String> violations = new ArrayList<>();
    final List<String> inaccurate = new ArrayList<>();
    private double worstRatio;
    String worst = "";

    BoundStatistics(String name) {
        this.name = name;
    }

    void add(double value, double bound, BigDecimal exact, double scale, Object context) {
        double err = new BigDecimal(value).subtract(exact).abs().doubleValue();
        if (!(err <= bound)) {
            if (violations.size() < 20) {
                violations.add(name + ": value " + value + " exact " + exact.doubleValue() + " err " + err
                        + " bound " + bound + " at " + context);
            } else {
                violations.add("");
            }
        }
        double floor = Math.max(err, Math.ulp(exact.doubleValue()));
        if (floor > 0) {
            ratios.add(bound / floor);
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
    double quantile(double q) {
        double[] sorted = ratios.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        return sorted.length == 0 ? Double.NaN : sorted[(int) Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
    }

    int count() {
        return ratios.size();
    }

    String summary() {
        return String.format("%-22s n=%6d  bound/max(err,ulp): median %.3g  p90 %.3g  max %.3g  violations %d  inaccurate %d",
                name, count(), quantile(0.5), quantile(0.9), quantile(1.0), violations.size(), inaccurate.size());
    }

    static String firstFew(List<String> lines) {
        return String.join("\n", lines.subList(0, Math.min(5, lines.size()))) + (lines.size() > 5 ? "\n..." : "")
                + Arrays.toString(new int[0]).substring(2);
    }
}
