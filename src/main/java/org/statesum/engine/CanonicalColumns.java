package org.statesum.engine;

/** Mutable output columns filled by {@link CanonicalKernel}, one column index per temperature. */
final class CanonicalColumns {

    final double[] lnZ;
    final double[] lnZBound;
    final double[] helmholtz;
    final double[] helmholtzBound;
    final double[] internal;
    final double[] internalBound;
    final double[] entropy;
    final double[] entropyBound;
    final double[] heatCapacity;
    final double[] heatCapacityBound;
    final double[] logRelative;
    final double[] topPopulation;
    final double[][] populations;
    final double[][] populationBounds;

    CanonicalColumns(int temperatures, int levels, boolean withPopulations) {
        lnZ = new double[temperatures];
        lnZBound = new double[temperatures];
        helmholtz = new double[temperatures];
        helmholtzBound = new double[temperatures];
        internal = new double[temperatures];
        internalBound = new double[temperatures];
        entropy = new double[temperatures];
        entropyBound = new double[temperatures];
        heatCapacity = new double[temperatures];
        heatCapacityBound = new double[temperatures];
        logRelative = new double[temperatures];
        topPopulation = new double[temperatures];
        populations = withPopulations ? new double[temperatures][levels] : null;
        populationBounds = withPopulations ? new double[temperatures][levels] : null;
    }

    void set(int j, double lnZValue, double lnZErr, double f, double fErr, double u, double uErr,
            double s, double sErr, double cv, double cvErr, double logRel, double top) {
        lnZ[j] = lnZValue;
        lnZBound[j] = lnZErr;
        helmholtz[j] = f;
        helmholtzBound[j] = fErr;
        internal[j] = u;
        internalBound[j] = uErr;
        entropy[j] = s;
        entropyBound[j] = sErr;
        heatCapacity[j] = cv;
        heatCapacityBound[j] = cvErr;
        logRelative[j] = logRel;
        topPopulation[j] = top;
    }

    CanonicalTable toTable(double[] temperatures) {
        return new CanonicalTable(temperatures.clone(), new Series(lnZ, lnZBound),
                new Series(helmholtz, helmholtzBound), new Series(internal, internalBound),
                new Series(entropy, entropyBound), new Series(heatCapacity, heatCapacityBound),
                logRelative, topPopulation, populations, populationBounds);
    }
}
