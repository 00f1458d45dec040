package org.statesum.engine;

/**
 * Energy-volume equations of state with parameters p = (E0, V0, B0, B0'): the energy E(V), the pressure
 * P = -dE/dV and the bulk modulus B = -V dP/dV, in any consistent units (energy, volume, energy / volume).
 * <ul>
 *   <li>Birch-Murnaghan, third order (F. Birch, Phys. Rev. 71 (1947) 809), with y = (V0/V)^{1/3}:
 *       E = E0 + (9 V0 B0 / 16) [(y^2 - 1)^3 B0' + (y^2 - 1)^2 (6 - 4 y^2)],
 *       P = (3 B0 / 2)(y^7 - y^5)[1 + (3/4)(B0' - 4)(y^2 - 1)].</li>
 *   <li>Vinet (P. Vinet, J. H. Rose, J. Ferrante, J. R. Smith, J. Phys. C 19 (1986) L467), with
 *       x = (V/V0)^{1/3} and a = (3/2)(B0' - 1):
 *       E = E0 + (2 B0 V0 / (B0' - 1)^2)[2 - (5 + 3 B0'(x - 1) - 3x) e^{-a(x - 1)}],
 *       P = 3 B0 (1 - x) x^{-2} e^{a(1 - x)}; needs B0' != 1.</li>
 *   <li>Murnaghan (F. D. Murnaghan, Proc. Natl. Acad. Sci. 30 (1944) 244):
 *       E = E0 + (B0 V / B0')[(V0/V)^{B0'} / (B0' - 1) + 1] - B0 V0 / (B0' - 1),
 *       P = (B0 / B0')[(V0/V)^{B0'} - 1]; needs B0' != 0, 1.</li>
 * </ul>
 */
public enum EquationOfState {
    BIRCH_MURNAGHAN_3,
    VINET,
    MURNAGHAN;

    /** E(V) for parameters p = (E0, V0, B0, B0'). */
    public double energy(double v, double[] p) {
        double e0 = p[0];
        double v0 = p[1];
        double b0 = p[2];
        double b1 = p[3];
        switch (this) {
            case BIRCH_MURNAGHAN_3 -> {
                double y2 = Math.cbrt(v0 / v);
                y2 *= y2;
                double d = y2 - 1;
                return e0 + 9 * v0 * b0 / 16 * (d * d * d * b1 + d * d * (6 - 4 * y2));
            }
            case VINET -> {
                double x = Math.cbrt(v / v0);
                double a = 1.5 * (b1 - 1);
                double k = 2 * b0 * v0 / ((b1 - 1) * (b1 - 1));
                return e0 + k * (2 - (5 + 3 * b1 * (x - 1) - 3 * x) * Math.exp(-a * (x - 1)));
            }
            default -> {
                return e0 + b0 * v / b1 * (Math.pow(v0 / v, b1) / (b1 - 1) + 1) - b0 * v0 / (b1 - 1);
            }
        }
    }

    /** P(V) = -dE/dV. */
    public double pressure(double v, double[] p) {
        double v0 = p[1];
        double b0 = p[2];
        double b1 = p[3];
        switch (this) {
            case BIRCH_MURNAGHAN_3 -> {
                double y = Math.cbrt(v0 / v);
                double y2 = y * y;
                double y5 = y2 * y2 * y;
                return 1.5 * b0 * (y5 * y2 - y5) * (1 + 0.75 * (b1 - 4) * (y2 - 1));
            }
            case VINET -> {
                double x = Math.cbrt(v / v0);
                return 3 * b0 * (1 - x) / (x * x) * Math.exp(1.5 * (b1 - 1) * (1 - x));
            }
            default -> {
                return b0 / b1 * (Math.pow(v0 / v, b1) - 1);
            }
        }
    }

    /** B(V) = -V dP/dV. */
    public double bulkModulus(double v, double[] p) {
        double v0 = p[1];
        double b0 = p[2];
        double b1 = p[3];
        switch (this) {
            case BIRCH_MURNAGHAN_3 -> {
                double y = Math.cbrt(v0 / v);
                double y2 = y * y;
                double y4 = y2 * y2;
                double bracket = 1 + 0.75 * (b1 - 4) * (y2 - 1);
                double dPdy = 1.5 * b0 * ((7 * y4 * y2 - 5 * y4) * bracket + (y4 * y2 * y - y4 * y) * 1.5 * (b1 - 4) * y);
                return y / 3 * dPdy;
            }
            case VINET -> {
                double x = Math.cbrt(v / v0);
                double a = 1.5 * (b1 - 1);
                return b0 * Math.exp(a * (1 - x)) * ((2 - x) / (x * x) + a * (1 - x) / x);
            }
            default -> {
                return b0 * Math.pow(v0 / v, b1);
            }
        }
    }
}
