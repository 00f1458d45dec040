package org.statesum.models.solid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.statesum.engine.DomainException;
import org.statesum.engine.VibrationalTable;
import org.statesum.units.FrequencyUnit;

class CrystalsTest {

    private static final FrequencyUnit THZ = FrequencyUnit.TERAHERTZ;

    /** A Debye density of states g = 9 nu^2 / nu_D^3 per atom on an even grid (tabulated, not closed form). */
    private static Crystal debyeDensity(double nuD, int atoms, int points, boolean normalise) {
        double[] grid = new double[points];
        double[] g = new double[points];
        for (int i = 0; i < points; i++) {
            grid[i] = nuD * i / (points - 1);
            g[i] = atoms * 9 * grid[i] * grid[i] / (nuD * nuD * nuD);
        }
        return Crystals.densityOfStates(grid, g, THZ, 0, atoms, normalise);
    }

    @Test
    void aDensityOfStatesTabulatedFromTheDebyeSpectrumReproducesTheClosedForms() {
        double nuD = 7.0;
        Crystal dos = debyeDensity(nuD, 2, 4001, false);
        Crystal closed = Crystals.debye(THZ.toKelvin(nuD), 2);
        double[] temperatures = {20, 50, 336, 1000};
        VibrationalTable a = dos.vibrations().evaluate(temperatures);
        VibrationalTable b = closed.vibrations().evaluate(temperatures);
        for (int j = 0; j < temperatures.length; j++) {
            // The grid reads g as piecewise linear (relative interpolation error ~ (h / nu)^2 / 8 near the
            // bottom of the grid): 1e-6 relative is the tabulation, not the arithmetic.
            assertEquals(b.helmholtzEnergyKelvin().values()[j], a.helmholtzEnergyKelvin().values()[j],
                    1e-6 * Math.abs(b.helmholtzEnergyKelvin().values()[j]));
            assertEquals(b.entropyOverBoltzmann().values()[j], a.entropyOverBoltzmann().values()[j],
                    1e-6 * b.entropyOverBoltzmann().values()[j]);
            assertEquals(b.heatCapacityOverBoltzmann().values()[j], a.heatCapacityOverBoltzmann().values()[j],
                    1e-6 * b.heatCapacityOverBoltzmann().values()[j]);
            // The Richardson estimate in the bound is of the size of the actual quadrature error, not orders above.
            double err = Math.abs(a.heatCapacityOverBoltzmann().values()[j] - b.heatCapacityOverBoltzmann().values()[j]);
            assertTrue(a.heatCapacityOverBoltzmann().errorBounds()[j] < 1e3 * err + 1e-12, "T=" + temperatures[j]);
        }
        assertEquals(9.0 / 8 * THZ.toKelvin(nuD) * 2, a.zeroPointEnergyKelvin(), 1e-6 * a.zeroPointEnergyKelvin());
    }

    @Test
    void phononsAllAtOneFrequencyAreAnEinsteinCrystal() {
        double[][] mesh = {{4, 4, 4}, {4, 4, 4}};
        Crystal phonons = Crystals.phonons(mesh, new double[] {1, 3}, THZ, 0.03, 1);
        Crystal einstein = Crystals.einstein(4, THZ, 1);
        VibrationalTable a = phonons.vibrations().evaluate(new double[] {300});
        VibrationalTable b = einstein.vibrations().evaluate(new double[] {300});
        assertEquals(b.helmholtzEnergyKelvin().values()[0], a.helmholtzEnergyKelvin().values()[0],
                a.helmholtzEnergyKelvin().errorBounds()[0] + b.helmholtzEnergyKelvin().errorBounds()[0]);
    }

    @Test
    void nearZeroAndSmallImaginaryModesAreLeftOutAndCounted() {
        double[][] mesh = {{0, 0.01, -0.02, 5, 6, 7}, {3, 4, 5, 5, 6, 7}};
        Crystal c = Crystals.phonons(mesh, new double[] {1, 1}, THZ, 0.03, 2);
        assertEquals(1.0, c.screen().nearZeroModes(), 1e-15); // two modes at weight 1/2
        assertEquals(0.5, c.screen().smallImaginaryModes(), 1e-15);
    }

    @Test
    void anImaginaryModeBeyondTheToleranceIsDynamicallyUnstable() {
        double[][] mesh = {{-0.5, 3, 3}};
        DomainException e = assertThrows(DomainException.class,
                () -> Crystals.phonons(mesh, new double[] {1}, THZ, 0.03, 1));
        assertEquals("/qPoints/0/frequencies/0", e.field());
    }

    @Test
    void normalisationIsCheckedOrApplied() {
        assertThrows(DomainException.class, () -> Crystals.densityOfStates(new double[] {0, 1, 2},
                new double[] {0, 1, 0}, THZ, 0, 1, false));
        Crystal c = Crystals.densityOfStates(new double[] {0, 1, 2}, new double[] {0, 1, 0}, THZ, 0, 1, true);
        assertEquals(3.0, c.normalisation().factor(), 0);
    }
}
