package org.statesum.models;

import java.util.Optional;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.statesum.engine.CanonicalEnsemble;
import org.statesum.engine.CanonicalTable;
import org.statesum.engine.CompositeSystem;
import org.statesum.engine.LevelSet;
import org.statesum.engine.Series;

/**
 * The maximum of the isochoric heat capacity C_V(T) of a level set (a Schottky peak, or the
 * finite-size peak of a phase transition in a sampled density of states), located when the
 * temperature grid brackets it: the largest C_V on the grid lies at an interior grid point T_j with
 * C_V(T_j) above both neighbours. Brent's method (commons-math3 {@link BrentOptimizer}, R. P. Brent,
 * Algorithms for Minimization without Derivatives, Prentice-Hall 1973, ch. 5) then refines it on
 * [T_{j-1}, T_{j+1}], evaluating C_V from the level set at each trial temperature.
 *
 * <p>Accuracy: Brent stops when the bracket around the maximum is within 2 tol, tol = {@link
 * #RELATIVE_TOLERANCE} T + {@link #ABSOLUTE_TOLERANCE_KELVIN}; the reported temperature tolerance is
 * that 2 tol. A smooth maximum is flat to second order, so C_V(T_max) is found to its own rounding
 * error bound, which is reported. The relative tolerance is near the square root of the unit roundoff
 * because a maximum cannot be located more finely than that from function values (Brent 1973, ch. 5).
 *
 * @param temperatureKelvin T_max, K
 * @param temperatureToleranceKelvin bound on |T_max - true location|, K
 * @param heatCapacityJoulePerKelvin C_V(T_max), J/K per entity of the basis
 * @param heatCapacityErrorBoundJoulePerKelvin bound on the numerical error of that value, J/K
 * @param evaluations C_V evaluations used by the optimiser
 */
public record HeatCapacityMaximum(double temperatureKelvin, double temperatureToleranceKelvin,
        double heatCapacityJoulePerKelvin, double heatCapacityErrorBoundJoulePerKelvin, int evaluations) {

    /** Relative tolerance on T_max: about 3 sqrt(unit roundoff). */
    public static final double RELATIVE_TOLERANCE = 1e-7;
    /** Absolute tolerance on T_max, K: only matters for peaks far below 1 K. */
    public static final double ABSOLUTE_TOLERANCE_KELVIN = 1e-12;
    private static final int MAX_EVALUATIONS = 200;

    /**
     * Finds the maximum on the grid of a result computed by {@link LevelSetModel#evaluate}.
     *
     * @return empty when the grid does not bracket a maximum (fewer than three temperatures, or the
     *         largest C_V at the first or last temperature)
     */
    public static Optional<HeatCapacityMaximum> locate(LevelSet levels, Particles particles, ThermoResult result) {
        if (particles.statistics().quantum()) {
            return Optional.empty(); // the search re-evaluates a one-particle table; exact statistics has none
        }
        double[] t = result.temperaturesKelvin();
        double[] cv = result.series().get(Quantity.ISOCHORIC_HEAT_CAPACITY).values();
        Integer[] order = new Integer[t.length];
        for (int i = 0; i < t.length; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (a, b) -> Double.compare(t[a], t[b]));
        int best = -1;
        for (int i = 0; i < order.length; i++) {
            if (Double.isFinite(cv[order[i]]) && t[order[i]] > 0 && (best < 0 || cv[order[i]] > cv[order[best]])) {
                best = i;
            }
        }
        if (best <= 0 || best >= order.length - 1) {
            return Optional.empty();
        }
        double lo = t[order[best - 1]];
        double hi = t[order[best + 1]];
        double peak = cv[order[best]];
        if (!(peak > cv[order[best - 1]] && peak > cv[order[best + 1]]) || !(lo > 0 && lo < hi)) {
            return Optional.empty();
        }
        CanonicalEnsemble.Prepared prepared = CanonicalEnsemble.prepare(levels); // once for every trial
        UnivariateFunction heatCapacity = temperature -> evaluate(prepared, particles, temperature).values()[0];
        BrentOptimizer brent = new BrentOptimizer(RELATIVE_TOLERANCE, ABSOLUTE_TOLERANCE_KELVIN);
        UnivariatePointValuePair max = brent.optimize(new MaxEval(MAX_EVALUATIONS),
                new UnivariateObjectiveFunction(heatCapacity), GoalType.MAXIMIZE,
                new SearchInterval(lo, hi, t[order[best]]));
        Series at = evaluate(prepared, particles, max.getPoint());
        double tolerance = 2 * (RELATIVE_TOLERANCE * Math.abs(max.getPoint()) + ABSOLUTE_TOLERANCE_KELVIN);
        return Optional.of(new HeatCapacityMaximum(max.getPoint(), tolerance, at.values()[0], at.errorBounds()[0],
                brent.getEvaluations()));
    }

    /** C_V at one temperature, in J/K per entity of the basis, with its error bound. */
    private static Series evaluate(CanonicalEnsemble.Prepared levels, Particles particles, double temperatureKelvin) {
        CanonicalTable one = levels.evaluate(new double[] {temperatureKelvin}, false);
        CanonicalTable table = CompositeSystem.of(one, particles.count(), particles.statistics(),
                particles.perParticle());
        return table.heatCapacityOverBoltzmann().scaled(org.statesum.units.PhysicalConstants.BOLTZMANN_J_PER_K);
    }
}
