package org.statesum.api.species;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.Fields;
import org.statesum.api.request.TemperatureGridReader;
import org.statesum.engine.CompositeSystem;
import org.statesum.engine.LevelSet;
import org.statesum.engine.ParticleStatistics;
import org.statesum.engine.QuantumCanonical;
import org.statesum.models.LevelSetModel;
import org.statesum.models.Particles;
import org.statesum.models.QuantumLevelSetModel;
import org.statesum.units.EnergyUnit;

/** Validates a {@code POST /v1/spectrum} body, collecting every bad field, into a {@link SpectrumJob}. */
public final class SpectrumRequestReader {

    private static final Set<String> TOP = Set.of("levels", "energyUnit", "temperatures", "particles", "basis",
            "outputUnit", "include");
    private static final Set<String> LEVELS = Set.of("energies", "degeneracies", "logDegeneracies");
    private static final List<String> STATISTICS = List.of("distinguishable", "indistinguishable", "bose-einstein",
            "fermi-dirac");
    private static final List<String> BASES = List.of("total", "per-particle");
    private static final List<String> INCLUDES = List.of("populations");

    private final ServiceConfig config;

    public SpectrumRequestReader(ServiceConfig config) {
        this.config = config;
    }

    public SpectrumJob read(JsonNode root) {
        Fields fields = new Fields();
        if (!fields.object(root, "", TOP)) {
            fields.throwIfAny();
        }
        Optional<EnergyUnit> unit = fields.oneOf(fields.required(root, "energyUnit", ""), "/energyUnit",
                EnergyUnit.symbols()).flatMap(EnergyUnit::bySymbol);
        Optional<EnergyUnit> outputUnit = root.has("outputUnit")
                ? fields.oneOf(root.get("outputUnit"), "/outputUnit", EnergyUnit.symbols()).flatMap(EnergyUnit::bySymbol)
                : unit;
        Optional<double[]> temperatures = Optional.ofNullable(fields.required(root, "temperatures", ""))
                .flatMap(t -> TemperatureGridReader.read(t, "/temperatures", config.maxTemperatures(), fields));
        Optional<LevelSet> levels = Optional.ofNullable(fields.required(root, "levels", ""))
                .flatMap(l -> readLevels(l, unit, fields));
        Particles particles = readParticles(root, fields);
        boolean populations = readIncludes(root, fields);
        if (levels.isPresent() && temperatures.isPresent()) {
            checkBudget(levels.get().size(), temperatures.get().length, populations, fields);
        }
        if (particles.statistics().quantum()) {
            checkQuantum(root, levels, temperatures, particles, populations, fields);
        }
        fields.throwIfAny();
        return new SpectrumJob(levels.get(), temperatures.get(), particles, outputUnit.get(), populations);
    }

