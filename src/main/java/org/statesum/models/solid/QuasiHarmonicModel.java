package org.statesum.models.solid;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.engine.Cancellation;
import org.statesum.engine.EosFit;
import org.statesum.engine.EosMinimum;
import org.statesum.engine.PolynomialFit;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;
import org.statesum.models.Quantity;
import org.statesum.units.PhysicalConstants;

/**
 * The quasi-harmonic approximation: at each temperature T, F(V, T) = E_0(V) + F_vib(V, T) is evaluated at
 * the sampled volumes and fitted with the chosen equation of state; for each pressure P the fitted
 * F + P V is minimised, giving V(T), B(T) = V d^2F/dV^2, G(T, P) = F(V*) + P V* and H = G + T S. The
 * entropy and C_V at V* come from cubic least-squares fits of S(V_i) and C_V(V_i); since
 * alpha B = (dS/dV)_T at the minimum (differentiate dF/dV + P = 0 along T), alpha = (dS/dV) / B and
 * C_P = C_V + alpha^2 B V T with no differencing across the temperature grid. (M. T. Dove,
 * Introduction to Lattice Dynamics, 1993, ch. 4; A. A. Maradudin et al., Theory of Lattice Dynamics in
 * the Harmonic Approximation, 1971.)
 *
 * <p>Inside, energies are E / k_B in K and volumes in cubic angstrom, so fits see numbers near 1 to 1e5.
 * Warnings per temperature and pressure: {@code OUTSIDE_SAMPLED_VOLUMES} (the minimum lies outside the
 * sampled volumes: an extrapolation of the fitted form, reported but not to be trusted),
 * {@code POOR_FIT} (largest residual above {@link #POOR_FIT_FRACTION} of the sampled span of F) and
 * {@code NO_MINIMUM} (no fit or no volume with that pressure: reported as null).
 */
public final class QuasiHarmonicModel {

    /** Residual, as a fraction of the span of F over the samples, above which a fit is called poor. */
    public static final double POOR_FIT_FRACTION = 1e-3;

    private static final double K = PhysicalConstants.BOLTZMANN_J_PER_K;
    private static final double A3 = 1e-30;
    private static final double U = 0x1.0p-53;

    private QuasiHarmonicModel() {
    }

    /**
     * @param crystal the sampled crystal
     * @param temperaturesKelvin grid, K
     * @param pressuresPascal pressures, Pa
     * @param perAtom divide extensive quantities (and V) by atoms per formula unit
     */
    public static QuasiHarmonicResult evaluate(QuasiHarmonicCrystal crystal, double[] temperaturesKelvin,
            double[] pressuresPascal, boolean perAtom) {
        int nt = temperaturesKelvin.length;
        int np = pressuresPascal.length;
        double[][][] cols = new double[np][ThermoAtMinimum.COLUMNS][nt];
        double[] maxRes = new double[nt];
        double[] rmsRes = new double[nt];
        Map<String, List<Double>> flagged = new LinkedHashMap<>();
        Sampler sampler = new Sampler(crystal);
        double[] start = null;
        sampler.sampleAll(temperaturesKelvin);
        for (int j = 0; j < nt; j++) {
            Cancellation.checkpoint();
            double t = temperaturesKelvin[j];
            sampler.select(j);
            EosFit fit = EosFit.of(crystal.equationOfState(), sampler.v, sampler.f, start);
            if (fit == null && start != null) {
                fit = EosFit.of(crystal.equationOfState(), sampler.v, sampler.f, null);
            }
            start = fit == null ? null : fit.parameters();
            maxRes[j] = fit == null ? Double.NaN : fit.maxAbsoluteResidual();
            rmsRes[j] = fit == null ? Double.NaN : fit.rootMeanSquareResidual();
            if (fit != null && fit.maxAbsoluteResidual() > POOR_FIT_FRACTION * sampler.span()) {
                flag(flagged, "POOR_FIT|", t);
            }
            PolynomialFit sFit = PolynomialFit.of(sampler.v, sampler.s, 3);
            PolynomialFit cFit = PolynomialFit.of(sampler.v, sampler.c, 3);
            for (int q = 0; q < np; q++) {
                double pn = pressuresPascal[q] * A3 / K;
                EosMinimum m = fit == null ? null : EosMinimum.of(fit, pn, sampler.fb);
                double[][] c = cols[q];
                if (m == null || !m.found()) {
                    flag(flagged, "NO_MINIMUM|" + pressuresPascal[q], t);
                    for (double[] col : c) {
                        col[j] = Double.NaN;
                    }
                    continue;
                }
                if (m.volume() < sampler.minVolume() || m.volume() > sampler.maxVolume()) {
                    flag(flagged, "OUTSIDE_SAMPLED_VOLUMES|" + pressuresPascal[q], t);
                }
                ThermoAtMinimum.fill(c, j, t, m, sFit, cFit, sampler);
            }
        }
        double n = perAtom ? crystal.atomsPerFormulaUnit() : 1;
        List<PressureState> states = new ArrayList<>();
        for (int q = 0; q < np; q++) {
            double[][] c = cols[q];
            Map<Quantity, Series> thermo = new LinkedHashMap<>();
            thermo.put(Quantity.GIBBS_ENERGY, new Series(c[0], c[1]).scaled(K / n));
            thermo.put(Quantity.ENTHALPY, new Series(c[2], c[3]).scaled(K / n));
            thermo.put(Quantity.HELMHOLTZ_ENERGY, new Series(c[4], c[5]).scaled(K / n));
            thermo.put(Quantity.ENTROPY, new Series(c[6], c[7]).scaled(K / n));
            thermo.put(Quantity.ISOCHORIC_HEAT_CAPACITY, new Series(c[8], c[9]).scaled(K / n));
            thermo.put(Quantity.ISOBARIC_HEAT_CAPACITY, new Series(c[10], c[11]).scaled(K / n));
            int e = ThermoAtMinimum.ESTIMATES;
            Map<Quantity, double[]> estimates = new LinkedHashMap<>();
            Quantity[] order = {Quantity.GIBBS_ENERGY, Quantity.ENTHALPY, Quantity.HELMHOLTZ_ENERGY, Quantity.ENTROPY,
                Quantity.ISOCHORIC_HEAT_CAPACITY, Quantity.ISOBARIC_HEAT_CAPACITY};
            for (int k = 0; k < order.length; k++) {
                estimates.put(order[k], scaledCopy(c[e + k], K / n));
            }
            states.add(new PressureState(pressuresPascal[q], thermo, new Series(c[12], c[13]).scaled(A3 / n),
                    new Series(c[14], c[15]).scaled(K / A3), new Series(c[16], c[17]), estimates,
                    scaledCopy(c[e + 6], A3 / n), scaledCopy(c[e + 7], K / A3), c[e + 8].clone()));
        }
        double[] maxJ = scaledCopy(maxRes, K / n);
        double[] rmsJ = scaledCopy(rmsRes, K / n);
        return new QuasiHarmonicResult(temperaturesKelvin.clone(), states, maxJ, rmsJ,
                precision(crystal, sampler.modes()), warnings(crystal, flagged));
    }

