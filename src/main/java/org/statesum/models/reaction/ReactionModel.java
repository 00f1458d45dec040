package org.statesum.models.reaction;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.engine.BracketedRoots;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;
import org.statesum.units.PhysicalConstants;

/**
 * A reaction sum_i nu_i A_i = 0: Delta_r X = sum_i nu_i X_i for X = G, H, S, C_p (per reaction event;
 * per mole of reaction in molar units) and ln K = -Delta_r G / (k_B T), K being the product of the
 * activities a_i^nu_i relative to each species' own standard state. Where Delta_r G changes sign
 * between grid points, the model is re-evaluated at trial temperatures by {@link BracketedRoots}.
 *
 * <p>Error bounds: sum_i |nu_i| (bound of X_i) plus the rounding of the sum (n u sum |nu_i X_i|);
 * ln K carries bound(Delta_r G) / (k_B T) plus its own rounding.
 */
public final class ReactionModel {

    /** Relative tolerance of the root solver on T. */
    public static final double ROOT_RELATIVE_TOLERANCE = 1e-12;
    /** Most sign changes located; beyond, a warning says the list is cut. */
    public static final int MAX_SIGN_CHANGES = 100;
    private static final double U = 0x1.0p-53;
    private static final List<Quantity> REACTION_QUANTITIES = List.of(Quantity.GIBBS_ENERGY, Quantity.ENTHALPY,
            Quantity.ENTROPY, Quantity.ISOBARIC_HEAT_CAPACITY);

    private ReactionModel() {
    }

    /**
     * @param species at least one species
     * @param temperaturesKelvin increasing grid, K
     * @param rootToleranceKelvin absolute tolerance of the root solver, K, positive
     */
    public static ReactionResult evaluate(List<ReactionSpecies> species, double[] temperaturesKelvin,
            double rootToleranceKelvin) {
        List<Warning> warnings = new ArrayList<>();
        Map<Quantity, Series> delta = sums(species, temperaturesKelvin, warnings);
        Series g = delta.get(Quantity.GIBBS_ENERGY);
        delta.put(Quantity.LOG_EQUILIBRIUM_CONSTANT, logK(g, temperaturesKelvin));
        List<SignChange> roots = new ArrayList<>();
        if (isIncreasing(temperaturesKelvin)) {
            List<BracketedRoots.Root> found = BracketedRoots.find(t -> deltaAt(species, t, Quantity.GIBBS_ENERGY)[0],
                    temperaturesKelvin, g.values(), rootToleranceKelvin, ROOT_RELATIVE_TOLERANCE);
            for (BracketedRoots.Root r : found.subList(0, Math.min(found.size(), MAX_SIGN_CHANGES))) {
                roots.add(refine(species, r));
            }
            if (found.size() > MAX_SIGN_CHANGES) {
                warnings.add(new Warning("SIGN_CHANGES_CUT", "only the first " + MAX_SIGN_CHANGES
                        + " sign changes of the reaction Gibbs energy are listed", new double[0]));
            }
        } else if (temperaturesKelvin.length > 1) {
            warnings.add(new Warning("GRID_NOT_INCREASING", "the temperature grid is not strictly increasing, so "
                    + "sign changes of the reaction Gibbs energy were not searched for", new double[0]));
        }
        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "sum of nu_i X_i over species, each species by its own model");
        precision.put("errorAnalysis", "species bounds weighted by |nu_i| plus the rounding of the sums");
        precision.put("rootFinder", "Brent (commons-math3 BrentSolver), bracketing between grid points where "
                + "the reaction Gibbs energy has opposite signs; model re-evaluated at each trial temperature");
        precision.put("rootAbsoluteTolerance", rootToleranceKelvin);
        precision.put("rootRelativeTolerance", ROOT_RELATIVE_TOLERANCE);
        return new ReactionResult(new ThermoResult(temperaturesKelvin.clone(), delta, precision, warnings, null),
                roots);
    }

    private static SignChange refine(List<ReactionSpecies> species, BracketedRoots.Root r) {
        double[] g = deltaAt(species, r.x(), Quantity.GIBBS_ENERGY);
        double[] s = deltaAt(species, r.x(), Quantity.ENTROPY);
        double shift = Math.abs(s[0]) > 0 ? g[1] / Math.abs(s[0]) : Double.POSITIVE_INFINITY;
        double bound = r.tolerance() + shift;
        return new SignChange(r.x(), r.tolerance(), Double.isFinite(bound) ? bound : Double.MAX_VALUE, r.rising(),
                r.evaluations() + 2);
    }

    /** Delta_r X at one temperature: the value and its bound. */
    private static double[] deltaAt(List<ReactionSpecies> species, double t, Quantity quantity) {
        Series s = sums(species, new double[] {t}, new ArrayList<>()).get(quantity);
        return new double[] {s.values()[0], s.errorBounds()[0]};
    }

    private static Map<Quantity, Series> sums(List<ReactionSpecies> species, double[] t, List<Warning> warnings) {
        int n = t.length;
        Map<Quantity, double[][]> acc = new LinkedHashMap<>();
        REACTION_QUANTITIES.forEach(q -> acc.put(q, new double[3][n]));
        for (ReactionSpecies sp : species) {
            ThermoResult r = sp.thermo().at(t);
            for (Warning w : r.warnings()) {
                warnings.add(new Warning(w.code(), sp.name() + ": " + w.message(), w.temperatures()));
            }
            double nu = sp.coefficient();
            for (Quantity q : REACTION_QUANTITIES) {
                Series x = r.series().get(q);
                double[][] a = acc.get(q);
                for (int j = 0; j < n; j++) {
                    double term = nu * x.values()[j];
                    a[0][j] += term;
                    a[1][j] += Math.abs(nu) * x.errorBounds()[j] + U * Math.abs(term);
                    a[2][j] += Math.abs(term);
                }
            }
        }
        Map<Quantity, Series> out = new LinkedHashMap<>();
        for (Quantity q : REACTION_QUANTITIES) {
            double[][] a = acc.get(q);
            double[] bound = new double[n];
            for (int j = 0; j < n; j++) {
                bound[j] = a[1][j] + species.size() * U * a[2][j];
            }
            out.put(q, new Series(a[0], bound));
        }
        return out;
    }

    private static Series logK(Series g, double[] t) {
        int n = t.length;
        double[] v = new double[n];
        double[] b = new double[n];
        for (int j = 0; j < n; j++) {
            double kt = PhysicalConstants.BOLTZMANN_J_PER_K * t[j];
            v[j] = t[j] > 0 ? -g.values()[j] / kt : Double.NaN;
            b[j] = t[j] > 0 ? g.errorBounds()[j] / kt + 3 * U * Math.abs(v[j]) : Double.NaN;
        }
        return new Series(v, b);
    }

    private static boolean isIncreasing(double[] t) {
        for (int j = 1; j < t.length; j++) {
            if (!(t[j] > t[j - 1])) {
                return false;
            }
        }
        return true;
    }
}