    private Optional<LevelSet> readLevels(JsonNode node, Optional<EnergyUnit> unit, Fields fields) {
        if (!fields.object(node, "/levels", LEVELS)) {
            return Optional.empty();
        }
        Optional<double[]> energies = fields.numbers(fields.required(node, "energies", "/levels"),
                "/levels/energies", config.maxLevels());
        boolean hasG = node.has("degeneracies");
        boolean hasLogG = node.has("logDegeneracies");
        if (hasG && hasLogG) {
            fields.add("/levels/logDegeneracies", "give 'degeneracies' or 'logDegeneracies', not both");
            fields.numbers(node.get("degeneracies"), "/levels/degeneracies", config.maxLevels());
            checkWeights(node.get("degeneracies"), false, fields);
            return Optional.empty();
        }
        String gName = hasLogG ? "logDegeneracies" : "degeneracies";
        Optional<double[]> weights = hasG || hasLogG
                ? fields.numbers(node.get(gName), "/levels/" + gName, config.maxLevels())
                : energies.map(e -> filled(e.length, 1.0));
        // Every number given is checked, even when some other element is not a number.
        boolean good = checkWeights(node.get(gName), hasLogG, fields) && weights.isPresent();
        JsonNode energyNode = node.get("energies");
        JsonNode weightNode = node.get(gName);
        if (energyNode != null && energyNode.isArray() && weightNode != null && weightNode.isArray()
                && energyNode.size() != weightNode.size()) {
            fields.add("/levels/" + gName, "has " + weightNode.size() + " elements but energies has "
                    + energyNode.size());
            return Optional.empty();
        }
        if (energies.isEmpty() || !good) {
            return Optional.empty();
        }
        double[] e = energies.get();
        double[] w = weights.get();
        if (unit.isEmpty()) {
            return Optional.empty();
        }
        double[] kelvin = LevelSetModel.toKelvin(toJoules(e, unit.get()));
        for (int i = 0; i < kelvin.length; i++) {
            if (!(Math.abs(kelvin[i]) <= LevelSet.MAX_ABS_ENERGY_KELVIN)) {
                fields.add("/levels/energies/" + i, "energy / k_B exceeds " + LevelSet.MAX_ABS_ENERGY_KELVIN + " K");
                good = false;
            }
        }
        if (!good) {
            return Optional.empty();
        }
        LevelSet set = hasLogG ? LevelSet.ofLogDegeneracies(kelvin, w) : LevelSet.ofDegeneracies(kelvin, w);
        // Input unit -> J (the unit's factor and the product) and J -> E / k_B (k_B and the quotient).
        return Optional.of(set.withEnergyRelativeError(2 * EnergyUnit.conversionRelativeError()));
    }

    /** Checks each numeric element of a (log-)degeneracy array; true when none is out of range. */
    private static boolean checkWeights(JsonNode array, boolean logarithmic, Fields fields) {
        boolean good = true;
        for (int i = 0; array != null && array.isArray() && i < array.size(); i++) {
            if (!array.get(i).isNumber()) {
                continue;
            }
            double w = array.get(i).doubleValue();
            if (logarithmic && !(Math.abs(w) <= LevelSet.MAX_ABS_LOG_DEGENERACY)) {
                fields.add("/levels/logDegeneracies/" + i, "must be at most " + LevelSet.MAX_ABS_LOG_DEGENERACY
                        + " in magnitude");
                good = false;
            } else if (!logarithmic && !(w > 0)) {
                fields.add("/levels/degeneracies/" + i, "a degeneracy must be positive");
                good = false;
            }
        }
        return good;
    }

