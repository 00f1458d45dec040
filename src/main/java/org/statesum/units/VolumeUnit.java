package org.statesum.units;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * Units of volume per entity (formula unit or atom): cubic angstrom, cubic bohr (Bohr radius,
 * CODATA 2018 0.529177210903e-10 m, standard uncertainty 8.0e-21 m), cubic nanometre, cubic metre,
 * and cm^3/mol (per mole of entities).
 */
public enum VolumeUnit {
    CUBIC_ANGSTROM("A^3", 1e-30),
    CUBIC_BOHR("bohr^3", Math.pow(0.529177210903e-10, 3)),
    CUBIC_NANOMETRE("nm^3", 1e-27),
    CUBIC_METRE("m^3", 1.0),
    CUBIC_CENTIMETRE_PER_MOLE("cm^3/mol", 1e-6 / PhysicalConstants.AVOGADRO_PER_MOL);

    private final String symbol;
    private final double cubicMetres;

    VolumeUnit(String symbol, double cubicMetres) {
        this.symbol = symbol;
        this.cubicMetres = cubicMetres;
    }

    public String symbol() {
        return symbol;
    }

    /** Cubic metres per entity in one unit. */
    public double cubicMetresPerUnit() {
        return cubicMetres;
    }

    public static Optional<VolumeUnit> bySymbol(String symbol) {
        return Arrays.stream(values()).filter(u -> u.symbol.equals(symbol)).findFirst();
    }

    public static List<String> symbols() {
        return Arrays.stream(values()).map(VolumeUnit::symbol).toList();
    }
}
