package org.statesum.api.species;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.api.request.Fields;
import org.statesum.api.request.Measures;
import org.statesum.models.gas.LowFrequency;
import org.statesum.models.gas.Vibrations;

/**
 * Reads {@code vibrations}: wavenumbers (cm-1), a scale factor, the transition-state mark and the
 * low-frequency treatment. Negative wavenumbers stand for imaginary modes: each is an error unless the
 * species is a transition state, which must have exactly one (dropped and reported).
 */
public final class VibrationReader {

    /** What was read: the modes and the imaginary wavenumber dropped (NaN when none). */
    record Result(Vibrations vibrations, double droppedImaginary) {
    }

    private static final Set<String> FIELDS = Set.of("wavenumbers", "scaleFactor", "transitionState",
            "lowFrequency");
    private static final Set<String> LOW = Set.of("entropy", "energy", "cutoff", "alpha", "averageMomentOfInertia",
            "floor");
    private static final List<String> TREATMENTS = List.of("harmonic", "free-rotor-interpolation");
    /** Largest wavenumber accepted, cm-1 (far above any molecular vibration; keeps theta / T finite). */
    private static final double MAX_WAVENUMBER = 1e6;

    private VibrationReader() {
    }

    static Optional<Result> read(JsonNode node, int maxModes, Fields fields) {
        String p = "/vibrations";
        if (node == null) {
            return Optional.of(new Result(Vibrations.of(new double[0], LowFrequency.harmonic()), Double.NaN));
        }
        if (!fields.object(node, p, FIELDS)) {
            return Optional.empty();
        }
        Optional<double[]> raw = fields.numbers(fields.required(node, "wavenumbers", p), p + "/wavenumbers",
                maxModes);
        OptionalDouble scale = Measures.inRange(node, "scaleFactor", p + "/scaleFactor", 0.5, 1.5, 1, fields);
        boolean transitionState = false;
        if (node.has("transitionState")) {
            if (node.get("transitionState").isBoolean()) {
                transitionState = node.get("transitionState").booleanValue();
            } else {
                fields.add(p + "/transitionState", "must be true or false");
            }
        }
        Optional<LowFrequency> low = lowFrequency(node.get("lowFrequency"), p + "/lowFrequency", fields);
        if (raw.isEmpty() || scale.isEmpty() || low.isEmpty()) {
            return Optional.empty();
        }
        double[] w = raw.get();
        List<Integer> imaginary = new ArrayList<>();
        List<Double> kept = new ArrayList<>();
        boolean good = true;
        for (int i = 0; i < w.length; i++) {
            if (w[i] < 0) {
                imaginary.add(i);
            } else if (!(w[i] > 0 && w[i] <= MAX_WAVENUMBER)) {
                fields.add(p + "/wavenumbers/" + i, "must be positive (zero is a translation or rotation, "
                        + "not a vibration) and at most " + MAX_WAVENUMBER + " cm-1");
                good = false;
            } else {
                kept.add(w[i] * scale.getAsDouble());
            }
        }
        double dropped = Double.NaN;
        if (transitionState && imaginary.size() == 1) {
            dropped = w[imaginary.get(0)];
        } else if (transitionState) {
            String why = imaginary.isEmpty() ? "a transition state needs exactly one imaginary (negative) mode; "
                    + "none found" : "a transition state has exactly one imaginary mode; found " + imaginary.size();
            if (imaginary.isEmpty()) {
                fields.add(p + "/wavenumbers", why);
            }
            imaginary.forEach(i -> fields.add(p + "/wavenumbers/" + i, why));
            good = false;
        } else {
            imaginary.forEach(i -> fields.add(p + "/wavenumbers/" + i, "imaginary mode (negative wavenumber) in a "
                    + "minimum; remove it, or set \"transitionState\": true if this is a transition state"));
            good &= imaginary.isEmpty();
        }
        if (!good) {
            return Optional.empty();
        }
        double[] modes = kept.stream().mapToDouble(Double::doubleValue).toArray();
        return Optional.of(new Result(Vibrations.of(modes, low.get()), dropped));
    }

    private static Optional<LowFrequency> lowFrequency(JsonNode node, String p, Fields fields) {
        if (node == null) {
            return Optional.of(LowFrequency.harmonic());
        }
        if (!fields.object(node, p, LOW)) {
            return Optional.empty();
        }
        boolean entropy = node.has("entropy") && fields.oneOf(node.get("entropy"), p + "/entropy", TREATMENTS)
                .map("free-rotor-interpolation"::equals).orElse(false);
        boolean energy = node.has("energy") && fields.oneOf(node.get("energy"), p + "/energy", TREATMENTS)
                .map("free-rotor-interpolation"::equals).orElse(false);
        OptionalDouble cutoff = Measures.inRange(node, "cutoff", p + "/cutoff", 1, 10_000,
                LowFrequency.DEFAULT_CUTOFF, fields);
        OptionalDouble alpha = Measures.inRange(node, "alpha", p + "/alpha", 0.5, 64, LowFrequency.DEFAULT_ALPHA,
                fields);
        OptionalDouble moment = Measures.inRange(node, "averageMomentOfInertia", p + "/averageMomentOfInertia",
                1e-50, 1e-40, LowFrequency.DEFAULT_AVERAGE_MOMENT, fields);
        OptionalDouble floor = Measures.inRange(node, "floor", p + "/floor", 0, 10_000, 0, fields);
        if (cutoff.isEmpty() || alpha.isEmpty() || moment.isEmpty() || floor.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new LowFrequency(entropy, energy, cutoff.getAsDouble(), alpha.getAsDouble(),
                moment.getAsDouble(), floor.getAsDouble()));
    }
}
