package org.statesum.api;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonSerializable;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.jsontype.TypeSerializer;
import java.io.IOException;
import java.util.Map;
import org.statesum.engine.ParticleStatistics;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;
import org.statesum.models.HeatCapacityMaximum;
import org.statesum.models.Particles;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;
import org.statesum.units.EnergyUnit;

/**
 * The answer of {@code POST /v1/spectrum}, written member by member to the generator: the same bytes
 * as {@link ThermoResponse#of} plus {@code system} and {@code heatCapacityMaximum} serialized as maps
 * (member order, units, error bounds, non-finite numbers as null), without building those maps for
 * every request. Building and walking the nested maps cost more than the small job's physics.
 *
 * @param result the model's result, SI
 * @param unit the output unit
 * @param particles count, statistics and basis (the {@code system} member)
 * @param maximum the heat-capacity maximum, or null when the grid does not bracket one
 */
record SpectrumAnswer(ThermoResult result, EnergyUnit unit, Particles particles, HeatCapacityMaximum maximum)
        implements JsonSerializable {

    @Override
    public void serialize(JsonGenerator gen, SerializerProvider provider) throws IOException {
        double particlesPerEntity = particles.perParticle() ? 1 : particles.count();
        gen.writeStartObject();
        gen.writeFieldName("temperature");
        gen.writeStartObject();
        gen.writeStringField("unit", "K");
        writeNumbers(gen, "values", result.temperaturesKelvin());
        gen.writeEndObject();
        double perParticle = unit.molar() ? 1.0 / particlesPerEntity : 1.0;
        for (Map.Entry<Quantity, Series> entry : result.series().entrySet()) {
            // as ThermoResponse.of: the unit conversion, then 1/N for a molar unit
            Series converted = ThermoResponse.converted(entry.getKey(), entry.getValue(), unit);
            if (perParticle != 1.0 && entry.getKey().dimension() != Quantity.Dimension.NONE) {
                converted = converted.scaled(perParticle);
            }
            gen.writeFieldName(ThermoResponse.wireName(entry.getKey()));
            gen.writeStartObject();
            gen.writeStringField("unit", ThermoResponse.symbol(entry.getKey(), unit));
            writeNumbers(gen, "values", converted.values());
            writeNumbers(gen, "errorBounds", converted.errorBounds());
            gen.writeEndObject();
        }
        if (result.populations() != null) {
            gen.writeFieldName("populations");
            gen.writeStartObject();
            gen.writeStringField("unit", "1");
            gen.writeFieldName("values");
            provider.defaultSerializeValue(result.populations().values(), gen);
            gen.writeFieldName("errorBounds");
            provider.defaultSerializeValue(result.populations().errorBounds(), gen);
            gen.writeEndObject();
        }
        gen.writeFieldName("system");
        gen.writeStartObject();
        gen.writeFieldName("particleCount");
        writeNumber(gen, particles.count());
        gen.writeStringField("statistics", particles.statistics() == ParticleStatistics.INDISTINGUISHABLE
                ? "indistinguishable" : "distinguishable");
        gen.writeStringField("basis", particles.perParticle() ? "per-particle" : "total");
        gen.writeEndObject();
        gen.writeFieldName("precision");
        writeMap(gen, provider, result.precision());
        gen.writeFieldName("warnings");
        gen.writeStartArray();
        for (Warning warning : result.warnings()) {
            gen.writeStartObject();
            gen.writeStringField("code", warning.code());
            gen.writeStringField("message", warning.message());
            writeNumbers(gen, "temperatures", warning.temperatures());
            gen.writeEndObject();
        }
        gen.writeEndArray();
        gen.writeFieldName("provenance");
        writeMap(gen, provider, ThermoResponse.provenance());
        if (maximum != null) {
            gen.writeFieldName("heatCapacityMaximum");
            provider.defaultSerializeValue(HeatCapacityMaximumAnswer.of(maximum, unit, particlesPerEntity), gen);
        }
        gen.writeEndObject();
    }

    @Override
    public void serializeWithType(JsonGenerator gen, SerializerProvider provider, TypeSerializer typeSer)
            throws IOException {
        serialize(gen, provider); // the mapper types nothing polymorphically
    }

    /** A flat map of strings and numbers directly; anything else through the mapper's serializers. */
    private static void writeMap(JsonGenerator gen, SerializerProvider provider, Map<String, Object> map)
            throws IOException {
        gen.writeStartObject();
        for (Map.Entry<String, Object> member : map.entrySet()) {
            gen.writeFieldName(member.getKey());
            Object value = member.getValue();
            if (value instanceof String text) {
                gen.writeString(text);
            } else if (value instanceof Integer count) {
                gen.writeNumber(count);
            } else if (value instanceof Double number) {
                writeNumber(gen, number);
            } else {
                provider.defaultSerializeValue(value, gen);
            }
        }
        gen.writeEndObject();
    }

    /** As {@link JsonSupport}'s array serializer: a non-finite element is written as null. */
    private static void writeNumbers(JsonGenerator gen, String name, double[] values) throws IOException {
        gen.writeFieldName(name);
        gen.writeStartArray(values, values.length);
        for (double v : values) {
            writeNumber(gen, v);
        }
        gen.writeEndArray();
    }

    private static void writeNumber(JsonGenerator gen, double value) throws IOException {
        if (Double.isFinite(value)) {
            gen.writeNumber(value);
        } else {
            gen.writeNull();
        }
    }
}
