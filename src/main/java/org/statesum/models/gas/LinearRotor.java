package org.statesum.models.gas;

import java.util.Map;
import org.statesum.engine.CanonicalTable;
import org.statesum.engine.DomainException;
import org.statesum.engine.LinearRotorSum;
import org.statesum.engine.Series;

/**
 * A linear rigid rotor, E_J = k_B theta J (J + 1), g_J = 2J + 1.
 * <ul>
 *   <li>High-temperature form (default): q = T / (sigma theta), U = k_B T, C_V = k_B,
 *       S / k_B = ln q + 1; error of order theta / (3T) in ln q (McQuarrie, Statistical Mechanics,
 *       1976, eq. 6-40), 0.3 % for N2 at 298 K, far worse for H2.</li>
 *   <li>Exact level sum ({@link LinearRotorSum}) with a proven tail bound; without nuclear spin every
 *       J has weight 1 / sigma (the symmetric average); with {@link NuclearSpin} the weights and the
 *       modification of that record.</li>
 * </ul>
 *
 * @param thetaKelvin h c B / k_B, K, positive
 * @param symmetryNumber sigma, 1 or 2
 * @param levelSum whether to sum the levels exactly
 * @param nuclearSpin nuclear-spin statistics for a homonuclear molecule (level sum only), or null
 */
public record LinearRotor(double thetaKelvin, int symmetryNumber, boolean levelSum, NuclearSpin nuclearSpin)
        implements Rotation {

    @Override
    public GasPart evaluate(double[] temperaturesKelvin) {
        if (!levelSum) {
            return highTemperature(temperaturesKelvin);
        }
        if (nuclearSpin == null) {
            return fromTable(LinearRotorSum.evaluate(thetaKelvin, 1.0 / symmetryNumber, 1.0 / symmetryNumber,
                    temperaturesKelvin).table());
        }
        double even = nuclearSpin.evenWeight();
        double odd = nuclearSpin.oddWeight();
        if (nuclearSpin.equilibrium()) {
            return fromTable(LinearRotorSum.evaluate(thetaKelvin, even, odd, temperaturesKelvin).table());
        }
        double x = nuclearSpin.oddFraction();
        if ((x > 0 && odd == 0) || (x < 1 && even == 0)) {
            throw new DomainException("MODIFICATION_NOT_ALLOWED", "/rotation/nuclearSpin/oddFraction",
                    "with this nuclear spin only " + (odd == 0 ? "even" : "odd") + " J levels exist");
        }
        GasPart mixture = GasPart.zero(temperaturesKelvin.length);
        if (x < 1) {
            addSpecies(mixture, LinearRotorSum.evaluate(thetaKelvin, even, 0, temperaturesKelvin).table(), 1 - x);
        }
        if (x > 0) {
            addSpecies(mixture, LinearRotorSum.evaluate(thetaKelvin, 0, odd, temperaturesKelvin).table(), x);
        }
        return mixture;
    }

    /**
     * How many levels the exact sum visits over the grid (0 for the high-temperature form), for
     * compute budgets.
     *
     * @throws org.statesum.engine.DomainException ROTOR_SUM_TOO_LONG where one temperature needs too many
     */
    public long levelCount(double[] temperaturesKelvin) {
        long count = 0;
        if (levelSum) {
            for (double t : temperaturesKelvin) {
                count += 2L * (highestLevel(t) + 1);
            }
        }
        return count;
    }

    private int highestLevel(double t) {
        double even = nuclearSpin == null ? 1.0 / symmetryNumber : nuclearSpin.evenWeight();
        double odd = nuclearSpin == null ? 1.0 / symmetryNumber : nuclearSpin.oddWeight();
        return LinearRotorSum.highestLevel(thetaKelvin, even, odd, t);
    }

    private GasPart highTemperature(double[] temperaturesKelvin) {
        GasPart part = GasPart.zero(temperaturesKelvin.length);
        for (int j = 0; j < temperaturesKelvin.length; j++) {
            double t = temperaturesKelvin[j];
            double logQ = Math.log(t) - Math.log(symmetryNumber * thetaKelvin);
            part.entropy().values()[j] = logQ + 1;
            part.entropy().errorBounds()[j] = 8 * GasPart.U * (Math.abs(Math.log(t))
                    + Math.abs(Math.log(symmetryNumber * thetaKelvin)) + 1);
            part.internalEnergyKelvin().values()[j] = t;
            part.heatCapacity().values()[j] = 1;
        }
        return part;
    }

    private static GasPart fromTable(CanonicalTable table) {
        return new GasPart(table.internalEnergyKelvin(), table.entropyOverBoltzmann(),
                table.heatCapacityOverBoltzmann());
    }

    /** Adds x_s U_s, x_s (S_s - ln x_s) and x_s C_V,s (ideal mixing of the frozen modifications). */
    private static void addSpecies(GasPart mixture, CanonicalTable table, double fraction) {
        double logX = Math.log(fraction);
        for (int j = 0; j < table.temperaturesKelvin().length; j++) {
            add(mixture.internalEnergyKelvin(), table.internalEnergyKelvin(), j, fraction, 0);
            add(mixture.entropy(), table.entropyOverBoltzmann(), j, fraction, -logX);
            add(mixture.heatCapacity(), table.heatCapacityOverBoltzmann(), j, fraction, 0);
        }
    }

    private static void add(Series into, Series from, int j, double fraction, double offset) {
        double term = fraction * (from.values()[j] + offset);
        into.values()[j] += term;
        into.errorBounds()[j] += fraction * from.errorBounds()[j]
                + 3 * GasPart.U * (Math.abs(term) + Math.abs(into.values()[j]) + fraction * Math.abs(offset));
    }

    @Override
    public void describe(Map<String, Object> precision, double[] temperaturesKelvin) {
        if (!levelSum) {
            precision.put("rotation", "linear rigid rotor, high-temperature form T / (sigma theta), symmetry number "
                    + symmetryNumber);
            return;
        }
        String weights = nuclearSpin == null ? "every J weighted 1/" + symmetryNumber
                : "nuclear spin I = " + nuclearSpin.spin() + ", even J weight " + nuclearSpin.evenWeight()
                        + ", odd J weight " + nuclearSpin.oddWeight() + (nuclearSpin.equilibrium()
                                ? ", equilibrium modification" : ", frozen mixture, odd-J fraction "
                                        + nuclearSpin.oddFraction());
        precision.put("rotation", "linear rigid rotor, exact level sum to J = rotationHighestLevel; the neglected tail, bounded by the integral test, is below rotationTruncationBound of the kept sum and is included in errorBounds; " + weights);
        int highest = 0;
        for (double t : temperaturesKelvin) {
            highest = Math.max(highest, highestLevel(t));
        }
        precision.put("rotationHighestLevel", highest);
        precision.put("rotationTruncationBound", LinearRotorSum.TAIL_TARGET);
    }
}
