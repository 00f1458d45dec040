package org.statesum.engine;

import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * A least-squares fit of an {@link EquationOfState} to sampled energies E_i at volumes V_i, by
 * Levenberg-Marquardt (K. Levenberg, Q. Appl. Math. 2 (1944) 164; D. W. Marquardt, 1963; commons-math3's optimiser) in
 * normalised units (V / mean V, E scaled to the sampled span), started from a parabola through the data
 * or from a given start (the previous temperature's answer). Units in and out are the caller's own
 * (energy, volume, energy / volume), always consistent.
 *
 * <p>The fit also keeps the Gauss-Newton sensitivity A = (J^T J)^{-1} J^T of the parameters to the data,
 * so that {@link EosMinimum} can say how far its answers move when each E_i moves within
 * max |residual| plus its own error bound. Immutable.
 */
public final class EosFit {

    /** Keeps B0' away from 1, where the Vinet and Murnaghan forms are singular, and from runaway values. */
    static final double MIN_PRESSURE_DERIVATIVE = 1.05;
    static final double MAX_PRESSURE_DERIVATIVE = 30;
    private static final int MAX_ITERATIONS = 200;
    /** Relative parameter step below which the fit has converged (the Jacobian's own error is ~1e-10). */
    static final double STEP_TOLERANCE = 1e-12;

    private final EquationOfState eos;
    private final double volumeScale;
    private final double energyShift;
    private final double energyScale;
    private final double[] normalised;
    private final double[][] sensitivity;
    private final double maxResidual;
    private final double rmsResidual;
    private final double[] volumes;

    private EosFit(EquationOfState eos, double[] volumes, double volumeScale, double energyShift,
            double energyScale, double[] normalised, double[][] sensitivity, double maxResidual, double rmsResidual) {
        this.eos = eos;
        this.volumes = volumes;
        this.volumeScale = volumeScale;
        this.energyShift = energyShift;
        this.energyScale = energyScale;
        this.normalised = normalised;
        this.sensitivity = sensitivity;
        this.maxResidual = maxResidual;
        this.rmsResidual = rmsResidual;
    }

    /**
     * Fits the equation of state.
     *
     * @param volumes at least 5 distinct positive volumes
     * @param energies the energy at each volume
     * @param start parameters (E0, V0, B0, B0') in the caller's units to start from, or null
     * @return the fit, or null when the data have no minimum a fit can start from (concave data) or the
     *         optimiser does not converge
     */
    public static EosFit of(EquationOfState eos, double[] volumes, double[] energies, double[] start) {
        int n = volumes.length;
        double vs = 0;
        double emin = Double.POSITIVE_INFINITY;
        double emax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            vs += volumes[i] / n;
            emin = Math.min(emin, energies[i]);
            emax = Math.max(emax, energies[i]);
        }
        double es = emax > emin ? emax - emin : Math.max(Math.abs(emin), 1.0);
        double[] v = new double[n];
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = volumes[i] / vs;
            e[i] = (energies[i] - emin) / es;
        }
        double[] guess = start != null
                ? new double[] {(start[0] - emin) / es, start[1] / vs, start[2] * vs / es, start[3]}
                : parabolaStart(v, e);
        if (guess == null || !(guess[1] > 0 && guess[2] > 0)) {
            return null;
        }
        guess[3] = Math.min(Math.max(guess[3], MIN_PRESSURE_DERIVATIVE), MAX_PRESSURE_DERIVATIVE);
        double[] p = levenbergMarquardt(eos, v, e, guess);
        if (p == null || !(p[1] > 0 && p[2] > 0) || !Double.isFinite(p[0])) {
            return null;
        }
        RealMatrix jacobian = model(eos, v, new ArrayRealVector(p, false)).getSecond();
        RealMatrix normal = jacobian.transpose().multiply(jacobian);
        LUDecomposition lu = new LUDecomposition(normal, 1e-300);
        if (!lu.getSolver().isNonSingular()) {
            return null;
        }
        double[][] a = lu.getSolver().getInverse().multiply(jacobian.transpose()).getData();
        double max = 0;
        double squares = 0;
        for (int i = 0; i < n; i++) {
            double r = eos.energy(v[i], p) - e[i];
            max = Math.max(max, Math.abs(r));
            squares += r * r;
        }
        return new EosFit(eos, volumes.clone(), vs, emin, es, p, a, max * es, Math.sqrt(squares / n) * es);
    }

    /** The fitted (E0, V0, B0, B0') in the caller's units. */
    public double[] parameters() {
        return new double[] {energyShift + energyScale * normalised[0], volumeScale * normalised[1],
                normalised[2] * energyScale / volumeScale, normalised[3]};
    }

    public EquationOfState equationOfState() {
        return eos;
    }

    /** max_i |E_fit(V_i) - E_i|, caller's energy unit. */
    public double maxAbsoluteResidual() {
        return maxResidual;
    }

    /** sqrt(mean of squared residuals), caller's energy unit. */
    public double rootMeanSquareResidual() {
        return rmsResidual;
    }

    double[] volumes() {
        return volumes;
    }

    double volumeScale() {
        return volumeScale;
    }

    double energyShift() {
        return energyShift;
    }

    double energyScale() {
        return energyScale;
    }

    double[] normalisedParameters() {
        return normalised.clone();
    }

    double[][] sensitivity() {
        return sensitivity;
    }

    /**
     * Levenberg-Marquardt as commons-math3 implements it (after MINPACK's lmder: J. J. More, Lecture Notes
     * in Mathematics 630 (1978) 105), with the parameters held in range after each step
     * ({@link #keepInRange}). Converged when the relative cost reduction, the relative parameter step or the
     * orthogonality of residuals and Jacobian falls below {@link #STEP_TOLERANCE}; out of iterations
     * (typically crawling along a clamped B0') it returns null.
     */
    private static double[] levenbergMarquardt(EquationOfState eos, double[] v, double[] e, double[] start) {
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(keepInRange(new ArrayRealVector(start, false)))
                .model(point -> model(eos, v, point))
                .target(e)
                .parameterValidator(EosFit::keepInRange)
                .maxIterations(MAX_ITERATIONS)
                .maxEvaluations(MAX_ITERATIONS * 10)
                .build();
        LevenbergMarquardtOptimizer optimizer = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(STEP_TOLERANCE)
                .withParameterRelativeTolerance(STEP_TOLERANCE)
                .withOrthoTolerance(STEP_TOLERANCE);
        try {
            return optimizer.optimize(problem).getPoint().toArray();
        } catch (TooManyEvaluationsException | TooManyIterationsException | ConvergenceException notConverged) {
            return null;
        }
    }

    private static double[] parabolaStart(double[] v, double[] e) {
        double[] c = PolynomialFit.of(v, e, 2).coefficients();
        if (!(c[2] > 0)) {
            return null;
        }
        double v0 = -c[1] / (2 * c[2]);
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (double x : v) {
            lo = Math.min(lo, x);
            hi = Math.max(hi, x);
        }
        v0 = Math.min(Math.max(v0, 0.8 * lo), 1.2 * hi);
        return new double[] {c[0] + c[1] * v0 + c[2] * v0 * v0, v0, 2 * c[2] * v0, 4.0};
    }

    private static RealVector keepInRange(RealVector p) {
        double[] q = p.toArray();
        q[1] = Math.max(q[1], 1e-3);
        q[2] = Math.max(q[2], 1e-12);
        q[3] = Math.min(Math.max(q[3], MIN_PRESSURE_DERIVATIVE), MAX_PRESSURE_DERIVATIVE);
        return new ArrayRealVector(q, false);
    }

    /** The model values and a central-difference Jacobian. */
    private static Pair<RealVector, RealMatrix> model(EquationOfState eos, double[] v, RealVector point) {
        double[] p = point.toArray();
        return new Pair<>(new ArrayRealVector(energies(eos, v, p), false),
                new Array2DRowRealMatrix(centralDifferences(q -> energies(eos, v, q), p), false));
    }

    private static double[] energies(EquationOfState eos, double[] v, double[] p) {
        double[] values = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            values[i] = eos.energy(v[i], p);
        }
        return values;
    }

    /**
     * d f_i / d p_k by central differences, [output][parameter], with steps of 1e-6 relative (at least
     * 1e-9 absolute): truncation and rounding errors of about 1e-12 relative for these smooth forms.
     */
    static double[][] centralDifferences(java.util.function.Function<double[], double[]> f, double[] p) {
        double[][] d = null;
        for (int k = 0; k < p.length; k++) {
            double h = 1e-6 * Math.max(Math.abs(p[k]), 1e-3);
            double[] up = p.clone();
            double[] down = p.clone();
            up[k] += h;
            down[k] -= h;
            double[] fu = f.apply(up);
            double[] fd = f.apply(down);
            if (d == null) {
                d = new double[fu.length][p.length];
            }
            for (int i = 0; i < fu.length; i++) {
                d[i][k] = (fu[i] - fd[i]) / (2 * h);
            }
        }
        return d;
    }
}