    /** G(T, P) per formula unit, J, at one pressure (Pa): for reactions and phase crossings. */
    public static Series gibbsEnergy(QuasiHarmonicCrystal crystal, double[] temperaturesKelvin, double pressurePascal) {
        return evaluate(crystal, temperaturesKelvin, new double[] {pressurePascal}, false).states().get(0).thermo()
                .get(Quantity.GIBBS_ENERGY);
    }

    private static void flag(Map<String, List<Double>> flagged, String key, double t) {
        flagged.computeIfAbsent(key, k -> new ArrayList<>()).add(t);
    }

    private static double[] scaledCopy(double[] a, double factor) {
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = a[i] * factor;
        }
        return out;
    }

    private static Map<String, Object> precision(QuasiHarmonicCrystal crystal, int modes) {
        Map<String, Object> p = new LinkedHashMap<>();
        p.put("arithmetic", "IEEE 754 binary64");
        p.put("summation", "compensated (Neumaier) sums over modes at each volume");
        p.put("equationOfStateFit", "Levenberg-Marquardt least squares of F(V) = E0(V) + Fvib(V, T), "
                + "normalised units, started from the previous temperature");
        p.put("minimisation", "Brent root of P_fit(V) = P on the stable branch");
        p.put("entropyAndHeatCapacity", "cubic least squares in V, evaluated (and differentiated) at V(T)");
        p.put("errorAnalysis", "errorBounds: first-order sensitivity of each answer to the data moved by their own "
                + "error bounds (rounding, mode sums), doubled, with the root tolerance and rounding; fitErrorEstimates: "
                + "the same sensitivity to the data moved by the largest fit residual, doubled: an estimate of how "
                + "far the equation of state's fit moves the answer, not a bound and not a statistical interval");
        p.put("volumes", crystal.volumesCubicMetre().length);
        p.put("modesSummedPerTemperature", modes);
        p.put("poorFitFraction", POOR_FIT_FRACTION);
        return p;
    }

    private static List<Warning> warnings(QuasiHarmonicCrystal crystal, Map<String, List<Double>> flagged) {
        List<Warning> out = new ArrayList<>(CrystalModel.screenWarnings(crystal.screen(), crystal.atomsPerFormulaUnit()));
        flagged.forEach((key, temps) -> {
            String[] parts = key.split("\\|", 2);
            String at = parts[1].isEmpty() ? "" : " at P = " + parts[1] + " Pa";
            String message = switch (parts[0]) {
                case "POOR_FIT" -> "the equation of state fits F(V) poorly (largest residual above "
                        + POOR_FIT_FRACTION + " of the sampled span); results rest on a poor fit";
                case "OUTSIDE_SAMPLED_VOLUMES" -> "the minimum" + at + " lies outside the sampled volumes: "
                        + "the answer extrapolates the fitted form; sample further volumes";
                default -> "no minimum" + at + ": the fit failed or no volume has that pressure; reported as null";
            };
            out.add(new Warning(parts[0], message, temps.stream().mapToDouble(Double::doubleValue).toArray()));
        });
        return out;
    }

    static double unitRoundoff() {
        return U;
    }
}
