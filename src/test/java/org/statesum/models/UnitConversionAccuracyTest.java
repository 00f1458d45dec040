package org.statesum.models;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.statesum.engine.LevelSet;
import org.statesum.engine.Series;
import org.statesum.testing.BoundStatistics;
import org.statesum.testing.ExactCanonical;
import org.statesum.testing.ExactMath;
import org.statesum.testing.RandomLevelSets;
import org.statesum.units.EnergyUnit;

/**
 * The path the API takes: energies in a wire unit, converted to J and then to E / k_B in doubles, the
 * level set declared to carry that conversion's relative error, results in SI. The reference converts
 * the same double inputs exactly with the defining constants (CODATA 2018 exact values of k_B, h, c, e
 * and N_A; the hartree as the CODATA 2018 recommended value) and evaluates in 50 digits, so every
 * SI bound must cover the conversion as well as the summation.
 */
class UnitConversionAccuracyTest {

    private static final MathContext MC = ExactMath.MC;
    private static final BigDecimal K_B = new BigDecimal("1.380649e-23");
    private static final BigDecimal N_A = new BigDecimal("6.02214076e23");
    private static final BigDecimal E_CHARGE = new BigDecimal("1.602176634e-19");

    private static Map<EnergyUnit, BigDecimal> exactJoulesPerUnit() {
        Map<EnergyUnit, BigDecimal> m = new EnumMap<>(EnergyUnit.class);
        m.put(EnergyUnit.JOULE, BigDecimal.ONE);
        m.put(EnergyUnit.KILOJOULE_PER_MOLE, new BigDecimal(1000).divide(N_A, MC));
        m.put(EnergyUnit.KILOCALORIE_PER_MOLE, new BigDecimal(4184).divide(N_A, MC));
        m.put(EnergyUnit.ELECTRONVOLT, E_CHARGE);
        m.put(EnergyUnit.MILLIELECTRONVOLT, E_CHARGE.movePointLeft(3));
        m.put(EnergyUnit.HARTREE, new BigDecimal("4.3597447222071e-18"));
        m.put(EnergyUnit.WAVENUMBER, new BigDecimal("6.62607015e-34").multiply(new BigDecimal("299792458"))
                .multiply(BigDecimal.valueOf(100)));
        m.put(EnergyUnit.KELVIN, K_B);
        return m;
    }

    @Test
    void siResultsFromConvertedEnergiesStayWithinTheirBounds() {
        Map<EnergyUnit, BigDecimal> exactFactor = exactJoulesPerUnit();
        EnergyUnit[] units = EnergyUnit.values();
        SplittableRandom random = new SplittableRandom(4);
        Map<String, BoundStatistics> stats = new LinkedHashMap<>();
        for (String q : List.of("lnZ", "F [J]", "U [J]", "S [J/K]", "Cv [J/K]")) {
            stats.put(q, new BoundStatistics(q));
        }
        for (int c = 0; c < 300; c++) {
            RandomLevelSets.Case k = RandomLevelSets.next(random);
            EnergyUnit unit = units[random.nextInt(units.length)];
            int n = k.energiesKelvin().length;
            double[] given = new double[n];
            BigDecimal[] exactKelvin = new BigDecimal[n];
            BigDecimal[] logG = new BigDecimal[n];
            double[] joules = new double[n];
            for (int i = 0; i < n; i++) {
                given[i] = unit.fromJoules(k.energiesKelvin()[i] * 1.380649e-23);
                joules[i] = unit.toJoules(given[i]);
                exactKelvin[i] = new BigDecimal(given[i]).multiply(exactFactor.get(unit), MC).divide(K_B, MC);
                logG[i] = k.logarithmic() ? new BigDecimal(k.weights()[i]) : ExactMath.log(k.weights()[i]);
            }
            double[] kelvin = LevelSetModel.toKelvin(joules);
            LevelSet set = (k.logarithmic() ? LevelSet.ofLogDegeneracies(kelvin, k.weights())
                    : LevelSet.ofDegeneracies(kelvin, k.weights()))
                    .withEnergyRelativeError(2 * EnergyUnit.conversionRelativeError());
            ThermoResult result = LevelSetModel.evaluate(set, k.temperatures(), Particles.single(), false);
            ExactCanonical exact = ExactCanonical.of(exactKelvin, logG);
            for (int j = 0; j < k.temperatures().length; j++) {
                double t = k.temperatures()[j];
                ExactCanonical.Point p = exact.at(t);
                String at = unit.symbol() + " " + k + " @T=" + t;
                double kt = t * 1.380649e-23;
                add(stats.get("lnZ"), result, Quantity.LOG_PARTITION_FUNCTION, j, p.lnZ(), 1, at);
                add(stats.get("F [J]"), result, Quantity.HELMHOLTZ_ENERGY, j, p.helmholtzKelvin().multiply(K_B, MC), kt, at);
                add(stats.get("U [J]"), result, Quantity.INTERNAL_ENERGY, j, p.internalKelvin().multiply(K_B, MC), kt, at);
                add(stats.get("S [J/K]"), result, Quantity.ENTROPY, j, p.entropy().multiply(K_B, MC), 1.380649e-23, at);
                add(stats.get("Cv [J/K]"), result, Quantity.ISOCHORIC_HEAT_CAPACITY, j,
                        p.heatCapacity().multiply(K_B, MC), 1.380649e-23, at);
            }
        }
        // Accuracy is not asserted here: a conversion rounds each energy by up to 4 u relative, so with
        // a large common offset (total energies in hartree, say) the exponent differences themselves
        // are uncertain; the bounds must say so, and they are checked.
        BoundStatistics.assertAllHonest(stats, false);
    }

    private static void add(BoundStatistics s, ThermoResult result, Quantity q, int j, BigDecimal exact, double scale,
            String at) {
        Series series = result.series().get(q);
        s.add(series.values()[j], series.errorBounds()[j], exact, scale, at);
    }
}
