package org.statesum.models.solid;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.engine.DebyeFunction;
import org.statesum.engine.Series;
import org.statesum.engine.VibrationalTable;
import org.statesum.engine.Warning;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;
import org.statesum.units.PhysicalConstants;

/**
 * A harmonic crystal's Helmholtz energy, internal energy, entropy, isochoric heat capacity and zero-point
 * energy on a temperature grid, in SI per formula unit or per atom (J, J/K). The volume is fixed, so at
 * zero pressure the Gibbs energy equals F ({@link #gibbsEnergy}).
 */
public final class CrystalModel {

    private static final double K = PhysicalConstants.BOLTZMANN_J_PER_K;

    private CrystalModel() {
    }

    /**
     * @param crystal the crystal
     * @param temperaturesKelvin grid, K
     * @param perAtom divide every extensive quantity by the atoms per formula unit
     */
    public static ThermoResult evaluate(Crystal crystal, double[] temperaturesKelvin, boolean perAtom) {
        VibrationalTable table = crystal.vibrations().evaluate(temperaturesKelvin);
        double scale = perAtom ? K / crystal.atomsPerFormulaUnit() : K;
        Map<Quantity, Series> series = new LinkedHashMap<>();
        series.put(Quantity.HELMHOLTZ_ENERGY, table.helmholtzEnergyKelvin().scaled(scale));
        series.put(Quantity.INTERNAL_ENERGY, table.internalEnergyKelvin().scaled(scale));
        series.put(Quantity.ENTROPY, table.entropyOverBoltzmann().scaled(scale));
        series.put(Quantity.ISOCHORIC_HEAT_CAPACITY, table.heatCapacityOverBoltzmann().scaled(scale));
        int n = temperaturesKelvin.length;
        double[] zp = new double[n];
        double[] zpb = new double[n];
        java.util.Arrays.fill(zp, table.zeroPointEnergyKelvin());
        java.util.Arrays.fill(zpb, table.zeroPointEnergyBound());
        series.put(Quantity.ZERO_POINT_ENERGY, new Series(zp, zpb).scaled(scale));
        return new ThermoResult(temperaturesKelvin.clone(), series, precision(crystal, temperaturesKelvin),
                warnings(crystal), null);
    }

    /**
     * G(T) per formula unit, J, at zero pressure: G = F + PV with P = 0, the volume held fixed (a harmonic
     * crystal has no equation of state). For reactions and phase crossings.
     */
    public static Series gibbsEnergy(Crystal crystal, double[] temperaturesKelvin) {
        return crystal.vibrations().evaluate(temperaturesKelvin).helmholtzEnergyKelvin().scaled(K);
    }

    static Map<String, Object> precision(Crystal crystal, double[] temperatures) {
        Map<String, Object> p = new LinkedHashMap<>();
        p.put("arithmetic", "IEEE 754 binary64");
        if (crystal.vibrations() instanceof Vibrations.Debye debye) {
            p.put("summation", "closed form in the Debye function D_3");
            p.put("debyeFunction", "power series in x (Bernoulli numbers) for x <= " + DebyeFunction.SERIES_SWITCH
                    + ", exponential series of the complement above; each summed until a proven tail bound is "
                    + "below u/4 of the result");
            double worst = 0;
            int terms = 0;
            for (double t : temperatures) {
                if (t > 0) {
                    DebyeFunction.Value d = DebyeFunction.of(debye.thetaKelvin() / t);
                    worst = Math.max(worst, d.errorBound());
                    terms = Math.max(terms, d.terms());
                }
            }
            p.put("debyeFunctionErrorBound", worst);
            p.put("debyeFunctionTermsMax", terms);
        } else if (crystal.vibrations() instanceof Vibrations.Density) {
            p.put("summation", "compensated (Neumaier) sum over the density's segments");
            p.put("segmentsSummed", crystal.vibrations().modeCount());
        } else {
            p.put("summation", "compensated (Neumaier) sums over modes; ln(1 - e^-x) by log1p or expm1");
            p.put("modesSummed", crystal.vibrations().modeCount());
        }
        p.put("errorAnalysis", "first-order running error bound with the frequency conversion error, doubled");
        if (crystal.normalisation() != null) {
            p.put("quadrature", "none: the density, read as linear between its nodes, is integrated exactly on each "
                    + "segment (closed forms in the polylogarithms Li_1, Li_2, Li_3 of e^-x, by their series about "
                    + "x = 0 below x = 1.5 and in e^-x above; each with a proven truncation bound and a running "
                    + "rounding bound)");
        }
        return p;
    }

    static List<Warning> warnings(Crystal crystal) {
        List<Warning> w = screenWarnings(crystal.screen(), crystal.atomsPerFormulaUnit());
        Crystal.Normalisation norm = crystal.normalisation();
        if (norm != null && norm.applied() && Math.abs(norm.factor() - 1) > Crystals.NORMALISATION_TOLERANCE) {
            w.add(new Warning("DENSITY_RESCALED", "the density of states integrated to " + norm.integral()
                    + " modes and was rescaled by " + norm.factor() + " to 3 x atoms = " + norm.expected(),
                    new double[0]));
        }
        return w;
    }

    /** Six significant digits without trailing zeros. */
    private static String shown(double x) {
        return java.math.BigDecimal.valueOf(x).round(new java.math.MathContext(6)).stripTrailingZeros().toPlainString();
    }

    /**
     * Warnings for modes left out (they hold at every temperature), with what they cost: m modes left out
     * of 3 x atoms make C_V tend to (3 x atoms - m) k_B per formula unit at high temperature, not to the
     * Dulong-Petit 3 x atoms k_B (the zero-frequency acoustic modes at Gamma carry their q-point's weight).
     */
    static List<Warning> screenWarnings(ModeScreen s, int atoms) {
        List<Warning> w = new ArrayList<>();
        double modes = 3.0 * atoms;
        double left = s.nearZeroModes() + s.smallImaginaryModes();
        String deficit = left > 0 ? "; at high temperature C_V tends to " + shown(modes - left)
                + " k_B per formula unit, " + shown((modes - left) / modes) + " of the Dulong-Petit value 3 x atoms k_B = "
                + shown(modes) + " k_B" : "";
        if (s.nearZeroModes() > 0) {
            w.add(new Warning("ACOUSTIC_MODES_LEFT_OUT", s.nearZeroModes() + " mode(s) per formula unit at or "
                    + "below the tolerance of " + s.toleranceKelvin() + " K (h nu / k_B) were left out" + deficit,
                    new double[0]));
        }
        if (s.smallImaginaryModes() > 0) {
            w.add(new Warning("IMAGINARY_MODES_LEFT_OUT", s.smallImaginaryModes() + " imaginary mode(s) per formula "
                    + "unit within the tolerance were left out as numerical noise"
                    + (s.nearZeroModes() > 0 ? "" : deficit), new double[0]));
        }
        return w;
    }
}
