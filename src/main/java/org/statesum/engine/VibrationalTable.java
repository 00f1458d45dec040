package org.statesum.engine;

/**
 * Harmonic vibrational thermodynamics on a temperature grid, in reduced units, for whatever amount of
 * crystal the caller chose (one atom, one formula unit): energies as E / k_B (K), entropy and heat
 * capacity in k_B. Every series carries absolute error bounds in its own unit.
 *
 * @param temperaturesKelvin the grid, K
 * @param helmholtzEnergyKelvin F / k_B, K
 * @param internalEnergyKelvin U / k_B, K (includes the zero-point energy)
 * @param entropyOverBoltzmann S / k_B
 * @param heatCapacityOverBoltzmann C_V / k_B
 * @param zeroPointEnergyKelvin E_zp / k_B, K
 * @param zeroPointEnergyBound absolute error bound of {@code zeroPointEnergyKelvin}, K
 */
public record VibrationalTable(
        double[] temperaturesKelvin,
        Series helmholtzEnergyKelvin,
        Series internalEnergyKelvin,
        Series entropyOverBoltzmann,
        Series heatCapacityOverBoltzmann,
        double zeroPointEnergyKelvin,
        double zeroPointEnergyBound) {

    /** This table times a positive amount (atoms per formula unit, say); bounds scale and gain two roundings. */
    public VibrationalTable times(double amount) {
        return new VibrationalTable(temperaturesKelvin, helmholtzEnergyKelvin.scaled(amount),
                internalEnergyKelvin.scaled(amount), entropyOverBoltzmann.scaled(amount),
                heatCapacityOverBoltzmann.scaled(amount), zeroPointEnergyKelvin * amount,
                zeroPointEnergyBound * amount + 2 * Math.ulp(zeroPointEnergyKelvin * amount));
    }

    /** The T -&gt; 0 limit into {@code out}: F = U = E_zp (with its bound), S = C_V = 0 exactly. */
    static void atZeroTemperature(double zeroPoint, double bound, double[] out) {
        out[0] = zeroPoint;
        out[1] = zeroPoint;
        out[2] = 0;
        out[3] = 0;
        out[4] = bound;
        out[5] = bound;
        out[6] = 0;
        out[7] = 0;
    }

    /** Thermodynamics at one temperature into {@code out}: F/k, U/k, S/k, C_V/k, then their four bounds. */
    @FunctionalInterface
    interface Pointwise {
        void evaluateAt(double temperatureKelvin, double[] out);
    }

    /**
     * The table of {@code f} on a grid, temperature by temperature (over the cores when {@code parallel},
     * with bit-identical results: the temperatures are independent), stopping cooperatively between
     * temperatures ({@link Cancellation}).
     */
    static VibrationalTable tabulate(double[] temperaturesKelvin, boolean parallel, Pointwise f,
            double zeroPointKelvin, double zeroPointBound) {
        int n = temperaturesKelvin.length;
        double[][] cols = new double[8][n];
        java.util.stream.IntStream range = java.util.stream.IntStream.range(0, n);
        if (parallel) {
            range = range.parallel();
        }
        Runnable stop = Cancellation.current();
        range.forEach(j -> {
            stop.run();
            double[] out = new double[8];
            f.evaluateAt(temperaturesKelvin[j], out);
            for (int q = 0; q < 8; q++) {
                cols[q][j] = out[q];
            }
        });
        return new VibrationalTable(temperaturesKelvin.clone(), new Series(cols[0], cols[4]),
                new Series(cols[1], cols[5]), new Series(cols[2], cols[6]), new Series(cols[3], cols[7]),
                zeroPointKelvin, zeroPointBound);
    }
}
