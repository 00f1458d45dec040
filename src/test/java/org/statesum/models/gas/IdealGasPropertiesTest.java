package org.statesum.models.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.statesum.engine.LevelSet;
import org.statesum.engine.Series;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;
import org.statesum.units.PhysicalConstants;

/** Identities every ideal-gas answer must satisfy, for random molecules. */
class IdealGasPropertiesTest {

    private static final double K = PhysicalConstants.BOLTZMANN_J_PER_K;

    private static IdealGasSpecies molecule(double massU, double pressurePa, double b, double nu, boolean grimme,
            boolean headGordon, int multiplicity) {
        return new IdealGasSpecies(massU * PhysicalConstants.ATOMIC_MASS_CONSTANT_KG, StandardState.pressure(pressurePa),
                new NonlinearRotor(new double[] {b, 0.7 * b, 0.4 * b}, 2),
                Vibrations.of(new double[] {nu, 3 * nu, 1500}, new LowFrequency(grimme, headGordon, 100, 4, 1e-44, 0)),
                new ElectronicStates(LevelSet.ofDegeneracies(new double[] {0}, new double[] {multiplicity}), 0, 0));
    }

    private static double value(ThermoResult r, Quantity q) {
        return r.series().get(q).values()[0];
    }

    private static double bound(ThermoResult r, Quantity q) {
        return r.series().get(q).errorBounds()[0];
    }

    @Property(tries = 200)
    void gibbsIsEnthalpyMinusTemperatureTimesEntropyAndCpMinusCvIsK(
            @ForAll @DoubleRange(min = 2, max = 500) double mass,
            @ForAll @DoubleRange(min = 10, max = 1e7) double pressure,
            @ForAll @DoubleRange(min = 0.01, max = 50) double theta,
            @ForAll @DoubleRange(min = 5, max = 4000) double nu,
            @ForAll @DoubleRange(min = 1, max = 5000) double t,
            @ForAll boolean grimme, @ForAll boolean headGordon, @ForAll @IntRange(min = 1, max = 5) int mult) {
        ThermoResult r = IdealGasModel.evaluate(molecule(mass, pressure, theta, nu, grimme, headGordon, mult),
                new double[] {t}).total();
        double g = value(r, Quantity.GIBBS_ENERGY);
        double h = value(r, Quantity.ENTHALPY);
        double s = value(r, Quantity.ENTROPY);
        // Within the sum of the three bounds plus the rounding of H - TS (a few ulps of |H| + |TS|).
        double tol = bound(r, Quantity.GIBBS_ENERGY) + bound(r, Quantity.ENTHALPY) + t * bound(r, Quantity.ENTROPY)
                + 4 * Math.ulp(Math.abs(h) + Math.abs(t * s));
        assertEquals(g, h - t * s, tol);
        assertEquals(value(r, Quantity.HELMHOLTZ_ENERGY), value(r, Quantity.INTERNAL_ENERGY) - t * s,
                tol + bound(r, Quantity.HELMHOLTZ_ENERGY) + bound(r, Quantity.INTERNAL_ENERGY));
        // Cp - Cv = k_B per molecule (R per mole) for an ideal gas, exactly up to rounding.
        assertEquals(K, value(r, Quantity.ISOBARIC_HEAT_CAPACITY) - value(r, Quantity.ISOCHORIC_HEAT_CAPACITY),
                1e-12 * K);
        assertEquals(K * t, h - value(r, Quantity.INTERNAL_ENERGY), 1e-12 * (Math.abs(h) + K * t));
    }

    @Property(tries = 100)
    void entropyShiftsByMinusKLnPressureRatio(
            @ForAll @DoubleRange(min = 2, max = 500) double mass,
            @ForAll @DoubleRange(min = 1, max = 1e8) double pressure,
            @ForAll @DoubleRange(min = 1, max = 5000) double t) {
        double[] grid = {t};
        ThermoResult at = IdealGasModel.evaluate(molecule(mass, pressure, 1, 500, false, false, 1), grid).total();
        ThermoResult standard = IdealGasModel.evaluate(molecule(mass, 1e5, 1, 500, false, false, 1), grid).total();
        double shift = value(at, Quantity.ENTROPY) - value(standard, Quantity.ENTROPY);
        // S(p) - S(p°) = -k_B ln(p / p°); tolerance: both bounds (S ~ 1e-21 J/K carries ~1e-36 of rounding).
        assertEquals(-K * Math.log(pressure / 1e5), shift,
                bound(at, Quantity.ENTROPY) + bound(standard, Quantity.ENTROPY) + 1e-15 * K);
        // Nothing else depends on the pressure.
        assertEquals(value(standard, Quantity.ENTHALPY), value(at, Quantity.ENTHALPY), 0);
    }

    @Property(tries = 100)
    void heatCapacityIsTheTemperatureDerivativeOfTheEnergyForHarmonicModes(
            @ForAll @DoubleRange(min = 20, max = 3000) double nu,
            @ForAll @DoubleRange(min = 20, max = 3000) double t) {
        // C_V = dU/dT by a central difference (step 1e-4 T: truncation ~1e-8 relative, rounding ~1e-8 too).
        Vibrations v = Vibrations.of(new double[] {nu}, LowFrequency.harmonic());
        double h = 1e-4 * t;
        Series u = v.evaluate(new double[] {t - h, t + h}).internalEnergyKelvin();
        double derivative = (u.values()[1] - u.values()[0]) / (2 * h);
        double cv = v.evaluate(new double[] {t}).heatCapacity().values()[0];
        assertEquals(cv, derivative, 1e-6 * Math.max(cv, 1e-3));
        // and S = -dF/dT for the harmonic oscillator
        Series f = v.evaluate(new double[] {t - h, t + h}).helmholtzEnergyKelvin(new double[] {t - h, t + h});
        double s = v.evaluate(new double[] {t}).entropy().values()[0];
        assertEquals(s, -(f.values()[1] - f.values()[0]) / (2 * h), 1e-6 * Math.max(s, 1e-3));
        assertTrue(cv <= 1);
    }
}
