package org.statesum.api.request;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.StreamWriteConstraints;
import com.fasterxml.jackson.core.StreamWriteFeature;
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
import org.statesum.api.config.ServiceConfig;

/**
 * The one configured {@link ObjectMapper}: stream limits from the service configuration, duplicate
 * keys rejected, no coercion of strings to numbers, and non-finite numbers never written (a NaN in a
 * {@code double[]} or a {@code Double} becomes JSON {@code null}, which the contract uses for
 * undefined points). The tokens NaN and Infinity are read, only so that {@link FiniteNumbers} can name
 * every one of them in a single 422 instead of the parser stopping at the first.
 */
public final class JsonSupport {

    /** Longest number literal accepted, in characters: far beyond the 17 digits a double holds. */
    static final int MAX_NUMBER_LENGTH = 1000;

    private JsonSupport() {
    }

    public static ObjectMapper mapper(ServiceConfig config) {
        JsonFactory factory = JsonFactory.builder()
                .streamReadConstraints(StreamReadConstraints.builder()
                        .maxNestingDepth(config.maxNestingDepth())
                        .maxStringLength(config.maxStringLength())
                        .maxNumberLength(MAX_NUMBER_LENGTH)
                        .maxNameLength(config.maxStringLength())
                        .maxDocumentLength(Math.max(config.maxBodyBytes(), config.maxStreamedBodyBytes()))
                        .build())
                .streamWriteConstraints(StreamWriteConstraints.builder().maxNestingDepth(64).build())
                .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
                .disable(JsonWriteFeature.WRITE_NAN_AS_STRINGS)
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                // Schubfach shortest round-trip output: the same doubles, several times faster than
                // Double.toString on Java 17 (writing was half of a small spectrum request's own time)
                .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
                // Correctly rounded like Double.parseDouble (the same doubles), several times faster:
                // reading 1e5 energies was a quarter of a large spectrum request's time (bench/http.sh).
                .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
                .build();
        SimpleModule finiteOnly = new SimpleModule("finite-only");
        finiteOnly.addSerializer(double[].class, new FiniteArraySerializer());
        finiteOnly.addSerializer(Double.class, new FiniteDoubleSerializer());
        finiteOnly.addSerializer(Double.TYPE, new FiniteDoubleSerializer());
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

    /** Writes a double, or null when it is not finite. */
    private static final class FiniteDoubleSerializer extends StdSerializer<Double> {

        private static final long serialVersionUID = 1L;

        FiniteDoubleSerializer() {
            super(Double.class);
        }

        @Override
        public void serialize(Double value, JsonGenerator gen, SerializerProvider provider) throws IOException {
            if (Double.isFinite(value)) {
                gen.writeNumber(value);
            } else {
                gen.writeNull();
            }
        }
    }
}
