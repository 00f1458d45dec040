package org.statesum.units;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/** Units of pressure (and of bulk modulus), each with its value in pascal; all exact by definition. */
public enum PressureUnit {
    PASCAL("Pa", 1.0),
    KILOPASCAL("kPa", 1e3),
    MEGAPASCAL("MPa", 1e6),
    GIGAPASCAL("GPa", 1e9),
    BAR("bar", 1e5),
    ATMOSPHERE("atm", 101325.0);

    private final String symbol;
    private final double pascals;

    PressureUnit(String symbol, double pascals) {
        this.symbol = symbol;
        this.pascals = pascals;
    }

    public String symbol() {
        return symbol;
    }

    public double pascalsPerUnit() {
        return pascals;
    }

    public static Optional<PressureUnit> bySymbol(String symbol) {
        return Arrays.stream(values()).filter(u -> u.symbol.equals(symbol)).findFirst();
    }

    public static List<String> symbols() {
        return Arrays.stream(values()).map(PressureUnit::symbol).toList();
    }
}
