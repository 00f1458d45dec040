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
import org.statesum.engine.EquationOfState;
import org.statesum.engine.LevelSet;
import org.statesum.models.solid.Crystal;
import org.statesum.models.solid.ModeScreen;
import org.statesum.models.solid.QuasiHarmonicCrystal;
import org.statesum.models.solid.Vibrations;
import org.statesum.units.EnergyUnit;
import org.statesum.units.PhysicalConstants;
import org.statesum.units.PressureUnit;
import org.statesum.units.VolumeUnit;

/**
 * Validates a {@code POST /v1/quasi-harmonic} body, collecting every bad field, into a
 * {@link QuasiHarmonicJob}; {@link #read(JsonNode, String, Fields)} reads one nested anywhere.
 */
public final class QuasiHarmonicRequestReader {

    public static final List<String> FORMS = List.of("birch-murnaghan-3", "vinet", "murnaghan");
    /** Fewest volumes: four parameters need at least one more point to leave a residual. */
    static final int MIN_VOLUMES = 5;
    static final int MAX_VOLUMES = 1000;
    /** Largest |P| accepted, Pa (10 TPa: beyond the interiors of giant planets). */
    static final double MAX_PRESSURE_PASCAL = 1e13;
    /** Volumes per formula unit accepted, m^3: 1e-3 to 1e9 cubic angstrom, beyond any crystal either way. */
    static final double MIN_VOLUME_CUBIC_METRE = 1e-33;
    static final double MAX_VOLUME_CUBIC_METRE = 1e-21;
    private static final Set<String> TOP = Set.of("atomsPerFormulaUnit", "volumeUnit", "energyUnit", "volumes",
            "staticEnergies", "phonons", "grueneisen", "pressures", "temperatures", "equationOfState", "basis",
            "outputUnit");

    private final ServiceConfig config;
    private final VibrationsReader vibrations;

    public QuasiHarmonicRequestReader(ServiceConfig config) {
        this.config = config;
        this.vibrations = new VibrationsReader(config);
    }

    public QuasiHarmonicJob read(JsonNode root) {
        Fields fields = new Fields();
        Optional<QuasiHarmonicJob> job = read(root, "", fields);
        fields.throwIfAny();
        return job.orElseThrow();
    }

