package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class EosFitTest {

    private static final double[] TRUE = {-2500.0, 40.0, 8000.0, 4.3};

    private static double[] volumes() {
        double[] v = new double[11];
        for (int i = 0; i < v.length; i++) {
            v[i] = 35 + i;
        }
        return v;
    }

    @ParameterizedTest
    @EnumSource(EquationOfState.class)
    void recoversTheParametersOfDataDrawnFromItsOwnForm(EquationOfState form) {
        double[] v = volumes();
        double[] e = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            e[i] = form.energy(v[i], TRUE);
        }
        EosFit fit = EosFit.of(form, v, e, null);
        assertNotNull(fit);
        double[] p = fit.parameters();
        // Exact data: only rounding (about 1e-13 of the energy span of ~100) limits the fit.
        assertEquals(TRUE[0], p[0], 1e-8);
        assertEquals(TRUE[1], p[1], 1e-8);
        assertEquals(TRUE[2], p[2], 1e-5);
        assertEquals(TRUE[3], p[3], 1e-6);
        assertTrue(fit.maxAbsoluteResidual() < 1e-9);
    }

    @ParameterizedTest
    @EnumSource(EquationOfState.class)
    void pressureAndBulkModulusAreTheDerivativesOfTheEnergy(EquationOfState form) {
        // P = -dE/dV and B = -V dP/dV by central differences (h = 1e-4: truncation ~1e-8 relative).
        double h = 1e-4;
        for (double v : new double[] {33, 40, 47}) {
            double p = -(form.energy(v + h, TRUE) - form.energy(v - h, TRUE)) / (2 * h);
            double b = -v * (form.pressure(v + h, TRUE) - form.pressure(v - h, TRUE)) / (2 * h);
            assertEquals(p, form.pressure(v, TRUE), 1e-6 * TRUE[2]);
            assertEquals(b, form.bulkModulus(v, TRUE), 1e-6 * TRUE[2]);
        }
        assertEquals(0, form.pressure(TRUE[1], TRUE), 1e-12 * TRUE[2]);
        assertEquals(TRUE[2], form.bulkModulus(TRUE[1], TRUE), 1e-12 * TRUE[2]);
    }

    @Test
    void theMinimumUnderPressureSitsWhereTheFittedPressureEqualsIt() {
        double[] v = volumes();
        double[] e = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            e[i] = EquationOfState.VINET.energy(v[i], TRUE);
        }
        EosFit fit = EosFit.of(EquationOfState.VINET, v, e, null);
        EosMinimum m = EosMinimum.of(fit, 500, new double[v.length]);
        assertEquals(500, EquationOfState.VINET.pressure(m.volume(), TRUE), 1e-6);
        assertEquals(EquationOfState.VINET.energy(m.volume(), TRUE) + 500 * m.volume(), m.gibbsEnergy(), 1e-8);
    }

    @Test
    void concaveDataHaveNoFit() {
        double[] v = volumes();
        double[] e = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            e[i] = -(v[i] - 40) * (v[i] - 40);
        }
        assertNull(EosFit.of(EquationOfState.BIRCH_MURNAGHAN_3, v, e, null));
    }
}
