package org.statesum.testing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The extended-precision reference checked against published digits and against itself. */
class ExactMathTest {

    private static void assertDigits(String expected, BigDecimal actual) {
        BigDecimal e = new BigDecimal(expected);
        BigDecimal diff = e.subtract(actual).abs();
        // The published strings carry 50 decimals; agreement to 1e-45 shows >= 45 correct digits.
        assertTrue(diff.compareTo(new BigDecimal("1e-45")) < 0, () -> "expected " + expected + " got " + actual);
    }

    @Test
    void constantsMatchPublishedDigits() {
        // pi, e, ln 2 and ln 10 to 50 decimals: OEIS A000796, A001113, A002162, A002392.
        assertDigits("3.14159265358979323846264338327950288419716939937510", ExactMath.PI);
        assertDigits("2.71828182845904523536028747135266249775724709369995", ExactMath.exp(BigDecimal.ONE));
        assertDigits("0.69314718055994530941723212145817656807550013436025", ExactMath.log(2.0));
        assertDigits("2.30258509299404568401799145468436420760110148862877", ExactMath.LN10);
    }

    @Test
    void expAndLogInvertEachOtherAndAgreeWithTheLibraryToAnUlp() {
        SplittableRandom random = new SplittableRandom(7);
        for (int k = 0; k < 300; k++) {
            double x = random.nextDouble(-700, 700);
            BigDecimal e = ExactMath.exp(new BigDecimal(x));
            // Math.exp is specified to within 1 ulp.
            assertEquals(Math.exp(x), e.doubleValue(), Math.ulp(Math.exp(x)));
            BigDecimal back = ExactMath.log(e);
            assertTrue(back.subtract(new BigDecimal(x)).abs().compareTo(new BigDecimal("1e-45")) < 0);
        }
    }

    @Test
    void stirlingSeriesMatchesTheExactFactorial() {
        // ln 2000! from the integer 2000! against the ten-term Stirling series: the two share nothing
        // but ln; the series remainder at N = 2000 is below 1e-60.
        BigDecimal exact = ExactMath.logFactorial(2000);
        BigDecimal series = ExactMath.stirlingLogFactorial(BigDecimal.valueOf(2000));
        assertTrue(exact.subtract(series).abs().compareTo(new BigDecimal("1e-45")) < 0);
        // ln 10! and ln N! for N = the double nearest 1e23 (= 99999999999999991611392) from mpmath
        // (log(factorial(10)), loggamma(N + 1) at 70 digits), an independent multiple-precision library.
        assertDigits("15.1044125730755152952257093292510703718822507442919364721889", ExactMath.logFactorial(10));
        BigDecimal lnAvogadroScale = new BigDecimal("5195945713886304628985281.913717442387192029360329899755963764");
        BigDecimal relative = lnAvogadroScale.subtract(ExactMath.logFactorial(1e23)).abs()
                .divide(lnAvogadroScale, ExactMath.MC);
        assertTrue(relative.compareTo(new BigDecimal("1e-46")) < 0, () -> "relative error " + relative);
    }
}
