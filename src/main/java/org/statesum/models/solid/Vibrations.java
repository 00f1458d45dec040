package org.statesum.models.solid;

import org.statesum.engine.DebyeSolid;
import org.statesum.engine.HarmonicModes;
import org.statesum.engine.LinearDensityOfStates;
import org.statesum.engine.VibrationalTable;

/**
 * The harmonic vibrations of one formula unit, in reduced units (theta = h nu / k_B in K): either a
 * Debye solid (one Debye temperature for every atom), a set of weighted modes (Einstein, a q-point
 * mesh) or a piecewise-linear density of states integrated exactly. Immutable.
 */
public sealed interface Vibrations permits Vibrations.Debye, Vibrations.Modes, Vibrations.Density {

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

    /** Weighted modes (Einstein oscillators, phonon branches on a q-point mesh). */
    record Modes(HarmonicModes modes) implements Vibrations {

        @Override
        public VibrationalTable evaluate(double[] temperaturesKelvin) {
            return modes.evaluate(temperaturesKelvin);
        }

        @Override
        public void evaluateAt(double temperatureKelvin, double[] out) {
            modes.evaluateAt(temperatureKelvin, out);
        }

        @Override
        public Vibrations scaled(double factor) {
            return new Modes(modes.scaled(factor));
        }

        @Override
        public int modeCount() {
            return modes.size();
        }
    }

    /** A density of states, linear between its nodes, integrated segment by segment in closed form. */
    record Density(LinearDensityOfStates density) implements Vibrations {

        @Override
        public VibrationalTable evaluate(double[] temperaturesKelvin) {
            return density.evaluate(temperaturesKelvin);
        }

        @Override
        public void evaluateAt(double temperatureKelvin, double[] out) {
            density.evaluateAt(temperatureKelvin, out);
        }

        @Override
        public Vibrations scaled(double factor) {
            return new Density(density.scaled(factor));
        }

        @Override
        public int modeCount() {
            return density.size();
        }
    }
}
