package org.statesum.api.species;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.statesum.api.request.Fields;
import org.statesum.api.request.Measures;
import org.statesum.models.gas.Atom;
import org.statesum.models.gas.LinearRotor;
import org.statesum.models.gas.NonlinearRotor;
import org.statesum.models.gas.NuclearSpin;
import org.statesum.models.gas.Rotation;

/** Reads {@code rotation}: an atom, a linear rotor or a non-linear rotor, naming every bad field. */
public final class RotationReader {

    private static final List<String> KINDS = List.of("atom", "linear", "nonlinear");
    private static final List<String> TREATMENTS = List.of("high-temperature", "level-sum");
    private static final List<String> MODIFICATIONS = List.of("equilibrium", "normal", "frozen");
    private static final List<String> STATES = List.of("sigma-g-plus", "sigma-g-minus");
    /** Largest symmetry number accepted (the icosahedral rotation group has order 60). */
    private static final int MAX_SYMMETRY_NUMBER = 60;
    /** Rotational temperatures accepted, K: H2 has 88 K, heavy biomolecules ~1e-6 K. */
    private static final double MIN_THETA = 1e-12;
    private static final double MAX_THETA = 1e6;

    private RotationReader() {
    }

    static Optional<Rotation> read(JsonNode node, Fields fields) {
        String p = "/rotation";
        if (node == null || !node.isObject()) {
            fields.add(p, "must be an object with 'kind' one of " + KINDS);
            return Optional.empty();
        }
        Optional<String> kind = fields.oneOf(fields.required(node, "kind", p), p + "/kind", KINDS);
        if (kind.isEmpty()) {
            return Optional.empty();
        }
        return switch (kind.get()) {
            case "atom" -> fields.object(node, p, Set.of("kind")) ? Optional.of(new Atom()) : Optional.empty();
            case "linear" -> linear(node, p, fields);
            default -> nonlinear(node, p, fields);
        };
    }

    private static Optional<Rotation> linear(JsonNode node, String p, Fields fields) {
        fields.object(node, p, Set.of("kind", "rotationalConstant", "momentOfInertia", "symmetryNumber", "treatment",
                "nuclearSpin"));
        OptionalDouble theta = oneOfTwo(node, p, "rotationalConstant", "momentOfInertia", fields)
                .map(name -> name.equals("rotationalConstant")
                        ? Measures.positive(node.get(name), p + "/" + name, GasUnits.ROTATIONAL_CONSTANT, fields)
                        : map(Measures.positive(node.get(name), p + "/" + name, GasUnits.MOMENT, fields)))
                .orElse(OptionalDouble.empty());
        theta = checkTheta(theta, p, fields);
        OptionalDouble sigma = symmetryNumber(node, p, 2, fields);
        boolean levelSum = node.has("treatment")
                && fields.oneOf(node.get("treatment"), p + "/treatment", TREATMENTS).map("level-sum"::equals)
                        .orElse(false);
        NuclearSpin spin = null;
        if (node.has("nuclearSpin")) {
            spin = nuclearSpin(node.get("nuclearSpin"), p + "/nuclearSpin", fields);
            if (!levelSum) {
                fields.add(p + "/nuclearSpin", "nuclear-spin statistics need \"treatment\": \"level-sum\"");
            }
            if (sigma.isPresent() && sigma.getAsDouble() != 2) {
                fields.add(p + "/symmetryNumber", "a homonuclear molecule (nuclearSpin given) has symmetry number 2");
            }
        }
        if (theta.isEmpty() || sigma.isEmpty() || fields.hasErrors()) {
            return Optional.empty();
        }
        return Optional.of(new LinearRotor(theta.getAsDouble(), (int) sigma.getAsDouble(), levelSum, spin));
    }

    private static Optional<Rotation> nonlinear(JsonNode node, String p, Fields fields) {
        fields.object(node, p, Set.of("kind", "rotationalConstants", "momentsOfInertia", "symmetryNumber"));
        Optional<double[]> thetas = oneOfTwo(node, p, "rotationalConstants", "momentsOfInertia", fields)
                .flatMap(name -> name.equals("rotationalConstants")
                        ? Measures.positives(node.get(name), p + "/" + name, 3, GasUnits.ROTATIONAL_CONSTANT, fields)
                        : Measures.positives(node.get(name), p + "/" + name, 3, GasUnits.MOMENT, fields)
                                .map(RotationReader::thetas));
        if (thetas.isPresent()) {
            for (double t : thetas.get()) {
                if (checkTheta(OptionalDouble.of(t), p, fields).isEmpty()) {
                    thetas = Optional.empty();
                    break;
                }
            }
        }
        OptionalDouble sigma = symmetryNumber(node, p, MAX_SYMMETRY_NUMBER, fields);
        if (thetas.isEmpty() || sigma.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new NonlinearRotor(thetas.get(), (int) sigma.getAsDouble()));
    }

