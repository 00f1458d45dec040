package org.statesum.api.sampled;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import org.statesum.api.request.BodyProblems;
import org.statesum.api.request.ComputeEndpoint;
import org.statesum.api.request.Fields;
import org.statesum.engine.sampling.BennettAcceptanceRatio;
import org.statesum.engine.sampling.ExponentialAveraging;
import org.statesum.engine.sampling.FreeEnergyEstimate;
import org.statesum.engine.sampling.Mbar;

/**
 * {@code POST /v1/sampled}: free-energy differences from sampled reduced potentials. Served from the
 * request stream (large matrices, gzip) and, through {@link ComputeEndpoint}, from a parsed tree.
 */
public final class SampledController implements ComputeEndpoint {

    private final ObjectMapper mapper;

    public SampledController(ObjectMapper mapper) {
        this.mapper = mapper;
    }

    @Override
    public Object answer(JsonNode body) {
        try (JsonParser parser = body.traverse(mapper)) {
            return answer(parser);
        } catch (IOException e) {
            throw BodyProblems.unreadable(e);
        }
    }

    /** Answers a body read straight from the request stream. */
    public Object answer(InputStream body) {
        try (InputStream in = body; JsonParser parser = mapper.createParser(in)) {
            return answer(parser);
        } catch (IOException e) {
            throw BodyProblems.unreadable(e);
        }
    }

    private Object answer(JsonParser parser) throws IOException {
        Fields fields = new Fields();
        SampledBodyParser.Body body = SampledBodyParser.read(parser, mapper, fields);
        SampledJob job = SampledRequestReader.read(body, fields);
        FreeEnergyEstimate estimate = switch (job.method()) {
            case "exponential-averaging" -> ExponentialAveraging.estimate(job.data(), job.forward());
            case "bar" -> BennettAcceptanceRatio.estimate(job.data());
            default -> Mbar.estimate(job.data());
        };
        return SampledResponse.of(estimate, job);
    }
}
