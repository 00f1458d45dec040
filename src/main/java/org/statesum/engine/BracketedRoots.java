package org.statesum.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Every sign change of a continuous function between consecutive points of a grid, located by Brent's
 * bracketing method (commons-math3 {@link BrentSolver}; R. P. Brent, Algorithms for Minimization
 * without Derivatives, 1973, ch. 4), which keeps the root bracketed and stops when the bracket is
 * narrower than the absolute tolerance plus the relative tolerance times |x|.
 *
 * <p>A grid point where the function is exactly zero is a root itself; an interval whose ends have
 * strictly opposite signs holds at least one root, and one of them is found. Roots between two grid
 * points of equal sign (an even number of crossings) are not seen: refine the grid to find them.
 */
public final class BracketedRoots {

    /** Most function evaluations per bracket; Brent needs at most about (log2(width / tol))^2. */
    public static final int MAX_EVALUATIONS = 200;

    /**
     * One root: where it is, how sure, and how the function crosses.
     *
     * @param x the root
     * @param tolerance the solver's bound on |x - root|, same unit as x
     * @param rising whether the function goes from negative to positive with increasing x
     * @param evaluations function evaluations spent on this root (0 for a grid point)
     */
    public record Root(double x, double tolerance, boolean rising, int evaluations) {
    }

    private BracketedRoots() {
    }

    /**
     * Finds the roots.
     *
     * @param f the function (re-evaluated at trial points)
     * @param grid increasing points
     * @param values f at the grid points
     * @param absoluteTolerance solver tolerance on x, > 0
     * @param relativeTolerance solver tolerance on x relative to |x|, >= 0
     */
    public static List<Root> find(DoubleUnaryOperator f, double[] grid, double[] values, double absoluteTolerance,
            double relativeTolerance) {
        List<Root> roots = new ArrayList<>();
        for (int j = 0; j < grid.length; j++) {
            if (values[j] == 0) {
                boolean rising = j + 1 < grid.length ? values[j + 1] > 0 : j > 0 && values[j - 1] < 0;
                roots.add(new Root(grid[j], 0, rising, 0));
            }
            if (j + 1 < grid.length && values[j] * values[j + 1] < 0) {
                // Function-value accuracy 0: only an exact zero ends the search early, whatever the scale of
                // f (a reaction Gibbs energy per molecule is ~1e-20 J, below the solver's default of 1e-15).
                BrentSolver solver = new BrentSolver(relativeTolerance, absoluteTolerance, 0);
                double x = solver.solve(MAX_EVALUATIONS, f::applyAsDouble, grid[j], grid[j + 1]);
                double tolerance = absoluteTolerance + relativeTolerance * Math.abs(x);
                roots.add(new Root(x, tolerance, values[j] < 0, solver.getEvaluations()));
            }
        }
        return roots;
    }
}
