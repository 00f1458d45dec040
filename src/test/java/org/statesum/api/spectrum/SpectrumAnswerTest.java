package org.statesum.api.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.JsonSupport;
import org.statesum.api.request.ThermoResponse;
import org.statesum.api.species.SpectrumJob;
import org.statesum.api.species.SpectrumRequestReader;
import org.statesum.models.HeatCapacityMaximum;
import org.statesum.models.LevelSetModel;
import org.statesum.models.ThermoResult;

/**
 * {@link SpectrumAnswer} writes the answer member by member; these requests check that its bytes are
 * exactly those of the map form it replaced ({@link ThermoResponse#of} with {@code system} and
 * {@code heatCapacityMaximum} added, serialized by the service's mapper), across every optional
 * member: populations, a bracketed heat-capacity peak, T = 0 (a null ln Z and a warning), N particles
 * of either statistics in a molar unit, and the per-particle basis.
 */
class SpectrumAnswerTest {

    private static final ServiceConfig CONFIG = ServiceConfig.defaults();
    private static final ObjectMapper MAPPER = JsonSupport.mapper(CONFIG);

    @ParameterizedTest
    @ValueSource(strings = {
        "{\"levels\": {\"energies\": [0, 1]}, \"energyUnit\": \"K\", \"temperatures\": {\"values\": [300]}}",
        "{\"levels\": {\"energies\": [0, 0.01, 0.025], \"degeneracies\": [1, 3, 5]}, \"energyUnit\": \"eV\","
                + " \"temperatures\": {\"start\": 0, \"stop\": 1000, \"count\": 41}, \"include\": [\"populations\"]}",
        "{\"levels\": {\"energies\": [1, 250.5, 800], \"logDegeneracies\": [0, 1.5, 2]}, \"energyUnit\": \"cm-1\","
                + " \"outputUnit\": \"kJ/mol\", \"temperatures\": {\"values\": [0, 10, 300, 5000]},"
                + " \"particles\": {\"count\": 1000, \"statistics\": \"distinguishable\"}}",
        "{\"levels\": {\"energies\": [1, 250.5, 800], \"degeneracies\": [1, 4, 7]}, \"energyUnit\": \"cm-1\","
                + " \"outputUnit\": \"kJ/mol\", \"temperatures\": {\"values\": [0, 10, 300, 5000]},"
                + " \"particles\": {\"count\": 1000, \"statistics\": \"bose-einstein\"}}",
        "{\"levels\": {\"energies\": [0, 2.5]}, \"energyUnit\": \"kcal/mol\", \"temperatures\": {\"start\": 50,"
                + " \"stop\": 3000, \"count\": 30}, \"particles\": {\"count\": 12, \"statistics\": \"distinguishable\"},"
                + " \"basis\": \"per-particle\"}"})
    void bytesAreThoseOfTheMapForm(String request) throws Exception {
        SpectrumController controller = new SpectrumController(CONFIG);
        String written = new String(MAPPER.writeValueAsBytes(controller.answer(MAPPER.readTree(request))),
                StandardCharsets.UTF_8);
        assertEquals(new String(MAPPER.writeValueAsBytes(mapForm(request)), StandardCharsets.UTF_8), written);
    }

    /** The answer as the maps of ThermoResponse, built as the controller built it before SpectrumAnswer. */
    private static Map<String, Object> mapForm(String request) throws Exception {
        SpectrumJob job = new SpectrumRequestReader(CONFIG).read(MAPPER.readTree(request));
        ThermoResult result = LevelSetModel.evaluate(job.levels(), job.temperaturesKelvin(), job.particles(),
                job.withPopulations());
        Map<String, Object> system = new LinkedHashMap<>();
        system.put("particleCount", job.particles().count());
        system.put("statistics", job.particles().statistics().name().toLowerCase(java.util.Locale.ROOT)
                .replace("bose_einstein", "bose-einstein").replace("fermi_dirac", "fermi-dirac"));
        system.put("basis", job.particles().perParticle() ? "per-particle" : "total");
        double particlesPerEntity = job.particles().perParticle() ? 1 : job.particles().count();
        Map<String, Object> answer = ThermoResponse.of(result, job.outputUnit(), system, particlesPerEntity);
        HeatCapacityMaximum.locate(job.levels(), job.particles(), result).ifPresent(max -> answer.put(
                "heatCapacityMaximum", HeatCapacityMaximumAnswer.of(max, job.outputUnit(), particlesPerEntity)));
        return answer;
    }
}
