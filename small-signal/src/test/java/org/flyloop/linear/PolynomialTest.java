package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

class PolynomialTest {

    @Test
    void coefficientsAreAscendingAndTrailingZerosDropped() {
        Polynomial p = Polynomial.ofAscending(1, 2, 0, 0);
        assertEquals(1, p.degree());
        assertArrayEquals(new double[] {1, 2}, p.coefficientsAscending());
        assertEquals(0, Polynomial.ofAscending(0, 0).degree());
    }

    @Test
    void productAndSumMatchHandExpansion() {
        // (1 + 2s)(3 − s) = 3 − s + 6s − 2s² = 3 + 5s − 2s²
        Polynomial product = Polynomial.ofAscending(1, 2).times(Polynomial.ofAscending(3, -1));
        assertArrayEquals(new double[] {3, 5, -2}, product.coefficientsAscending());
        // (3 + 5s − 2s²) + (−3 + s²) = 5s − s²
        Polynomial sum = product.plus(Polynomial.ofAscending(-3, 0, 1));
        assertArrayEquals(new double[] {0, 5, -1}, sum.coefficientsAscending());
        assertEquals(1, sum.rootsAtOrigin());
    }

    @Test
    void derivativeAndComplexEvaluation() {
        // p = 1 + s + s³: p' = 1 + 3s²; p(j) = 1 + j − j = 1; p'(j) = 1 − 3 = −2
        Polynomial p = Polynomial.ofAscending(1, 1, 0, 1);
        assertArrayEquals(new double[] {1, 0, 3}, p.derivative().coefficientsAscending());
        Complex v = p.evaluate(Complex.I);
        assertEquals(1.0, v.getReal(), 1e-15);
        assertEquals(0.0, v.getImaginary(), 1e-15);
        assertEquals(-2.0, p.derivative().evaluate(Complex.I).getReal(), 1e-15);
    }

    @Test
    void normalizedFactorsHaveUnitConstantTerm() {
        // (1 + s/2)·(1 + s/(ω0·Q) + s²/ω0²) with ω0 = 10, Q = 5: 1 + s(0.5 + 0.02) + s²(0.01 + 0.01) + s³·0.005
        Polynomial p = Polynomial.ofNormalizedFactors(List.of(Root.real(-2), Root.pair(10, 5)));
        assertArrayEquals(new double[] {1, 0.52, 0.02, 0.005}, p.coefficientsAscending(), 1e-15);
    }

    @Test
    void scaledArgumentMultipliesByPowers() {
        // p(2x) for p = 1 + 3s + s²: 1 + 6x + 4x²
        assertArrayEquals(new double[] {1, 6, 4},
                Polynomial.ofAscending(1, 3, 1).withScaledArgument(2).coefficientsAscending());
    }

    @Test
    void rejectsNonFinite() {
        assertThrows(IllegalArgumentException.class, () -> Polynomial.ofAscending(1, Double.NaN));
    }
}
