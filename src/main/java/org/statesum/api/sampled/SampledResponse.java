package org.statesum.api.sampled;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.api.request.ThermoResponse;
import org.statesum.engine.sampling.FreeEnergyEstimate;
import org.statesum.units.PhysicalConstants;

/**
 * Maps a {@link FreeEnergyEstimate} to the {@code POST /v1/sampled} answer: the dimensionless free
 * energies f_k - f_0 and the matrix of differences f_j - f_i, each with {@code uncertainties} (one
 * statistical standard deviation) beside {@code errorBounds} (numerical error only); the same in
 * the output energy unit, F = f k_B T, when a temperature was given; MBAR's overlap diagnostics, or
 * the pairwise estimators' (effective sample sizes for EXP, two-state overlaps for BAR);
 * then {@code precision}, {@code warnings} and {@code provenance}.
 */
public final class SampledResponse {

    /**
     * Relative rounding of the conversion f -> f k_B T / unit: k_B T, the division by the unit's
     * joules and the product, one rounding each, plus the unit's own conversion error.
     */
    private static final double CONVERSION_RELATIVE_ERROR = 4 * 0x1p-53;

    private SampledResponse() {
    }

    static Map<String, Object> of(FreeEnergyEstimate estimate, SampledJob job) {
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("method", estimate.method());
        Map<String, Object> states = new LinkedHashMap<>();
        states.put("count", job.data().states());
        states.put("sampleCounts", job.data().counts());
        states.put("pooledSamples", job.data().samples());
        body.put("states", states);
        body.put("reducedFreeEnergies", vector("1", 1, estimate.values(), estimate.uncertainties(),
                estimate.errorBounds()));
        body.put("reducedFreeEnergyDifferences", matrix("1", 1, estimate.differences(),
                estimate.differenceUncertainties(), estimate.differenceErrorBounds()));
        if (job.hasTemperature()) {
            double scale = PhysicalConstants.BOLTZMANN_J_PER_K * job.temperatureKelvin()
                    / job.outputUnit().joulesPerUnit();
            String unit = job.outputUnit().symbol();
            Map<String, Object> energies = vector(unit, scale, estimate.values(), estimate.uncertainties(),
                    estimate.errorBounds());
            energies.put("temperature", ThermoResponse.measure("K", "value", job.temperatureKelvin()));
            body.put("freeEnergies", energies);
            body.put("freeEnergyDifferences", matrix(unit, scale, estimate.differences(),
                    estimate.differenceUncertainties(), estimate.differenceErrorBounds()));
        }
        if (estimate.overlap() != null) {
            Map<String, Object> overlap = new LinkedHashMap<>();
            overlap.put("matrix", estimate.overlap().matrix());
            overlap.put("secondLargestEigenvalue", estimate.overlap().secondLargestEigenvalue());
            overlap.put("effectiveSampleSizes", estimate.overlap().effectiveSampleSizes());
            body.put("overlap", overlap);
        }
        if (!estimate.pairs().isEmpty()) {
            body.put("pairs", estimate.pairs().stream().map(pair -> {
                Map<String, Object> m = new LinkedHashMap<>();
                m.put("states", new int[] {pair.lower(), pair.lower() + 1});
                m.put("samples", pair.samples());
                if (!Double.isNaN(pair.effectiveSampleSize())) {
                    m.put("effectiveSampleSize", pair.effectiveSampleSize());
                }
                if (!Double.isNaN(pair.overlap())) {
                    m.put("overlap", pair.overlap());
                }
                return m;
            }).toList());
        }
        body.put("precision", estimate.precision());
        body.put("warnings", estimate.warnings().stream().map(w -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("code", w.code());
            m.put("message", w.message());
            m.put("states", w.states());
            return m;
        }).toList());
        body.put("provenance", ThermoResponse.provenance());
        return body;
    }

    private static Map<String, Object> vector(String unit, double scale, double[] values, double[] sd,
            double[] bounds) {
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("unit", unit);
        out.put("reference", 0);
        out.put("values", scaled(values, scale));
        out.put("uncertainties", scaled(sd, scale));
        out.put("errorBounds", bounds(values, bounds, scale));
        return out;
    }

    private static Map<String, Object> matrix(String unit, double scale, double[][] values, double[][] sd,
            double[][] bounds) {
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("unit", unit);
        out.put("values", Arrays.stream(values).map(r -> scaled(r, scale)).toList());
        out.put("uncertainties", Arrays.stream(sd).map(r -> scaled(r, scale)).toList());
        List<double[]> b = new java.util.ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            b.add(bounds(values[i], bounds[i], scale));
        }
        out.put("errorBounds", b);
        return out;
    }

    private static double[] scaled(double[] values, double scale) {
        if (scale == 1) {
            return values;
        }
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = values[i] * scale;
        }
        return out;
    }

    private static double[] bounds(double[] values, double[] bounds, double scale) {
        if (scale == 1) {
            return bounds;
        }
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = (bounds[i] + CONVERSION_RELATIVE_ERROR * Math.abs(values[i])) * scale;
        }
        return out;
    }
}
