package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/** Sums and feedback against hand-derived closed forms and pointwise complex arithmetic. */
class TransferFunctionAlgebraTest {

    private static final double TWO_PI = 2 * Math.PI;

    @Test
    void unityFeedbackOfIntegratorAndPoleMatchesClosedForm() {
        // L = K/(s(s + a)) ⇒ L/(1 + L) = K/(s² + a·s + K): ω0 = √K, 2ζω0 = a.
        // K = 4e6, a = 1000 ⇒ ω0 = 2000 rad/s, ζ = 0.25, poles −500 ± j·√(4e6 − 2.5e5) = −500 ± j·1936.49…
        double k = 4e6;
        double a = 1000;
        TransferFunction loop = TransferFunction.of(k / a, 1, List.of(), List.of(Root.real(-a)));
        TransferFunction closed = loop.feedback();
        Root expected = new Root(-a / 2, Math.sqrt(k - a * a / 4));
        assertEquals(0, TestSystems.worstRootError(List.of(expected), closed.poles()), 1e-14);
        assertEquals(0, closed.integrators());
        assertEquals(1.0, closed.dcGain(), 1e-14);
        for (double f : TestSystems.logSpace(1, 1e6, 61)) {
            Complex s = new Complex(0, TWO_PI * f);
            Complex exact = new Complex(k).divide(s.multiply(s).add(s.multiply(a)).add(k));
            assertEquals(0, closed.evaluate(f).subtract(exact).abs() / exact.abs(), 1e-13, "f = " + f);
        }
    }

    @Test
    void sumMatchesHandDerivedPolynomial() {
        // 1/(s + 1) + 2/(s + 3) = (s + 3 + 2s + 2)/((s + 1)(s + 3)) = (3s + 5)/((s + 1)(s + 3)):
        // zero at −5/3, poles −1 and −3, DC gain 5/3.
        TransferFunction h1 = TransferFunction.of(1, 0, List.of(), List.of(Root.real(-1)));
        TransferFunction h2 = TransferFunction.of(2.0 / 3, 0, List.of(), List.of(Root.real(-3)));
        TransferFunction sum = h1.plus(h2);
        assertEquals(0, TestSystems.worstRootError(List.of(Root.real(-5.0 / 3)), sum.zeros()), 1e-15);
        assertEquals(0, TestSystems.worstRootError(List.of(Root.real(-1), Root.real(-3)), sum.poles()), 0);
        assertEquals(5.0 / 3, sum.dcGain(), 1e-15);
    }

    @Test
    void differenceWithIntegratorsMatchesHandDerivation() {
        // 1/s − 1/(s + 2) = 2/(s(s + 2)): no finite zero, one integrator, gain 2/2 = 1.
        TransferFunction d = TransferFunction.integrators(1, 1)
                .minus(TransferFunction.of(0.5, 0, List.of(), List.of(Root.real(-2))));
        assertEquals(1, d.integrators());
        assertEquals(0, d.zeros().size(), d.toString());
        assertEquals(1.0, d.gain(), 1e-15);
        // H − H = 0 exactly; H + H keeps the poles of H (common denominator), gain doubles
        TransferFunction h = TestSystems.tenthOrder();
        assertEquals(0.0, h.minus(h).gain(), 0);
        TransferFunction twice = h.plus(h);
        assertEquals(h.poles().size(), twice.poles().size());
        assertEquals(2 * h.gain(), twice.gain(), 1e-12 * h.gain());
    }

    @Test
    void wideBandSumAndFeedbackAgreeWithPointwiseArithmetic() {
        // Reference: H1(jω) + H2(jω) and G/(1 + G·H) evaluated point by point in complex arithmetic.
        TransferFunction g = TestSystems.tenthOrder();
        TransferFunction h2 = TransferFunction.of(3e3, 1, List.of(Root.realAtHz(50), Root.pairAtHz(3e5, 3)),
                List.of(Root.realAtHz(5), Root.pairAtHz(2e4, 0.9), Root.realAtHz(7e5)));
        TransferFunction sensor = TransferFunction.of(0.25, 0, List.of(Root.realAtHz(1.5e3)),
                List.of(Root.realAtHz(9e4)));
        TransferFunction sum = g.plus(h2);
        TransferFunction closed = h2.feedback(sensor);
        double worstSum = 0;
        double worstClosed = 0;
        for (double f : TestSystems.logSpace(0.1, 1e7, 321)) {
            Complex refSum = g.evaluate(f).add(h2.evaluate(f));
            worstSum = Math.max(worstSum, sum.evaluate(f).subtract(refSum).abs() / refSum.abs());
            Complex gv = h2.evaluate(f);
            Complex refClosed = gv.divide(Complex.ONE.add(gv.multiply(sensor.evaluate(f))));
            worstClosed = Math.max(worstClosed, closed.evaluate(f).subtract(refClosed).abs() / refClosed.abs());
        }
        assertTrue(worstSum < 1e-10, "sum worst relative error " + worstSum);
        assertTrue(worstClosed < 1e-10, "closed-loop worst relative error " + worstClosed);
    }

    @Test
    void feedbackCancelsSharedRoots() {
        // G = (s + 3)/((s + 1)(s + 2)), H = 1/(s + 3): G/(1 + GH) = (s + 3)²/((s+1)(s+2)(s+3) + (s + 3))
        // = (s + 3)/((s + 1)(s + 2) + 1) = (s + 3)/(s² + 3s + 3): poles −1.5 ± j·√3/2.
        TransferFunction g = TransferFunction.of(1.5, 0, List.of(Root.real(-3)), List.of(Root.real(-1), Root.real(-2)));
        TransferFunction h = TransferFunction.of(1.0 / 3, 0, List.of(), List.of(Root.real(-3)));
        TransferFunction closed = g.feedback(h);
        assertEquals(1, closed.zeros().size(), closed.toString());
        assertEquals(0, TestSystems.worstRootError(List.of(new Root(-1.5, Math.sqrt(3) / 2)), closed.poles()), 1e-14);
        assertEquals(1.0, closed.dcGain(), 1e-14);
    }
}
