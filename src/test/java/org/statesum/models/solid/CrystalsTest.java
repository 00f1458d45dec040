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
        double thetaD = THZ.toKelvin(nuD);
        double h = thetaD / 4000;
        // The grid reads g = 18 theta^2 / theta_D^3 as linear between nodes h apart: the interpolation is off
        // by at most (18 / theta_D^3) h^2 / 4 everywhere, so (integrals over x of |phi_F| = zeta(2), of
        // phi_S = phi_C = 2 zeta(2), over all x > 0) |dF| <= T^2 zeta(2) c h^2 / 4 and |dS|, |dC_V| <=
        // T 2 zeta(2) c h^2 / 4: the tabulation error, which the piecewise-linear answer carries exactly.
        double gap = 18 / (thetaD * thetaD * thetaD) * h * h / 4;
        double zeta2 = Math.PI * Math.PI / 6;
        for (int j = 0; j < temperatures.length; j++) {
            double t = temperatures[j];
            // and the zero-point energy int g theta / 2 by at most gap theta_D^2 / 4
            assertEquals(b.helmholtzEnergyKelvin().values()[j], a.helmholtzEnergyKelvin().values()[j],
                    (t * t * zeta2 + thetaD * thetaD / 4) * gap + b.helmholtzEnergyKelvin().errorBounds()[j]);
            assertEquals(b.entropyOverBoltzmann().values()[j], a.entropyOverBoltzmann().values()[j], t * 2 * zeta2 * gap
                    + b.entropyOverBoltzmann().errorBounds()[j]);
            assertEquals(b.heatCapacityOverBoltzmann().values()[j], a.heatCapacityOverBoltzmann().values()[j],
                    t * 2 * zeta2 * gap + b.heatCapacityOverBoltzmann().errorBounds()[j]);
            // the reported bound is the arithmetic's alone, far below the tabulation error; on 4 000 segments
            // the differences of antiderivatives at neighbouring nodes cost up to 2.4e-9 of C_V at 1000 K
            assertTrue(a.heatCapacityOverBoltzmann().errorBounds()[j] < 1e-8 * a.heatCapacityOverBoltzmann().values()[j],
                    "T=" + t);
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
