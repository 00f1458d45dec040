package org.statesum.units;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The energy units statesum reads and writes, each with the joules in one unit per entity (a molar
 * unit means per mole of entities, so one kJ/mol is 1000/N_A J) and the matching entropy unit.
 *
 * <p>The entropy unit follows the energy unit: eV gives eV/K, kJ/mol gives J/(mol K) (the unit of the
 * thermochemical tables), kcal/mol gives cal/(mol K), and K (energy divided by k_B) gives multiples of
 * k_B. Heat capacities share the entropy unit.
 */
public enum EnergyUnit {
    JOULE("J", 1.0, "J/K", 1.0),
    KILOJOULE_PER_MOLE("kJ/mol", 1000.0 / PhysicalConstants.AVOGADRO_PER_MOL, "J/(mol K)", 1000.0),
    KILOCALORIE_PER_MOLE("kcal/mol", 4184.0 / PhysicalConstants.AVOGADRO_PER_MOL, "cal/(mol K)", 1000.0),
    ELECTRONVOLT("eV", PhysicalConstants.ELEMENTARY_CHARGE_C, "eV/K", 1.0),
    MILLIELECTRONVOLT("meV", PhysicalConstants.ELEMENTARY_CHARGE_C / 1000.0, "meV/K", 1.0),
    HARTREE("hartree", PhysicalConstants.HARTREE_J, "hartree/K", 1.0),
    WAVENUMBER("cm-1", PhysicalConstants.PLANCK_J_S * PhysicalConstants.SPEED_OF_LIGHT_M_PER_S * 100.0,
            "cm-1/K", 1.0),
    KELVIN("K", PhysicalConstants.BOLTZMANN_J_PER_K, "k_B", 1.0);

    /** Read by every request: built once (an enum's static fields are set after its constants). */
    private static final EnergyUnit[] ALL = values();
    private static final List<String> SYMBOLS = Arrays.stream(ALL).map(EnergyUnit::symbol).toList();

    private final String symbol;
    private final double joulesPerUnit;
    private final String entropySymbol;
    private final double entropyScale;

    EnergyUnit(String symbol, double joulesPerUnit, String entropySymbol, double entropyScale) {
        this.symbol = symbol;
        this.joulesPerUnit = joulesPerUnit;
        this.entropySymbol = entropySymbol;
        this.entropyScale = entropyScale;
    }

    /** The symbol used on the wire, e.g. {@code "kJ/mol"}. */
    public String symbol() {
        return symbol;
    }

    /** Joules per entity in one of this unit. */
    public double joulesPerUnit() {
        return joulesPerUnit;
    }

    /** The symbol of the entropy (and heat-capacity) unit that goes with this energy unit. */
    public String entropySymbol() {
        return entropySymbol;
    }

    /** Whether this is a molar unit (per mole of particles, N_A of them) rather than per particle. */
    public boolean molar() {
        return this == KILOJOULE_PER_MOLE || this == KILOCALORIE_PER_MOLE;
    }

    /** Converts an energy per entity in joules into this unit. */
    public double fromJoules(double joules) {
        return joules / joulesPerUnit;
    }

    /** Converts an energy in this unit into joules per entity. */
    public double toJoules(double value) {
        return value * joulesPerUnit;
    }

    /**
     * Converts an entropy per entity in J/K into this unit's entropy unit: S / joulesPerUnit, scaled
     * where the entropy unit is a smaller energy unit per kelvin (kJ/mol -> J/(mol K)).
     */
    public double entropyFromJoulesPerKelvin(double joulesPerKelvin) {
        return joulesPerKelvin / joulesPerUnit * entropyScale;
    }

    /** Relative rounding error of one {@link #toJoules} or {@link #fromJoules} conversion: two roundings. */
    public static double conversionRelativeError() {
        return 2.0 * Math.ulp(1.0);
    }

    /** The unit with this wire symbol, if any. */
    public static Optional<EnergyUnit> bySymbol(String symbol) {
        for (EnergyUnit unit : ALL) {
            if (unit.symbol.equals(symbol)) {
                return Optional.of(unit);
            }
        }
        return Optional.empty();
    }

    /** All wire symbols, in declaration order (one immutable list, read by every request). */
    public static List<String> symbols() {
        return SYMBOLS;
    }
}