    public Optional<QuasiHarmonicJob> read(JsonNode root, String base, Fields fields) {
        int start = fields.count();
        if (!fields.object(root, base, TOP)) {
            return Optional.empty();
        }
        int atoms = CrystalRequestReader.atoms(root, base, fields);
        Optional<EnergyUnit> out = CrystalRequestReader.outputUnit(root, base, fields);
        boolean perAtom = CrystalRequestReader.perAtom(root, base, fields);
        Optional<VolumeUnit> vUnit = RequiredFields.oneOf(fields, root, "volumeUnit", base, VolumeUnit.symbols()).flatMap(VolumeUnit::bySymbol);
        Optional<EnergyUnit> eUnit = RequiredFields.oneOf(fields, root, "energyUnit", base, EnergyUnit.symbols()).flatMap(EnergyUnit::bySymbol);
        Optional<EquationOfState> eos = RequiredFields.oneOf(fields, root, "equationOfState", base, FORMS).map(f -> EquationOfState.values()[FORMS.indexOf(f)]);
        Optional<double[]> volumes = volumes(root, base, fields);
        Optional<double[]> energies = RequiredFields.numbers(fields, root, "staticEnergies", base, MAX_VOLUMES);
        int count = root.path("volumes").isArray() ? root.get("volumes").size() : -1;
        if (count >= 0 && energies.isPresent() && energies.get().length != count) {
            fields.add(base + "/staticEnergies", "has " + energies.get().length + " elements but volumes has " + count);
        }
        Optional<double[]> pressures = pressures(root, base, fields);
        Optional<double[]> temperatures = Optional.ofNullable(fields.required(root, "temperatures", base))
                .flatMap(t -> TemperatureGridReader.read(t, base + "/temperatures", config.maxTemperatures(), fields));
        Optional<Crystal[]> crystals = phonons(root, base, atoms, count, volumes, fields);
        Optional<Vibrations[]> vib = crystals.map(cs -> java.util.Arrays.stream(cs).map(Crystal::vibrations)
                .toArray(Vibrations[]::new));
        if (temperatures.isPresent() && pressures.isPresent()
                && (long) temperatures.get().length * pressures.get().length > config.maxTemperatures()) {
            // every series is answered on the (P, T) grid: it is held to the size of a temperature grid
            fields.add(base + "/pressures/values", "pressures x temperatures = " + (long) temperatures.get().length
                    * pressures.get().length + " exceeds the limit of " + config.maxTemperatures()
                    + " (P, T) points (STATESUM_MAX_TEMPERATURES)");
        }
        if (vib.isPresent() && temperatures.isPresent() && pressures.isPresent()) {
            long work = 0;
            for (Vibrations x : vib.get()) {
                work += x.modeCount();
            }
            work *= temperatures.get().length;
            if (work > config.computeBudget()) {
                fields.add(base, "modes x volumes x temperatures = " + work + " exceeds the compute budget of "
                        + config.computeBudget() + " (STATESUM_COMPUTE_BUDGET)");
            }
        }
        if (fields.count() > start || vib.isEmpty() || energies.isEmpty() || eUnit.isEmpty() || eos.isEmpty()
                || out.isEmpty() || temperatures.isEmpty() || pressures.isEmpty()) {
            return Optional.empty();
        }
        double[] vm = volumes.get().clone();
        double[] ej = energies.get().clone();
        for (int i = 0; i < vm.length; i++) {
            vm[i] *= vUnit.get().cubicMetresPerUnit();
            ej[i] = eUnit.get().toJoules(ej[i]);
            if (!(vm[i] >= MIN_VOLUME_CUBIC_METRE && vm[i] <= MAX_VOLUME_CUBIC_METRE)) {
                fields.add(base + "/volumes/" + i, "must lie between " + MIN_VOLUME_CUBIC_METRE + " and "
                        + MAX_VOLUME_CUBIC_METRE + " m^3 per formula unit");
            }
            if (!(Math.abs(ej[i] / PhysicalConstants.BOLTZMANN_J_PER_K) <= LevelSet.MAX_ABS_ENERGY_KELVIN)) {
                fields.add(base + "/staticEnergies/" + i, "energy / k_B exceeds " + LevelSet.MAX_ABS_ENERGY_KELVIN + " K");
            }
        }
        if (fields.count() > start) {
            return Optional.empty();
        }
        ModeScreen screen = ModeScreen.none();
        for (Crystal c : crystals.get()) {
            screen = screen.plus(c.screen());
        }
        QuasiHarmonicCrystal crystal = new QuasiHarmonicCrystal(vm, ej, EnergyUnit.conversionRelativeError(), vib.get(),
                atoms, eos.get(), screen);
        PressureUnit pUnit = PressureUnit.bySymbol(root.get("pressures").get("unit").textValue()).orElseThrow();
        return Optional.of(new QuasiHarmonicJob(crystal, temperatures.get(), pressures.get(), pUnit, vUnit.get(),
                perAtom, out.get()));
    }

    private static Optional<double[]> volumes(JsonNode root, String base, Fields fields) {
        Optional<double[]> v = RequiredFields.numbers(fields, root, "volumes", base, MAX_VOLUMES);
        if (v.isEmpty()) {
            return v;
        }
        double[] a = v.get();
        int before = fields.count();
        if (a.length < MIN_VOLUMES) {
            fields.add(base + "/volumes", "needs at least " + MIN_VOLUMES + " volumes to fit a four-parameter form");
        }
        for (int i = 0; i < a.length; i++) {
            if (!(a[i] > 0)) {
                fields.add(base + "/volumes/" + i, "must be positive");
            }
            for (int k = 0; k < i; k++) {
                if (a[k] == a[i]) {
                    fields.add(base + "/volumes/" + i, "repeats volume " + k);
                }
            }
        }
        return fields.count() == before ? v : Optional.empty();
    }

