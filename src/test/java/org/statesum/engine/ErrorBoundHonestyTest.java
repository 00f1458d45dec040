package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.statesum.testing.ExactCanonical;

/**
 * Every error bound the engine reports is compared with the true error of its value against a
 * 50-digit evaluation from the same double inputs ({@link ExactCanonical}), over seeded random level
 * sets that reach the hard corners ({@link RandomLevelSets}).
 */
class ErrorBoundHonestyTest {

    private static final int CASES = 2000;

    @Test
    void everyBoundHoldsIsTightAndEveryValueIsAccurate() {
        SplittableRandom random = new SplittableRandom(20261201);
        Map<String, BoundStatistics> stats = new LinkedHashMap<>();
        for (String q : List.of("lnZ", "F", "U", "S", "Cv", "population")) {
            stats.put(q, new BoundStatistics(q));
        }
        for (int c = 0; c < CASES; c++) {
            RandomLevelSets.Case k = RandomLevelSets.next(random);
            CanonicalTable table = CanonicalEnsemble.evaluate(k.levelSet(), k.temperatures(), true);
            ExactCanonical exact = k.logarithmic()
                    ? ExactCanonical.ofLogDegeneracies(k.energiesKelvin(), k.weights())
                    : ExactCanonical.ofDegeneracies(k.energiesKelvin(), k.weights());
            for (int j = 0; j < k.temperatures().length; j++) {
                double t = k.temperatures()[j];
                ExactCanonical.Point p = exact.at(t);
                String at = k + " @T=" + t;
                add(stats.get("lnZ"), table.logPartitionFunction(), j, p.lnZ(), 1, at);
                add(stats.get("F"), table.helmholtzEnergyKelvin(), j, p.helmholtzKelvin(), t, at);
                add(stats.get("U"), table.internalEnergyKelvin(), j, p.internalKelvin(), t, at);
                add(stats.get("S"), table.entropyOverBoltzmann(), j, p.entropy(), 1, at);
                add(stats.get("Cv"), table.heatCapacityOverBoltzmann(), j, p.heatCapacity(), 1, at);
                for (int i = 0; i < k.energiesKelvin().length; i++) {
                    stats.get("population").add(table.populations()[j][i], table.populationBounds()[j][i],
                            p.populations()[i], 1, at + " level " + i);
                }
            }
        }
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
            if (!s.inaccurate.isEmpty()) {
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

    private static void add(BoundStatistics s, Series series, int j, BigDecimal exact, double scale, String at) {
        s.add(series.values()[j], series.errorBounds()[j], exact, scale, at);
    }
}
