package org.statesum.api.species;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.Fields;
import org.statesum.api.request.RequiredFields;
import org.statesum.api.request.TemperatureGridReader;
import org.statesum.models.solid.Crystal;
import org.statesum.units.EnergyUnit;

/**
 * Validates a {@code POST /v1/crystal} body, collecting every bad field, into a {@link CrystalJob}. The
 * {@link #read(JsonNode, String, Fields)} form reads a body nested anywhere (a reaction species' input),
 * prefixing every pointer, and leaves throwing to the caller.
 */
public final class CrystalRequestReader {

    static final List<String> BASES = List.of("formula-unit", "atom");
    /** Most atoms in one formula unit: beyond any crystal a phonon calculation handles. */
    static final int MAX_ATOMS = 100_000;
    private static final Set<String> TOP = Set.of("atomsPerFormulaUnit", "vibrations", "temperatures", "basis",
            "outputUnit");

    private final ServiceConfig config;
    private final VibrationsReader vibrations;

    public CrystalRequestReader(ServiceConfig config) {
        this.config = config;
        this.vibrations = new VibrationsReader(config);
    }

    public CrystalJob read(JsonNode root) {
        Fields fields = new Fields();
        Optional<CrystalJob> job = read(root, "", fields);
        fields.throwIfAny();
        return job.orElseThrow();
    }

    /** Reads a crystal body at {@code base} (a JSON Pointer, "" for the root); empty when anything is bad. */
    public Optional<CrystalJob> read(JsonNode root, String base, Fields fields) {
        int start = fields.count();
        if (!fields.object(root, base, TOP)) {
            return Optional.empty();
        }
        int atoms = atoms(root, base, fields);
        Optional<EnergyUnit> unit = outputUnit(root, base, fields);
        boolean perAtom = perAtom(root, base, fields);
        Optional<double[]> temperatures = Optional.ofNullable(fields.required(root, "temperatures", base))
                .flatMap(t -> TemperatureGridReader.read(t, base + "/temperatures", config.maxTemperatures(), fields));
        Optional<Crystal> crystal = vibrations.read(fields.required(root, "vibrations", base), base + "/vibrations",
                atoms, fields);
        if (crystal.isPresent() && temperatures.isPresent()) {
            long pairs = (long) crystal.get().vibrations().modeCount() * temperatures.get().length;
            if (pairs > config.computeBudget()) {
                fields.add(base, "modes x temperatures = " + pairs + " exceeds the compute budget of "
                        + config.computeBudget() + " (STATESUM_COMPUTE_BUDGET)");
            }
        }
        if (fields.count() > start || crystal.isEmpty() || temperatures.isEmpty() || unit.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new CrystalJob(crystal.get(), temperatures.get(), perAtom, unit.get()));
    }

    /** atomsPerFormulaUnit: an integer from 1 to {@link #MAX_ATOMS}; 0 when bad. */
    static int atoms(JsonNode root, String base, Fields fields) {
        OptionalDouble n = RequiredFields.number(fields, root, "atomsPerFormulaUnit", base);
        if (n.isEmpty()) {
            return 0;
        }
        double v = n.getAsDouble();
        if (!(v >= 1 && v <= MAX_ATOMS && Math.rint(v) == v)) {
            fields.add(base + "/atomsPerFormulaUnit", "must be an integer from 1 to " + MAX_ATOMS);
            return 0;
        }
        return (int) v;
    }

    static Optional<EnergyUnit> outputUnit(JsonNode root, String base, Fields fields) {
        return root.has("outputUnit")
                ? fields.oneOf(root.get("outputUnit"), base + "/outputUnit", EnergyUnit.symbols())
                        .flatMap(EnergyUnit::bySymbol)
                : Optional.of(EnergyUnit.KILOJOULE_PER_MOLE);
    }

    static boolean perAtom(JsonNode root, String base, Fields fields) {
        return root.has("basis") && fields.oneOf(root.get("basis"), base + "/basis", BASES).map("atom"::equals)
                .orElse(false);
    }
}