    private static Optional<double[]> pressures(JsonNode root, String base, Fields fields) {
        JsonNode node = fields.required(root, "pressures", base);
        String at = base + "/pressures";
        if (node == null || !fields.object(node, at, Set.of("unit", "values"))) {
            return Optional.empty();
        }
        Optional<PressureUnit> unit = RequiredFields.oneOf(fields, node, "unit", at, PressureUnit.symbols()).flatMap(PressureUnit::bySymbol);
        Optional<double[]> values = RequiredFields.numbers(fields, node, "values", at, 100);
        if (unit.isEmpty() || values.isEmpty()) {
            return Optional.empty();
        }
        double[] pa = values.get().clone();
        boolean good = true;
        for (int i = 0; i < pa.length; i++) {
            pa[i] = pa[i] * unit.get().pascalsPerUnit() + 0.0; // + 0.0: -0.0 is the pressure 0
            if (!(Math.abs(pa[i]) <= MAX_PRESSURE_PASCAL)) {
                fields.add(at + "/values/" + i, "|P| must be at most " + MAX_PRESSURE_PASCAL + " Pa");
                good = false;
            }
        }
        return good ? Optional.of(pa) : Optional.empty();
    }

    private Optional<Crystal[]> phonons(JsonNode root, String base, int atoms, int count, Optional<double[]> volumes,
            Fields fields) {
        boolean list = root.has("phonons");
        if (list == root.has("grueneisen")) {
            fields.add(base, "give either 'phonons' (one vibrations object per volume) or 'grueneisen'");
            return Optional.empty();
        }
        if (list) {
            JsonNode node = root.get("phonons");
            if (!node.isArray() || (count >= 0 && node.size() != count)) {
                fields.add(base + "/phonons", "must be an array with one vibrations object per volume ("
                        + Math.max(count, 0) + ")");
                return Optional.empty();
            }
            Crystal[] out = new Crystal[node.size()];
            boolean good = true;
            for (int i = 0; i < out.length; i++) {
                Optional<Crystal> c = vibrations.read(node.get(i), base + "/phonons/" + i, atoms, fields);
                good &= c.isPresent();
                out[i] = c.orElse(null);
            }
            return good ? Optional.of(out) : Optional.empty();
        }
        String at = base + "/grueneisen";
        JsonNode g = root.get("grueneisen");
        if (!fields.object(g, at, Set.of("referenceVolume", "parameter", "vibrations"))) {
            return Optional.empty();
        }
        OptionalDouble ref = RequiredFields.number(fields, g, "referenceVolume", at);
        OptionalDouble gamma = RequiredFields.number(fields, g, "parameter", at);
        if (ref.isPresent() && !(ref.getAsDouble() > 0)) {
            fields.add(at + "/referenceVolume", "must be positive");
            return Optional.empty();
        }
        if (gamma.isPresent() && !(Math.abs(gamma.getAsDouble()) <= 20)) {
            fields.add(at + "/parameter", "must be between -20 and 20");
            return Optional.empty();
        }
        Optional<Crystal> reference = vibrations.read(fields.required(g, "vibrations", at), at + "/vibrations", atoms,
                fields);
        if (ref.isEmpty() || gamma.isEmpty() || reference.isEmpty() || volumes.isEmpty()) {
            return Optional.empty();
        }
        // Both volumes in the request's unit: only their ratio enters.
        Vibrations[] scaled = QuasiHarmonicCrystal.grueneisenScaled(reference.get().vibrations(), ref.getAsDouble(),
                gamma.getAsDouble(), volumes.get());
        Crystal r = reference.get();
        Crystal[] out = new Crystal[scaled.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = new Crystal(r.model(), scaled[i], atoms, i == 0 ? r.screen() : ModeScreen.none(), r.normalisation());
        }
        return Optional.of(out);
    }
}
