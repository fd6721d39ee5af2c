package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Roots from polynomial coefficients against roots known in closed form. */
class FromPolynomialsTest {

    @Test
    void roundTripOfTenthOrderRecoversRootsTo1e8() {
        TransferFunction h = TestSystems.tenthOrder();
        TransferFunction back = TransferFunction.fromPolynomials(h.numeratorPolynomial(), h.denominatorPolynomial());
        assertTrue(TestSystems.worstRootError(h.poles(), back.poles()) < 1e-8, back.toString());
        assertTrue(TestSystems.worstRootError(h.zeros(), back.zeros()) < 1e-8, back.toString());
        assertEquals(h.gain(), back.gain(), 1e-12 * h.gain());
        assertEquals(0, back.integrators());
    }

    @Test
    void handWrittenCoefficientsGiveKnownRoots() {
        // (s + 2)(s² + 2s + 5) = s³ + 4s² + 9s + 10: roots −2 and −1 ± 2j; numerator 5(s + 7) = 35 + 5s.
        TransferFunction h = TransferFunction.fromPolynomials(new double[] {35, 5}, new double[] {10, 9, 4, 1});
        assertEquals(0, TestSystems.worstRootError(List.of(Root.real(-2), new Root(-1, 2)), h.poles()), 1e-15);
        assertEquals(0, TestSystems.worstRootError(List.of(Root.real(-7)), h.zeros()), 1e-15);
        // low-frequency gain 35/10
        assertEquals(3.5, h.dcGain(), 1e-15);
    }

    @Test
    void exactZeroLowCoefficientsBecomeIntegrators() {
        // (s + 1) / (s³ + 3s²) = (s + 1)/(s²(s + 3)): two integrators, gain 1/3.
        TransferFunction h = TransferFunction.fromPolynomials(new double[] {1, 1}, new double[] {0, 0, 3, 1});
        assertEquals(2, h.integrators());
        assertEquals(1.0 / 3, h.gain(), 1e-15);
        // a numerator s² over s: one differentiator
        TransferFunction d = TransferFunction.fromPolynomials(new double[] {0, 0, 2}, new double[] {0, 1, 1});
        assertEquals(-1, d.integrators());
    }

    @Test
    void multipleRootsAreRecoveredToRoundOff() {
        // (s + 1)³ = 1 + 3s + 3s² + s³ and (s² + s + 1)² = 1 + 2s + 3s² + 2s³ + s⁴ (double pair at 1 rad/s, Q = 1).
        // Plain companion eigenvalues of an m-fold root are only ε^(1/m) accurate (6e−6 for m = 3);
        // cluster averaging must bring them to round-off.
        TransferFunction h = TransferFunction.fromPolynomials(new double[] {1}, new double[] {1, 3, 3, 1});
        assertEquals(0, TestSystems.worstRootError(List.of(Root.real(-1), Root.real(-1), Root.real(-1)), h.poles()),
                1e-12);
        TransferFunction p = TransferFunction.fromPolynomials(new double[] {1}, new double[] {1, 2, 3, 2, 1});
        Root pair = Root.pair(1, 1);
        assertEquals(0, TestSystems.worstRootError(List.of(pair, pair), p.poles()), 1e-12);
    }

    @Test
    void commonFactorsCancel() {
        // (s + 1)(s + 4) / ((s + 1)(s + 2)) = (s + 4)/(s + 2)
        TransferFunction h = TransferFunction.fromPolynomials(new double[] {4, 5, 1}, new double[] {2, 3, 1});
        assertEquals(1, h.poles().size());
        assertEquals(1, h.zeros().size());
        assertEquals(-2, h.poles().get(0).re(), 1e-14);
        assertEquals(-4, h.zeros().get(0).re(), 1e-14);
    }

    @Test
    void wideSpreadRealPolynomialFromVietaFormulas() {
        // Roots −1, −1e3, −1e6 (rad/s): coefficients by Vieta, written out by hand:
        // (s + 1)(s + 1e3)(s + 1e6) = s³ + 1001001 s² + 1001001000 s + 1e9
        TransferFunction h = TransferFunction.fromPolynomials(new double[] {1e9},
                new double[] {1e9, 1001001000.0, 1001001, 1});
        List<Root> expected = List.of(Root.real(-1), Root.real(-1e3), Root.real(-1e6));
        assertTrue(TestSystems.worstRootError(expected, h.poles()) < 1e-14, h.toString());
    }
}