    private static double[] toJoules(double[] values, EnergyUnit unit) {
        double[] joules = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            joules[i] = unit.toJoules(values[i]);
        }
        return joules;
    }

    private static Particles readParticles(JsonNode root, Fields fields) {
        boolean perParticle = root.has("basis")
                && fields.oneOf(root.get("basis"), "/basis", BASES).map("per-particle"::equals).orElse(false);
        JsonNode node = root.get("particles");
        if (node == null) {
            return Particles.single();
        }
        if (!fields.object(node, "/particles", Set.of("count", "statistics"))) {
            return Particles.single();
        }
        OptionalDouble count = fields.number(fields.required(node, "count", "/particles"), "/particles/count");
        Optional<String> statistics = fields.oneOf(fields.required(node, "statistics", "/particles"),
                "/particles/statistics", STATISTICS);
        if (count.isPresent()) {
            double n = count.getAsDouble();
            if (!(n >= 1 && n <= CompositeSystem.MAX_PARTICLES && Math.rint(n) == n)) {
                fields.add("/particles/count", "must be an integer from 1 to 1e30");
            }
        }
        if (fields.hasErrors() || count.isEmpty() || statistics.isEmpty()) {
            return Particles.single();
        }
        ParticleStatistics kind = switch (statistics.get()) {
            case "indistinguishable" -> ParticleStatistics.INDISTINGUISHABLE;
            case "bose-einstein" -> ParticleStatistics.BOSE_EINSTEIN;
            case "fermi-dirac" -> ParticleStatistics.FERMI_DIRAC;
            default -> ParticleStatistics.DISTINGUISHABLE;
        };
        return new Particles(count.getAsDouble(), kind, perParticle);
    }

    private static boolean readIncludes(JsonNode root, Fields fields) {
        JsonNode node = root.get("include");
        if (node == null) {
            return false;
        }
        if (!node.isArray()) {
            fields.add("/include", "must be an array of strings");
            return false;
        }
        boolean populations = false;
        for (int i = 0; i < node.size(); i++) {
            populations |= fields.oneOf(node.get(i), "/include/" + i, INCLUDES).isPresent();
        }
        return populations;
    }

    /**
     * Exact quantum statistics: integer degeneracies (not logarithms), N within
     * {@link QuantumLevelSetModel#MAX_PARTICLES} and fermions within the states, the work (temperatures x N x
     * states, {@link QuantumCanonical#cost}) within the compute budget, and the fermion populations' workspace.
     */
    private void checkQuantum(JsonNode root, Optional<LevelSet> levels, Optional<double[]> temperatures,
            Particles particles, boolean populations, Fields fields) {
        if (root.path("levels").has("logDegeneracies")) {
            fields.add("/levels/logDegeneracies", "exact quantum statistics counts single-particle states: give "
                    + "integer 'degeneracies'");
        }
        if (populations && particles.statistics() == ParticleStatistics.FERMI_DIRAC && levels.isPresent()
                && (levels.get().size() + 1.0) * (particles.count() + 1) > QuantumLevelSetModel.MAX_POPULATION_WORKSPACE) {
            fields.add("/include", "fermion populations need (levels + 1) x (N + 1) <= "
                    + (long) QuantumLevelSetModel.MAX_POPULATION_WORKSPACE + " numbers of workspace");
        }
        if (particles.count() > QuantumLevelSetModel.MAX_PARTICLES) {
            fields.add("/particles/count", "exact quantum statistics takes at most " + QuantumLevelSetModel.MAX_PARTICLES
                    + " particles");
            return;
        }
        double[] g = levels.map(LevelSet::degeneracies).orElse(null);
        if (g == null || temperatures.isEmpty()) {
            return;
        }
        double states = 0;
        for (int i = 0; i < g.length; i++) {
            if (!(Math.rint(g[i]) == g[i] && g[i] <= 0x1.0p53)) {
                fields.add("/levels/degeneracies/" + i, "exact quantum statistics counts single-particle states: a "
                        + "degeneracy must be a positive integer");
            }
            states += g[i];
        }
        if (particles.statistics() == ParticleStatistics.FERMI_DIRAC && particles.count() > states) {
            fields.add("/particles/count", (long) particles.count() + " fermions do not fit into " + (long) states
                    + " single-particle states (the sum of the degeneracies)");
        }
        double work = QuantumCanonical.cost(g, particles.count()) * temperatures.get().length;
        if (work > config.computeBudget()) {
            fields.add("/particles/count", "temperatures x particles x states = " + work + " exceeds the compute "
                    + "budget of " + config.computeBudget() + " (STATESUM_COMPUTE_BUDGET)");
        }
    }

    private void checkBudget(int levels, int temperatures, boolean populations, Fields fields) {
        long pairs = (long) levels * temperatures;
        if (pairs > config.computeBudget()) {
            fields.add("", "levels x temperatures = " + pairs + " exceeds the compute budget of "
                    + config.computeBudget() + " pairs (STATESUM_COMPUTE_BUDGET)");
        }
        if (populations && pairs > config.maxPopulationCells()) {
            fields.add("/include", "populations for " + pairs + " (level, temperature) pairs exceed the limit of "
                    + config.maxPopulationCells() + " (STATESUM_MAX_POPULATION_CELLS)");
        }
    }

    private static double[] filled(int size, double value) {
        double[] a = new double[size];
        Arrays.fill(a, value);
        return a;
    }
}
