package org.statesum.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class DebyeFunctionTest {

    private static final double EPS = Math.ulp(1.0);

    /**
     * Six-decimal values in the layout of the handbook table (Abramowitz and Stegun, Table 27.1, the n = 3
     * column). The table itself was not at hand: these are the 30-digit references below rounded to six
     * decimals, and agree with the table's entries as recalled from memory (D_3(1) = 0.674416,
     * D_3(2) = 0.441128).
     */
    @ParameterizedTest
    @CsvSource({"0.5, 0.824963", "1.0, 0.674416", "2.0, 0.441128", "3.0, 0.283580", "5.0, 0.117597", "10.0, 0.019296"})
    void matchesTheHandbookTableToItsSixDecimals(double x, double table) {
        assertEquals(table, DebyeFunction.value(x), 5e-7); // half a unit in the table's last place
    }

    /**
     * 30-digit values of (3/x^3) int_0^x t^3/(e^t - 1) dt by adaptive quadrature (mpmath 1.3.0, mp.dps = 30,
     * computed for this test). The computed error bound must cover the true error and not exceed it by
     * more than a few hundred times (an honest, not a loose, bound).
     */
    @ParameterizedTest
    @CsvSource({
        "0.1, 0.962999940487211147645811278684",
        "0.5, 0.824962968976233723153235431719",
        "1.0, 0.674415564077814680099618629319",
        "2.0, 0.441128473727624181131831140489",
        "3.0, 0.283579828143422462060900382406",
        "5.0, 0.117597411799933964500152728594",
        "10.0, 0.0192957656903454895625600406437",
        "20.0, 0.00243522006748054798269898109331"})
    void errorBoundCoversTheTrueErrorAgainstThirtyDigitReference(double x, String reference) {
        DebyeFunction.Value d = DebyeFunction.of(x);
        double exact = new java.math.BigDecimal(reference).doubleValue();
        double error = Math.abs(d.value() - exact);
        // The reference itself is rounded once to double (half an ulp).
        assertTrue(error <= d.errorBound() + 0.5 * Math.ulp(exact), "x=" + x + " error " + error + " > " + d.errorBound());
        assertTrue(d.errorBound() <= 500 * EPS * exact, "bound too loose at x=" + x + ": " + d.errorBound());
    }

    /** Independent check in this run: Gauss-Legendre quadrature of the defining integral (commons-math3 rules). */
    @ParameterizedTest
    @ValueSource(doubles = {0.01, 0.3, 1.7, 1.99, 2.01, 4.5, 8, 15, 35, 60})
    void agreesWithGaussLegendreQuadratureOfTheDefinition(double x) {
        // Composite 32-point Gauss-Legendre on panels of width <= 1: the integrand is entire with poles at
        // +-2 pi i, so each panel converges far beyond double precision.
        int panels = (int) Math.ceil(x);
        double integral = 0;
        for (int k = 0; k < panels; k++) {
            GaussIntegrator rule = new GaussIntegratorFactory().legendre(32, x * k / panels, x * (k + 1) / panels);
            integral += rule.integrate(t -> t < 1e-8 ? t * t : t * t * t / Math.expm1(t));
        }
        double quadrature = 3 * integral / (x * x * x);
        // Quadrature rounding (a sum of about 32 panels' worth of terms) within 2e-15 relative; the bound on top.
        assertEquals(quadrature, DebyeFunction.value(x), 2e-15 * quadrature + DebyeFunction.of(x).errorBound());
    }

    @ParameterizedTest
    @ValueSource(doubles = {50, 100, 1e3, 1e6})
    void largeArgumentsFollowTheAsymptote(double x) {
        // D_3(x) = pi^4 / (5 x^3) + O(x^0 e^{-x}) (A&S 27.1.2): the exponential part is below 1e-16 relative here.
        double asymptote = Math.pow(Math.PI, 4) / (5 * x * x * x);
        assertEquals(asymptote, DebyeFunction.value(x), 8 * EPS * asymptote);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, 1e-300, 1e-12})
    void smallArgumentsTendToOne(double x) {
        // D_3(x) = 1 - 3x/8 + x^2/20 + ... (A&S 27.1.1).
        assertEquals(1 - 0.375 * x, DebyeFunction.value(x), 2 * EPS);
    }
}
