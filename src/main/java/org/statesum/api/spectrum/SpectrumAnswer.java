package org.statesum.api.spectrum;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.io.SerializedString;
import com.fasterxml.jackson.databind.JsonSerializable;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.jsontype.TypeSerializer;
import java.io.IOException;
import java.util.EnumMap;
import java.util.Map;
import org.statesum.api.request.ThermoResponse;
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
public record SpectrumAnswer(ThermoResult result, EnergyUnit unit, Particles particles, HeatCapacityMaximum maximum)
        implements JsonSerializable {

    // Member names encoded once: the generator copies their bytes instead of escaping them each time.
    private static final SerializedString BASIS = new SerializedString("basis");
    private static final SerializedString CODE = new SerializedString("code");
    private static final SerializedString ERROR_BOUNDS = new SerializedString("errorBounds");
    private static final SerializedString HEAT_CAPACITY_MAXIMUM = new SerializedString("heatCapacityMaximum");
    private static final SerializedString MESSAGE = new SerializedString("message");
    private static final SerializedString PARTICLE_COUNT = new SerializedString("particleCount");
    private static final SerializedString POPULATIONS = new SerializedString("populations");
    private static final SerializedString PRECISION = new SerializedString("precision");
    private static final SerializedString PROVENANCE = new SerializedString("provenance");
    private static final SerializedString STATISTICS = new SerializedString("statistics");
    private static final SerializedString SYSTEM = new SerializedString("system");
    private static final SerializedString TEMPERATURE = new SerializedString("temperature");
    private static final SerializedString TEMPERATURES = new SerializedString("temperatures");
    private static final SerializedString UNIT = new SerializedString("unit");
    private static final SerializedString VALUES = new SerializedString("values");
    private static final SerializedString WARNINGS = new SerializedString("warnings");
    private static final Map<Quantity, SerializedString> WIRE_NAMES = wireNames();

    @Override
    public void serialize(JsonGenerator gen, SerializerProvider provider) throws IOException {
        double particlesPerEntity = particles.perParticle() ? 1 : particles.count();
        gen.writeStartObject();
        gen.writeFieldName(TEMPERATURE);
        gen.writeStartObject();
        writeString(gen, UNIT, "K");
        writeNumbers(gen, VALUES, result.temperaturesKelvin());
        gen.writeEndObject();
        double perParticle = unit.molar() ? 1.0 / particlesPerEntity : 1.0;
        for (Map.Entry<Quantity, Series> entry : result.series().entrySet()) {
            // as ThermoResponse.of: the unit conversion, then 1/N for a molar unit
            Series converted = ThermoResponse.converted(entry.getKey(), entry.getValue(), unit);
            if (perParticle != 1.0 && entry.getKey().extensive()) {
                converted = converted.scaled(perParticle);
            }
            gen.writeFieldName(WIRE_NAMES.get(entry.getKey()));
            gen.writeStartObject();
            writeString(gen, UNIT, ThermoResponse.symbol(entry.getKey(), unit));
            writeNumbers(gen, VALUES, converted.values());
            writeNumbers(gen, ERROR_BOUNDS, converted.errorBounds());
            gen.writeEndObject();
        }
        if (result.populations() != null) {
            gen.writeFieldName(POPULATIONS);
            gen.writeStartObject();
            writeString(gen, UNIT, "1");
            gen.writeFieldName(VALUES);
            provider.defaultSerializeValue(result.populations().values(), gen);
            gen.writeFieldName(ERROR_BOUNDS);
            provider.defaultSerializeValue(result.populations().errorBounds(), gen);
            gen.writeEndObject();
        }
        gen.writeFieldName(SYSTEM);
        gen.writeStartObject();
        gen.writeFieldName(PARTICLE_COUNT);
        writeNumber(gen, particles.count());
        writeString(gen, STATISTICS, switch (particles.statistics()) {
            case INDISTINGUISHABLE -> "indistinguishable";
            case BOSE_EINSTEIN -> "bose-einstein";
            case FERMI_DIRAC -> "fermi-dirac";
            case DISTINGUISHABLE -> "distinguishable";
        });
        writeString(gen, BASIS, particles.perParticle() ? "per-particle" : "total");
        gen.writeEndObject();
        gen.writeFieldName(PRECISION);
        writeMap(gen, provider, result.precision());
        gen.writeFieldName(WARNINGS);
        gen.writeStartArray();
        for (Warning warning : result.warnings()) {
            gen.writeStartObject();
            writeString(gen, CODE, warning.code());
            writeString(gen, MESSAGE, warning.message());
            writeNumbers(gen, TEMPERATURES, warning.temperatures());
            gen.writeEndObject();
        }
        gen.writeEndArray();
        gen.writeFieldName(PROVENANCE);
        writeMap(gen, provider, ThermoResponse.provenance());
        if (maximum != null) {
            gen.writeFieldName(HEAT_CAPACITY_MAXIMUM);
            provider.defaultSerializeValue(HeatCapacityMaximumAnswer.of(maximum, unit, particlesPerEntity), gen);
        }
        gen.writeEndObject();
    }

    private static Map<Quantity, SerializedString> wireNames() {
        Map<Quantity, SerializedString> names = new EnumMap<>(Quantity.class);
        for (Quantity quantity : Quantity.values()) {
            names.put(quantity, new SerializedString(ThermoResponse.wireName(quantity)));
        }
        return names;
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

    /** As {@link org.statesum.api.request.JsonSupport}'s array serializer: a non-finite element is written as null. */
    private static void writeString(JsonGenerator gen, SerializedString name, String value) throws IOException {
        gen.writeFieldName(name);
        gen.writeString(value);
    }

    private static void writeNumbers(JsonGenerator gen, SerializedString name, double[] values) throws IOException {
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
