package org.statesum.api.ranking;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.request.Fields;
import org.statesum.api.request.Measures;
import org.statesum.api.request.TemperatureGridReader;
import org.statesum.api.request.ThermoResponse;
import org.statesum.api.species.SpeciesEntryReader;
import org.statesum.api.species.SpeciesKinds;
import org.statesum.engine.Series;
import org.statesum.models.Quantity;
import org.statesum.models.ranking.RankingModel;
import org.statesum.units.EnergyUnit;

/**
 * {@code POST /v1/ranking}: {@code candidates} ({name, model, input}, the species shapes of reactions,
 * ensembles included, all in one standard state), a temperature grid, an output unit. Per temperature:
 * the order by G, each gap G - G_min with its bound, the most stable candidate and whether that verdict
 * is certain (no other candidate within the bounds); and every temperature where two candidates
 * exchange places, with its bound.
 */
public final class RankingController implements ComputeEndpoint {

    private static final Set<String> TOP = Set.of("candidates", "temperatures", "outputUnit", "rootTolerance");
    private static final Set<String> CANDIDATE = Set.of("name", "model", "input");
    /** Most candidates in one ranking (pairs are searched for exchanges: 496 pairs at most). */
    static final int MAX_CANDIDATES = 32;

    private final ServiceConfig config;
    private final SpeciesEntryReader entries;

    public RankingController(ServiceConfig config) {
        this.config = config;
        this.entries = new SpeciesEntryReader(SpeciesKinds.standard(config));
    }

    @Override
    public Object answer(JsonNode body) {
        Fields fields = new Fields();
        if (!fields.object(body, "", TOP)) {
            fields.throwIfAny();
        }
        JsonNode grid = fields.required(body, "temperatures", "");
        Optional<double[]> temperatures = Optional.ofNullable(grid)
                .flatMap(t -> TemperatureGridReader.read(t, "/temperatures", config.maxTemperatures(), fields));
        Optional<EnergyUnit> unit = body.has("outputUnit")
                ? fields.oneOf(body.get("outputUnit"), "/outputUnit", EnergyUnit.symbols()).flatMap(EnergyUnit::bySymbol)
                : EnergyUnit.bySymbol("kJ/mol");
        OptionalDouble tolerance = Measures.inRange(body, "rootTolerance", "/rootTolerance", 1e-12, 1, 1e-6, fields);
        JsonNode list = fields.required(body, "candidates", "");
        List<RankingModel.Candidate> candidates = new ArrayList<>();
        if (list != null && (!list.isArray() || list.size() < 2 || list.size() > MAX_CANDIDATES)) {
            fields.add("/candidates", "must be an array of 2 to " + MAX_CANDIDATES + " candidates");
        } else if (list != null) {
            Set<String> names = new HashSet<>();
            String state = null;
            for (int i = 0; i < list.size(); i++) {
                Optional<SpeciesEntryReader.Entry> entry = entries.read(list.get(i), "/candidates/" + i, CANDIDATE, grid,
                        temperatures.isPresent(), names, fields);
                if (entry.isPresent()) {
                    String own = entry.get().thermo().standardState();
                    if (state == null) {
                        state = own;
                    } else if (!state.equals(own)) {
                        fields.add("/candidates/" + i + "/model", "candidates must share one standard state to be "
                                + "ranked: this one is '" + own + "', the first '" + state + "'");
                    }
                    candidates.add(new RankingModel.Candidate(entry.get().name(), entry.get().thermo()));
                }
            }
        }
        fields.throwIfAny();
        RankingModel.Result result = RankingModel.evaluate(candidates, temperatures.get(), tolerance.getAsDouble());
        return answer(result, candidates, unit.get());
    }

    private static Map<String, Object> answer(RankingModel.Result result, List<RankingModel.Candidate> candidates,
            EnergyUnit unit) {
        List<String> names = candidates.stream().map(RankingModel.Candidate::name).toList();
        double perJoule = ThermoResponse.converted(Quantity.GIBBS_ENERGY, new Series(new double[] {1}, new double[] {0}),
                unit).values()[0];
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("temperature", ThermoResponse.measure("K", "values", result.temperaturesKelvin()));
        Map<String, Object> gibbs = new LinkedHashMap<>();
        gibbs.put("unit", unit.symbol());
        gibbs.put("candidates", names);
        gibbs.put("values", result.gibbs().stream().map(s -> s.scaled(perJoule).values()).toList());
        gibbs.put("errorBounds", result.gibbs().stream().map(s -> s.scaled(perJoule).errorBounds()).toList());
        out.put("gibbsEnergies", gibbs);
        List<Map<String, Object>> ranks = new ArrayList<>();
        for (int j = 0; j < result.ranks().size(); j++) {
            RankingModel.Rank r = result.ranks().get(j);
            Map<String, Object> rank = new LinkedHashMap<>();
            rank.put("temperature", result.temperaturesKelvin()[j]);
            rank.put("order", java.util.Arrays.stream(r.order()).mapToObj(names::get).toList());
            Map<String, Object> gaps = new LinkedHashMap<>();
            gaps.put("unit", unit.symbol());
            gaps.put("values", java.util.Arrays.stream(r.order()).mapToDouble(i -> r.gaps()[i] * perJoule).toArray());
            gaps.put("errorBounds", java.util.Arrays.stream(r.order())
                    .mapToDouble(i -> r.gapBounds()[i] * perJoule * (1 + 0x1.0p-52)).toArray());
            rank.put("gaps", gaps);
            rank.put("mostStable", names.get(r.order()[0]));
            rank.put("certain", r.tied().length == 1);
            rank.put("tiedWithMostStable", java.util.Arrays.stream(r.tied()).mapToObj(names::get).toList());
            ranks.add(rank);
        }
        out.put("ranking", ranks);
        out.put("exchanges", result.exchanges().stream().map(e -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("candidates", List.of(e.first(), e.second()));
            m.put("temperature", e.at().temperatureKelvin());
            m.put("solverTolerance", e.at().solverToleranceKelvin());
            m.put("errorBound", e.at().errorBoundKelvin());
            m.put("lowerBelow", e.lowerBelow());
            return m;
        }).toList());
        Map<String, Object> system = new LinkedHashMap<>();
        system.put("candidates", names);
        system.put("standardState", candidates.get(0).thermo().standardState());
        out.put("system", system);
        out.put("precision", result.precision());
        out.put("warnings", ThermoResponse.warnings(result.warnings()));
        out.put("provenance", ThermoResponse.provenance());
        return out;
    }
}
