package org.statesum.units;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * Units of vibrational frequency, each with the quantum energy h nu (or hbar omega for angular
 * frequency) in joules for one unit: THz (h 1e12 Hz), cm-1 (h c 100 m^-1), meV (the quantum itself,
 * e / 1000 J) and rad/s (hbar = h / 2 pi). Exact with the CODATA 2018 h, c and e.
 */
public enum FrequencyUnit {
    TERAHERTZ("THz", PhysicalConstants.PLANCK_J_S * 1e12),
    WAVENUMBER("cm-1", PhysicalConstants.PLANCK_J_S * PhysicalConstants.SPEED_OF_LIGHT_M_PER_S * 100.0),
    MILLIELECTRONVOLT("meV", PhysicalConstants.ELEMENTARY_CHARGE_C / 1000.0),
    RADIAN_PER_SECOND("rad/s", PhysicalConstants.PLANCK_J_S / (2 * Math.PI));

    private final String symbol;
    private final double joulesPerUnit;

    FrequencyUnit(String symbol, double joulesPerUnit) {
        this.symbol = symbol;
        this.joulesPerUnit = joulesPerUnit;
    }

    public String symbol() {
        return symbol;
    }

    /** The quantum h nu of one unit, J. */
    public double joulesPerUnit() {
        return joulesPerUnit;
    }

    /** theta = h nu / k_B in kelvin for a frequency in this unit (relative error at most 3 u: the factor and two roundings). */
    public double toKelvin(double value) {
        return value * joulesPerUnit / PhysicalConstants.BOLTZMANN_J_PER_K;
    }

    public static Optional<FrequencyUnit> bySymbol(String symbol) {
        return Arrays.stream(values()).filter(u -> u.symbol.equals(symbol)).findFirst();
    }

    public static List<String> symbols() {
        return Arrays.stream(values()).map(FrequencyUnit::symbol).toList();
    }
}
