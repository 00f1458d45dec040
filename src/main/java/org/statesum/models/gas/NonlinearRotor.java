package org.statesum.models.gas;

import java.util.Map;

/**
 * A non-linear rigid rotor in the high-temperature (classical) form:
 * q = (sqrt(pi) / sigma) sqrt(T^3 / (theta_A theta_B theta_C)), U = 3/2 k_B T, C_V = 3/2 k_B,
 * S / k_B = ln q + 3/2. Accurate when T >> theta (error of order theta / T; below 1e-3 k_B for water,
 * the lightest common case, at 298 K: McQuarrie, Statistical Mechanics, 1976, eq. 8-29 and after).
 *
 * @param thetasKelvin the three rotational temperatures h c A / k_B etc., K, positive
 * @param symmetryNumber sigma, the order of the rotational subgroup, >= 1
 */
public record NonlinearRotor(double[] thetasKelvin, int symmetryNumber) implements Rotation {

    @Override
    public GasPart evaluate(double[] temperaturesKelvin) {
        GasPart part = GasPart.zero(temperaturesKelvin.length);
        double product = thetasKelvin[0] * thetasKelvin[1] * thetasKelvin[2];
        for (int j = 0; j < temperaturesKelvin.length; j++) {
            double t = temperaturesKelvin[j];
            double logQ = 0.5 * Math.log(Math.PI) - Math.log(symmetryNumber) + 0.5 * (3 * Math.log(t) - Math.log(product));
            double s = logQ + 1.5;
            part.entropy().values()[j] = s;
            part.entropy().errorBounds()[j] = 16 * GasPart.U * (Math.abs(s) + 1.5 * Math.abs(Math.log(t))
                    + 0.5 * Math.abs(Math.log(product)) + 2);
            part.internalEnergyKelvin().values()[j] = 1.5 * t;
            part.internalEnergyKelvin().errorBounds()[j] = GasPart.U * 1.5 * t;
            part.heatCapacity().values()[j] = 1.5;
        }
        return part;
    }

    @Override
    public void describe(Map<String, Object> precision, double[] temperaturesKelvin) {
        precision.put("rotation", "non-linear rigid rotor, high-temperature form, symmetry number " + symmetryNumber);
    }
}
