package org.statesum.models.solid;

import org.statesum.engine.DebyeSolid;
import org.statesum.engine.HarmonicModes;
import org.statesum.engine.VibrationalTable;

/**
 * The harmonic vibrations of one formula unit, in reduced units (theta = h nu / k_B in K): either a
 * Debye solid (one Debye temperature for every atom) or a set of weighted modes (Einstein, a q-point
 * mesh, or quadrature nodes over a density of states). Immutable.
 */
public sealed interface Vibrations permits Vibrations.Debye, Vibrations.Modes {

    /** Thermodynamics of one formula unit on a grid (K): energies / k_B in K, entropies in k_B. */
    VibrationalTable evaluate(double[] temperaturesKelvin);

    /**
     * One temperature into {@code out}: F/k, U/k, S/k, C_V/k then their four bounds, per formula unit.
     * The quasi-harmonic loop calls this for every (volume, temperature).
     */
    void evaluateAt(double temperatureKelvin, double[] out);

    /** The same vibrations with every frequency times {@code factor} (&gt; 0): a Grueneisen rescaling. */
    Vibrations scaled(double factor);

    /** Number of modes summed per temperature (for budgets and the precision block). */
    int modeCount();

    /** A Debye solid of {@code atoms} atoms per formula unit. */
    record Debye(double thetaKelvin, double thetaRelativeError, int atoms) implements Vibrations {

        @Override
        public VibrationalTable evaluate(double[] temperaturesKelvin) {
            return DebyeSolid.perAtom(thetaKelvin, thetaRelativeError, temperaturesKelvin).times(atoms);
        }

        @Override
        public void evaluateAt(double temperatureKelvin, double[] out) {
            VibrationalTable t = evaluate(new double[] {temperatureKelvin});
            out[0] = t.helmholtzEnergyKelvin().values()[0];
            out[1] = t.internalEnergyKelvin().values()[0];
            out[2] = t.entropyOverBoltzmann().values()[0];
            out[3] = t.heatCapacityOverBoltzmann().values()[0];
            out[4] = t.helmholtzEnergyKelvin().errorBounds()[0];
            out[5] = t.internalEnergyKelvin().errorBounds()[0];
            out[6] = t.entropyOverBoltzmann().errorBounds()[0];
            out[7] = t.heatCapacityOverBoltzmann().errorBounds()[0];
        }

        @Override
        public Vibrations scaled(double factor) {
            return new Debye(thetaKelvin * factor, thetaRelativeError + 0x1.0p-53, atoms);
        }

        @Override
        public int modeCount() {
            return 1;
        }
    }

    /**
     * Weighted modes. With {@code coarse} non-null (a density of states), the answer is the quadrature on
     * the refined nodes and the difference from the coarse nodes, as a Richardson estimate
     * |fine - coarse| / 3 doubled, is added to every bound.
     */
    record Modes(HarmonicModes fine, HarmonicModes coarse) implements Vibrations {

        @Override
        public VibrationalTable evaluate(double[] temperaturesKelvin) {
            if (coarse == null) {
                return fine.evaluate(temperaturesKelvin);
            }
            int n = temperaturesKelvin.length;
            double[][] cols = new double[8][n];
            double[] out = new double[8];
            for (int j = 0; j < n; j++) {
                evaluateAt(temperaturesKelvin[j], out);
                for (int q = 0; q < 8; q++) {
                    cols[q][j] = out[q];
                }
            }
            double zpDiff = Math.abs(fine.zeroPointEnergyKelvin() - coarse.zeroPointEnergyKelvin());
            VibrationalTable f = fine.evaluate(new double[0]);
            return new VibrationalTable(temperaturesKelvin.clone(),
                    new org.statesum.engine.Series(cols[0], cols[4]), new org.statesum.engine.Series(cols[1], cols[5]),
                    new org.statesum.engine.Series(cols[2], cols[6]), new org.statesum.engine.Series(cols[3], cols[7]),
                    f.zeroPointEnergyKelvin(), f.zeroPointEnergyBound() + 2 * zpDiff / 3);
        }

        @Override
        public void evaluateAt(double temperatureKelvin, double[] out) {
            fine.evaluateAt(temperatureKelvin, out);
            if (coarse != null) {
                double[] c = new double[8];
                coarse.evaluateAt(temperatureKelvin, c);
                for (int q = 0; q < 4; q++) {
                    out[q + 4] += 2 * Math.abs(out[q] - c[q]) / 3;
                }
            }
        }

        @Override
        public Vibrations scaled(double factor) {
            return new Modes(fine.scaled(factor), coarse == null ? null : coarse.scaled(factor));
        }

        @Override
        public int modeCount() {
            return fine.size() + (coarse == null ? 0 : coarse.size());
        }
    }
}
