package org.statesum.api.species;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.statesum.models.gas.Vibrations;
import org.statesum.units.PhysicalConstants;

/** The wire units of the ideal-gas request and their SI factors (CODATA 2018 constants). */
public final class GasUnits {

    private static final double H = PhysicalConstants.PLANCK_J_S;
    private static final double K = PhysicalConstants.BOLTZMANN_J_PER_K;

    /** Mass to kg. */
    static final Map<String, Double> MASS = table("u", PhysicalConstants.ATOMIC_MASS_CONSTANT_KG, "kg", 1.0);
    /** Pressure to Pa (1 atm = 101325 Pa exactly). */
    static final Map<String, Double> PRESSURE = table("Pa", 1.0, "bar", 1e5, "atm", 101325.0);
    /** Concentration to mol/m^3. */
    static final Map<String, Double> CONCENTRATION = table("mol/L", 1000.0);
    /** Rotational constant to the rotational temperature theta = h c B / k_B (or h B / k_B for B in Hz), K. */
    static final Map<String, Double> ROTATIONAL_CONSTANT = table("cm-1", Vibrations.KELVIN_PER_WAVENUMBER,
            "GHz", H * 1e9 / K, "MHz", H * 1e6 / K);
    /** Moment of inertia to kg m^2. */
    static final Map<String, Double> MOMENT = table("amu*angstrom^2",
            PhysicalConstants.ATOMIC_MASS_CONSTANT_KG * 1e-20, "kg*m^2", 1.0);

    private GasUnits() {
    }

    /** theta = h^2 / (8 pi^2 I k_B), K, for a moment of inertia I in kg m^2. */
    static double thetaFromMoment(double kilogramSquareMetre) {
        return H * H / (8 * Math.PI * Math.PI * kilogramSquareMetre * K);
    }

    private static Map<String, Double> table(Object... pairs) {
        Map<String, Double> map = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            map.put((String) pairs[i], (Double) pairs[i + 1]);
        }
        return Collections.unmodifiableMap(map);
    }
}
