package org.statesum.api;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamWriteConstraints;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.core.json.JsonWriteFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import java.io.IOException;

/**
 * The one configured {@link ObjectMapper}: stream limits from the service configuration, duplicate
 * keys rejected, no coercion of strings to numbers, and non-finite numbers never written (a NaN in a
 * {@code double[]} becomes JSON {@code null}, which the contract uses for undefined points).
 */
public final class JsonSupport {

    private JsonSupport() {
    }

    public static ObjectMapper mapper(ServiceConfig config) {
        JsonFactory factory = JsonFactory.builder()
                .streamReadConstraints(StreamReadConstraints.builder()
                        .maxNestingDepth(config.maxNestingDepth())
                        .maxStringLength(config.maxStringLength())
                        .maxNumberLength(1000)
                        .maxNameLength(config.maxStringLength())
                        .maxDocumentLength(config.maxBodyBytes())
                        .build())
                .streamWriteConstraints(StreamWriteConstraints.builder().maxNestingDepth(64).build())
                .disable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
                .disable(JsonWriteFeature.WRITE_NAN_AS_STRINGS)
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                // Correctly rounded like Double.parseDouble (the same doubles), several times faster:
                // reading 1e5 energies was a quarter of a large spectrum request's time (bench/http.sh).
                .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
                .build();
        SimpleModule finiteOnly = new SimpleModule("finite-only");
        finiteOnly.addSerializer(double[].class, new FiniteArraySerializer());
        return JsonMapper.builder(factory)
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .disable(MapperFeature.ALLOW_COERCION_OF_SCALARS)
                .addModule(finiteOnly)
                .build();
    }

    /** Writes a double[] with every non-finite element as null. */
    private static final class FiniteArraySerializer extends StdSerializer<double[]> {

        private static final long serialVersionUID = 1L;

        FiniteArraySerializer() {
            super(double[].class);
        }

        @Override
        public void serialize(double[] values, JsonGenerator gen, SerializerProvider provider) throws IOException {
            gen.writeStartArray(values, values.length);
            for (double v : values) {
                if (Double.isFinite(v)) {
                    gen.writeNumber(v);
                } else {
                    gen.writeNull();
                }
            }
            gen.writeEndArray();
        }
    }
}
