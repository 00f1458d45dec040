package org.statesum.engine;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.statesum.testing.BoundStatistics;
import org.statesum.testing.ExactCanonical;
import org.statesum.testing.ExactMath;
import org.statesum.testing.RandomLevelSets;

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
        BoundStatistics.assertAllHonest(stats);
    }

    @Test
    void compositeSystemsOfManyParticlesKeepTheirBounds() {
        SplittableRandom random = new SplittableRandom(1023);
        Map<String, BoundStatistics> stats = new LinkedHashMap<>();
        for (String q : List.of("lnZ_N", "F_N", "U_N", "S_N", "Cv_N")) {
            stats.put(q, new BoundStatistics(q));
        }
        double[] counts = {1, 2, 10, 1e23, 1e30};
        MathContext mc = ExactMath.MC;
        for (int c = 0; c < 400; c++) {
            RandomLevelSets.Case k = RandomLevelSets.next(random);
            double count = random.nextInt(3) == 0 ? Math.rint(Math.pow(10, random.nextDouble(0, 30)))
                    : counts[random.nextInt(counts.length)];
            ParticleStatistics statistics = random.nextBoolean() ? ParticleStatistics.INDISTINGUISHABLE
                    : ParticleStatistics.DISTINGUISHABLE;
            boolean perParticle = random.nextBoolean();
            CanonicalTable one = CanonicalEnsemble.evaluate(k.levelSet(), k.temperatures(), false);
            CanonicalTable many = CompositeSystem.of(one, count, statistics, perParticle);
            ExactCanonical exact = k.logarithmic()
                    ? ExactCanonical.ofLogDegeneracies(k.energiesKelvin(), k.weights())
                    : ExactCanonical.ofDegeneracies(k.energiesKelvin(), k.weights());
            BigDecimal n = new BigDecimal(count);
            BigDecimal lnFact = statistics == ParticleStatistics.INDISTINGUISHABLE ? ExactMath.logFactorial(count)
                    : BigDecimal.ZERO;
            // Per unit of the basis: N (total) or 1 (per particle); ln N! enters divided by N per particle.
            BigDecimal scale = perParticle ? BigDecimal.ONE : n;
            BigDecimal corr = perParticle ? lnFact.divide(n, mc) : lnFact;
            double basis = perParticle ? 1 : count;
            for (int j = 0; j < k.temperatures().length; j++) {
                double t = k.temperatures()[j];
                BigDecimal bt = new BigDecimal(t);
                ExactCanonical.Point p = exact.at(t);
                String at = k + " @T=" + t + " N=" + count + " " + statistics + (perParticle ? " per particle" : "");
                add(stats.get("lnZ_N"), many.logPartitionFunction(), j, p.lnZ().multiply(scale, mc).subtract(corr, mc),
                        basis, at);
                add(stats.get("F_N"), many.helmholtzEnergyKelvin(), j,
                        p.helmholtzKelvin().multiply(scale, mc).add(bt.multiply(corr, mc), mc), basis * t, at);
                add(stats.get("U_N"), many.internalEnergyKelvin(), j, p.internalKelvin().multiply(scale, mc),
                        basis * t, at);
                add(stats.get("S_N"), many.entropyOverBoltzmann(), j, p.entropy().multiply(scale, mc).subtract(corr, mc),
                        basis, at);
                add(stats.get("Cv_N"), many.heatCapacityOverBoltzmann(), j, p.heatCapacity().multiply(scale, mc),
                        basis, at);
            }
        }
        BoundStatistics.assertAllHonest(stats);
    }

    private static void add(BoundStatistics s, Series series, int j, BigDecimal exact, double scale, String at) {
        s.add(series.values()[j], series.errorBounds()[j], exact, scale, at);
    }
}
