package org.statesum.models.gas;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.statesum.engine.DomainException;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;
import org.statesum.units.PhysicalConstants;

/**
 * An ideal gas of one molecular species, per molecule, in its standard state:
 * U = sum of the parts' U (including the zero-point energy and E_el), S = sum of the parts' S,
 * F = U - T S, H = U + k_B T (pV of one molecule), G = F + k_B T = H - T S, C_V = sum of the parts,
 * C_p = C_V + k_B. Valid where the gas is ideal and the factorisation of q holds (rigid rotor,
 * harmonic or interpolated vibrations, no rotation-vibration coupling).
 *
 * <p>Error bounds: the parts' bounds (see each part) summed, plus the rounding of the sums and of the
 * conversion to SI.
 */
public final class IdealGasModel {

    private static final double U = GasPart.U;
    /** theta_rot / T above which the classical rotor is flagged (error of ln q ~ theta / 3T = 0.017). */
    public static final double CLASSICAL_ROTOR_LIMIT = 0.05;
    private static final double K = PhysicalConstants.BOLTZMANN_J_PER_K;

    private IdealGasModel() {
    }

    /**
     * Evaluates the species.
     *
     * @param temperaturesKelvin the grid, K, each positive (S diverges at T = 0)
     * @throws DomainException TEMPERATURE_NOT_POSITIVE naming the first T = 0
     */
    public static IdealGasResult evaluate(IdealGasSpecies species, double[] temperaturesKelvin) {
        for (int j = 0; j < temperaturesKelvin.length; j++) {
            if (!(temperaturesKelvin[j] > 0)) {
                throw new DomainException("TEMPERATURE_NOT_POSITIVE", "/temperatures/values/" + j,
                        "an ideal gas needs T > 0 (its entropy diverges at T = 0)");
            }
        }
        Map<GasContribution, GasPart> parts = new EnumMap<>(GasContribution.class);
        parts.put(GasContribution.TRANSLATIONAL,
                Translation.of(species.massKilogram(), species.state()).evaluate(temperaturesKelvin));
        parts.put(GasContribution.ROTATIONAL, species.rotation().evaluate(temperaturesKelvin));
        parts.put(GasContribution.VIBRATIONAL, species.vibrations().evaluate(temperaturesKelvin));
        parts.put(GasContribution.ELECTRONIC, species.electronic().evaluate(temperaturesKelvin));

        Map<GasContribution, Map<Quantity, Series>> contributions = new EnumMap<>(GasContribution.class);
        parts.forEach((kind, part) -> contributions.put(kind, toSi(kind, part, species, temperaturesKelvin)));
        Map<Quantity, Series> total = new LinkedHashMap<>();
        for (Quantity q : contributions.get(GasContribution.TRANSLATIONAL).keySet()) {
            total.put(q, SeriesSums.sum(contributions.values().stream().map(m -> m.get(q)).toList()));
        }
        double[] zpe = species.vibrations().zeroPointEnergyKelvin();
        total.put(Quantity.ZERO_POINT_ENERGY, SeriesSums.constant(temperaturesKelvin.length, zpe[0] * K,
                zpe[1] * K + U * zpe[0] * K));

        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "closed forms per factor (expm1, log1p); level sums by log-sum-exp "
                + "about the dominant term with moments about the mean");
        precision.put("errorAnalysis", "first-order running error bounds; rotor tails by the integral test");
        precision.put("translation", "Sackur-Tetrode with the thermal de Broglie wavelength, "
                + species.state().describe());
        species.rotation().describe(precision, temperaturesKelvin);
        precision.put("vibration", species.vibrations().modeCount() + " harmonic mode(s); low-frequency treatment: "
                + species.vibrations().lowFrequency().describe());
        precision.put("modesRaisedToFloor", species.vibrations().raisedCount());
        species.electronic().describe(precision);
        List<Warning> warnings = new ArrayList<>();
        classicalRotorWarning(species.rotation(), temperaturesKelvin).ifPresent(warnings::add);
        return new IdealGasResult(new ThermoResult(temperaturesKelvin.clone(), total, precision, warnings, null),
                contributions);
    }

    private static Map<Quantity, Series> toSi(GasContribution kind, GasPart part, IdealGasSpecies species,
            double[] t) {
        int n = t.length;
        boolean translation = kind == GasContribution.TRANSLATIONAL;
        boolean electronic = kind == GasContribution.ELECTRONIC;
        double offset = electronic ? species.electronic().absoluteEnergyJoule() : 0;
        double offsetBound = electronic ? species.electronic().absoluteEnergyErrorJoule() : 0;
        Series u = part.internalEnergyKelvin().scaled(K);
        Series f = part.helmholtzEnergyKelvin(t).scaled(K);
        Series pv = translation ? new Series(times(t, K), ulps(times(t, K))) : Series.zeros(n);
        Series e0 = SeriesSums.constant(n, offset, offsetBound);
        Series cv = part.heatCapacity().scaled(K);
        Series k = translation ? SeriesSums.constant(n, K, 0) : Series.zeros(n);
        Map<Quantity, Series> si = new LinkedHashMap<>();
        si.put(Quantity.ENTHALPY, SeriesSums.sum(List.of(u, pv, e0)));
        si.put(Quantity.ENTROPY, part.entropy().scaled(K));
        si.put(Quantity.GIBBS_ENERGY, SeriesSums.sum(List.of(f, pv, e0)));
        si.put(Quantity.HELMHOLTZ_ENERGY, SeriesSums.sum(List.of(f, e0)));
        si.put(Quantity.INTERNAL_ENERGY, SeriesSums.sum(List.of(u, e0)));
        si.put(Quantity.ISOBARIC_HEAT_CAPACITY, SeriesSums.sum(List.of(cv, k)));
        si.put(Quantity.ISOCHORIC_HEAT_CAPACITY, cv);
        return si;
    }

    /**
     * {@code ROTOR_NOT_CLASSICAL} where the high-temperature rotor form is used with theta / T above
     * {@link #CLASSICAL_ROTOR_LIMIT}: ln q is then off by about theta / (3T) (0.017 k_B at the limit).
     */
    private static Optional<Warning> classicalRotorWarning(Rotation rotation, double[] t) {
        double theta = rotation instanceof LinearRotor l && !l.levelSum() ? l.thetaKelvin()
                : rotation instanceof NonlinearRotor n ? Arrays.stream(n.thetasKelvin()).max().orElse(0) : 0;
        double[] hits = Arrays.stream(t).filter(v -> theta / v > CLASSICAL_ROTOR_LIMIT).toArray();
        if (hits.length == 0) {
            return Optional.empty();
        }
        String advice = rotation instanceof LinearRotor
                ? "prefer \"treatment\": \"level-sum\", which sums the rotor's levels exactly"
                : "no level sum is offered for nonlinear rotors, so treat the rotational part as approximate "
                        + "(ln q off by about theta_rot / (3 T))";
        return Optional.of(new Warning("ROTOR_NOT_CLASSICAL", "the high-temperature rotor form is "
                + "used where T is below " + (1 / CLASSICAL_ROTOR_LIMIT) + " theta_rot; " + advice, hits));
    }

    private static double[] times(double[] t, double factor) {
        double[] out = new double[t.length];
        for (int j = 0; j < t.length; j++) {
            out[j] = t[j] * factor;
        }
        return out;
    }

    private static double[] ulps(double[] values) {
        double[] out = new double[values.length];
        for (int j = 0; j < values.length; j++) {
            out[j] = U * Math.abs(values[j]);
        }
        return out;
    }
}
