package org.statesum.models.gas;

import java.util.Arrays;
import java.util.List;
import org.statesum.engine.Series;

/** Pointwise sums of series with their bounds (recursive summation: n u times the sum of |terms|). */
final class SeriesSums {

    private SeriesSums() {
    }

    static Series sum(List<Series> terms) {
        int n = terms.get(0).size();
        double[] v = new double[n];
        double[] b = new double[n];
        int count = terms.size();
        for (int j = 0; j < n; j++) {
            double abs = 0;
            for (Series s : terms) {
                v[j] += s.values()[j];
                b[j] += s.errorBounds()[j];
                abs += Math.abs(s.values()[j]);
            }
            b[j] += (count - 1) * GasPart.U * abs;
        }
        return new Series(v, b);
    }

    static Series constant(int size, double value, double bound) {
        double[] v = new double[size];
        double[] b = new double[size];
        Arrays.fill(v, value);
        Arrays.fill(b, bound);
        return new Series(v, b);
    }
}
