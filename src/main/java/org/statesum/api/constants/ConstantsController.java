package org.statesum.api.constants;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.http.Context;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.units.EnergyUnit;
import org.statesum.units.PhysicalConstants;

/** {@code GET /v1/constants}: the constants and units every answer uses, and the cautions. */
public final class ConstantsController {

    static final String CAUTIONS = "statesum computes model estimates (non-interacting particles, ideal gas, "
            + "rigid rotor, harmonic or quasi-harmonic lattice) from the numbers it is given. The error bounds "
            + "cover numerical error only, not the error of the model or of its inputs. Decisions about process "
            + "safety, pressure equipment or reactive materials rest with validated data, the applicable codes "
            + "and standards, and licensed professional practice, not with these results.";

    private final byte[] body;

    public ConstantsController(ObjectMapper mapper) throws IOException {
        this.body = mapper.writeValueAsBytes(document());
    }

    public void get(Context ctx) {
        ctx.contentType("application/json").result(body);
    }

    static Map<String, Object> document() {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("source", PhysicalConstants.SOURCE);
        List<Map<String, Object>> constants = new ArrayList<>();
        constants.add(constant("boltzmannConstant", "k_B", PhysicalConstants.BOLTZMANN_J_PER_K, "J/K", true, 0));
        constants.add(constant("planckConstant", "h", PhysicalConstants.PLANCK_J_S, "J s", true, 0));
        constants.add(constant("avogadroConstant", "N_A", PhysicalConstants.AVOGADRO_PER_MOL, "1/mol", true, 0));
        constants.add(constant("elementaryCharge", "e", PhysicalConstants.ELEMENTARY_CHARGE_C, "C", true, 0));
        constants.add(constant("speedOfLight", "c", PhysicalConstants.SPEED_OF_LIGHT_M_PER_S, "m/s", true, 0));
        constants.add(constant("atomicMassConstant", "m_u", PhysicalConstants.ATOMIC_MASS_CONSTANT_KG, "kg",
                false, 5.0e-37));
        constants.add(constant("hartreeEnergy", "E_h", PhysicalConstants.HARTREE_J, "J", false, 8.5e-30));
        constants.add(constant("molarGasConstant", "R", PhysicalConstants.GAS_CONSTANT_J_PER_MOL_K, "J/(mol K)",
                true, 0));
        doc.put("constants", constants);
        List<Map<String, Object>> units = new ArrayList<>();
        for (EnergyUnit unit : EnergyUnit.values()) {
            Map<String, Object> u = new LinkedHashMap<>();
            u.put("symbol", unit.symbol());
            u.put("joulesPerEntity", unit.joulesPerUnit());
            u.put("entropyUnit", unit.entropySymbol());
            u.put("entropyPerJoulePerKelvin", unit.entropyFromJoulesPerKelvin(1.0));
            units.add(u);
        }
        doc.put("energyUnits", units);
        doc.put("temperatureUnit", "K");
        doc.put("molarConvention", "a molar unit (kJ/mol, kcal/mol and their entropy units) is per mole of "
                + "particles: for the total of N particles it reports the total divided by the amount N / N_A, "
                + "which equals the per-particle value times N_A");
        doc.put("cautions", CAUTIONS);
        return doc;
    }

    private static Map<String, Object> constant(String name, String symbol, double value, String unit,
            boolean exact, double uncertainty) {
        Map<String, Object> c = new LinkedHashMap<>();
        c.put("name", name);
        c.put("symbol", symbol);
        c.put("value", value);
        c.put("unit", unit);
        c.put("exact", exact);
        c.put("standardUncertainty", uncertainty);
        return c;
    }
}
