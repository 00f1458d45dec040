package org.statesum.engine;

/**
 * One quantity on a temperature grid: values and, side by side, absolute bounds on their numerical
 * error (same unit). A value of NaN marks a point where the quantity is undefined (for example
 * ln Z at T = 0 when the ground level is not at zero energy); its bound is NaN too.
 */
public record Series(double[] values, double[] errorBounds) {

    public Series {
        if (values.length != errorBounds.length) {
            throw new IllegalArgumentException("values and errorBounds differ in length");
        }
    }

    public static Series zeros(int size) {
        return new Series(new double[size], new double[size]);
    }

    public int size() {
        return values.length;
    }

    /**
     * This series times a scale; bounds scale too and grow by 3 ulp(v) > 3 u |v|: the product's rounding
     * and up to two roundings already in the factor (a unit factor and its reciprocal, say, as in
     * J -> kJ/mol), also covering the rounding of the scaled bound. An exact zero stays an exact zero.
     */
    public Series scaled(double factor) {
        double[] v = new double[values.length];
        double[] b = new double[values.length];
        for (int i = 0; i < v.length; i++) {
            v[i] = values[i] * factor;
            b[i] = errorBounds[i] * Math.abs(factor) + (values[i] == 0 ? 0 : 3 * Math.ulp(v[i]));
        }
        return new Series(v, b);
    }
}
