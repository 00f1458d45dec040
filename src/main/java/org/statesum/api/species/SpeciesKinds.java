package org.statesum.api.species;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.statesum.api.config.ServiceConfig;
import org.statesum.api.request.FieldError;
import org.statesum.api.request.ProblemException;
import org.statesum.models.reaction.CrystalThermo;
import org.statesum.models.reaction.IdealGasThermo;
import org.statesum.models.reaction.LevelSetThermo;
import org.statesum.models.reaction.QuasiHarmonicThermo;

/**
 * The model kinds a reaction species may name in {@code "model"}, each reading the body of its own
 * endpoint. Adding a kind is one {@link #register} call here.
 */
public final class SpeciesKinds {

    private final Map<String, SpeciesKind> kinds = new LinkedHashMap<>();

    /** The reader of ensemble bodies over the standard kinds (for {@code POST /v1/ensemble}). */
    public static EnsembleReader ensembles(ServiceConfig config) {
        return new EnsembleReader(standard(config), config);
    }

    /** The kinds served today. */
    public static SpeciesKinds standard(ServiceConfig config) {
        SpectrumRequestReader spectrum = new SpectrumRequestReader(config);
        IdealGasRequestReader gas = new IdealGasRequestReader(config);
        CrystalRequestReader crystal = new CrystalRequestReader(config);
        QuasiHarmonicRequestReader quasiHarmonic = new QuasiHarmonicRequestReader(config);
        SpeciesKinds kinds = new SpeciesKinds()
                .register("ideal-gas", input -> new IdealGasThermo(gas.read(input).species()))
                .register("spectrum", input -> {
                    SpectrumJob job = spectrum.read(input);
                    return new LevelSetThermo(job.levels(), job.particles());
                })
                .register("crystal", input -> new CrystalThermo(crystal.read(input).crystal()))
                .register("quasi-harmonic", input -> {
                    QuasiHarmonicJob job = quasiHarmonic.read(input);
                    if (job.pressuresPascal().length != 1) {
                        throw ProblemException.invalid(List.of(new FieldError("/pressures/values",
                                "a reaction species is taken at one pressure")));
                    }
                    return new QuasiHarmonicThermo(job.crystal(), job.pressuresPascal()[0]);
                });
        // an ensemble's members are any kind, an ensemble among them: the reader looks kinds up here
        EnsembleReader ensembles = new EnsembleReader(kinds, config);
        return kinds.register("ensemble", ensembles::read);
    }

    SpeciesKinds register(String name, SpeciesKind kind) {
        kinds.put(name, kind);
        return this;
    }

    public Optional<SpeciesKind> find(String name) {
        return Optional.ofNullable(kinds.get(name));
    }

    public List<String> names() {
        return List.copyOf(Collections.unmodifiableMap(kinds).keySet());
    }
}
