package org.statesum.models.gas;

import java.util.Map;

/** An atom has no rotational degrees of freedom: q_rot = 1. */
public record Atom() implements Rotation {

    @Override
    public GasPart evaluate(double[] temperaturesKelvin) {
        return GasPart.zero(temperaturesKelvin.length);
    }

    @Override
    public void describe(Map<String, Object> precision, double[] temperaturesKelvin) {
        precision.put("rotation", "none (atom)");
    }
}