    private static NuclearSpin nuclearSpin(JsonNode node, String p, Fields fields) {
        if (!fields.object(node, p, Set.of("spin", "electronicState", "modification", "oddFraction"))) {
            return null;
        }
        OptionalDouble spin = fields.number(fields.required(node, "spin", p), p + "/spin");
        if (spin.isPresent() && !(spin.getAsDouble() >= 0 && spin.getAsDouble() <= 10
                && Math.rint(2 * spin.getAsDouble()) == 2 * spin.getAsDouble())) {
            fields.add(p + "/spin", "must be a multiple of 1/2 from 0 to 10");
        }
        boolean minus = node.has("electronicState") && fields.oneOf(node.get("electronicState"),
                p + "/electronicState", STATES).map("sigma-g-minus"::equals).orElse(false);
        String modification = node.has("modification")
                ? fields.oneOf(node.get("modification"), p + "/modification", MODIFICATIONS).orElse("equilibrium")
                : "equilibrium";
        OptionalDouble odd = OptionalDouble.of(0);
        if (modification.equals("frozen")) {
            odd = Measures.inRange(node, "oddFraction", p + "/oddFraction", 0, 1, Double.NaN, fields);
            if (odd.isPresent() && Double.isNaN(odd.getAsDouble())) {
                fields.add(p + "/oddFraction", "is required for a frozen mixture");
            }
        } else if (node.has("oddFraction")) {
            fields.add(p + "/oddFraction", "only a frozen mixture takes an odd-J fraction");
        }
        if (spin.isEmpty() || odd.isEmpty() || fields.hasErrors()) {
            return null;
        }
        NuclearSpin probe = new NuclearSpin(spin.getAsDouble(), minus, true, 0);
        double x = modification.equals("normal") ? probe.normalOddFraction() : odd.getAsDouble();
        return new NuclearSpin(spin.getAsDouble(), minus, modification.equals("equilibrium"), x);
    }

    /** A rotational temperature must lie within [MIN_THETA, MAX_THETA] K (any real molecule does, widely). */
    private static OptionalDouble checkTheta(OptionalDouble theta, String p, Fields fields) {
        if (theta.isPresent() && !(theta.getAsDouble() >= MIN_THETA && theta.getAsDouble() <= MAX_THETA)) {
            fields.add(p, "the rotational constant or moment gives theta_rot = h c B / k_B = " + theta.getAsDouble()
                    + " K, outside " + MIN_THETA + " to " + MAX_THETA + " K");
            return OptionalDouble.empty();
        }
        return theta;
    }

    private static OptionalDouble symmetryNumber(JsonNode node, String p, int max, Fields fields) {
        OptionalDouble sigma = fields.number(fields.required(node, "symmetryNumber", p), p + "/symmetryNumber");
        if (sigma.isPresent() && !(sigma.getAsDouble() >= 1 && sigma.getAsDouble() <= max
                && Math.rint(sigma.getAsDouble()) == sigma.getAsDouble())) {
            fields.add(p + "/symmetryNumber", "must be an integer from 1 to " + max);
            return OptionalDouble.empty();
        }
        return sigma;
    }

    private static Optional<String> oneOfTwo(JsonNode node, String p, String a, String b, Fields fields) {
        if (node.has(a) == node.has(b)) {
            fields.add(p, "give exactly one of '" + a + "' and '" + b + "'");
            return Optional.empty();
        }
        return Optional.of(node.has(a) ? a : b);
    }

    private static OptionalDouble map(OptionalDouble moment) {
        return moment.isPresent() ? OptionalDouble.of(GasUnits.thetaFromMoment(moment.getAsDouble()))
                : OptionalDouble.empty();
    }

    private static double[] thetas(double[] moments) {
        double[] t = new double[moments.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = GasUnits.thetaFromMoment(moments[i]);
        }
        return t;
    }
}
