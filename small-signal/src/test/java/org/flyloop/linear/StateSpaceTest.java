package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/** State-space evaluation, realisation and conversion, each against an independent route. */
class StateSpaceTest {

    private static final double TWO_PI = 2 * Math.PI;

    @Test
    void tenthOrderRealisationMatchesFactoredFormAcrossSixDecades() {
        // Reference: the factored form, which never forms (sI − A); the state-space side solves
        // (j2πf·I − A)x = b by complex LU. 241 frequencies from 1 Hz to 1 MHz.
        TransferFunction h = TestSystems.tenthOrder();
        StateSpace ss = StateSpace.fromTransferFunction(h);
        assertEquals(10, ss.stateCount());
        double[] f = TestSystems.logSpace(1, 1e6, 241);
        FrequencyResponse exact = FrequencyResponse.of(h, f);
        FrequencyResponse fromStates = FrequencyResponse.of(ss, f);
        double worstMag = 0;
        double worstPhase = 0;
        for (int i = 0; i < f.length; i++) {
            worstMag = Math.max(worstMag, Math.abs(fromStates.magnitude(i) / exact.magnitude(i) - 1));
            worstPhase = Math.max(worstPhase, Math.abs(fromStates.phaseDeg(i) - exact.phaseDeg(i)));
        }
        assertTrue(worstMag < 1e-9, "worst relative magnitude difference " + worstMag);
        assertTrue(worstPhase < 1e-7, "worst phase difference (deg) " + worstPhase);
    }

    @Test
    void roundTripThroughStateSpaceRecoversRoots() {
        TransferFunction h = TestSystems.tenthOrder();
        TransferFunction back = StateSpace.fromTransferFunction(h).toTransferFunction();
        assertTrue(TestSystems.worstRootError(h.poles(), back.poles()) < 1e-8, back.toString());
        assertTrue(TestSystems.worstRootError(h.zeros(), back.zeros()) < 1e-8, back.toString());
        assertEquals(h.gain(), back.gain(), 1e-8 * h.gain());
        assertEquals(h.integrators(), back.integrators());
    }

    @Test
    void roundTripWithFeedThroughIntegratorsAndDifferentiators() {
        List<TransferFunction> cases = List.of(
                TransferFunction.of(-2, 0, List.of(Root.realAtHz(10), Root.pairAtHz(1e4, 8), Root.rightHalfPlaneAtHz(3e3)),
                        List.of(Root.realAtHz(1), Root.pairAtHz(100, 0.6), Root.realAtHz(5e5))),
                TransferFunction.of(100, 2, List.of(Root.pairAtHz(1e3, 0.7)), List.of()),
                TransferFunction.of(1, -1, List.of(), List.of(Root.realAtHz(100), Root.pairAtHz(1e3, 3))),
                TransferFunction.integrators(5, 3));
        for (TransferFunction h : cases) {
            TransferFunction back = StateSpace.fromTransferFunction(h).toTransferFunction();
            assertTrue(TestSystems.worstRootError(h.poles(), back.poles()) < 1e-8, h + " -> " + back);
            assertTrue(TestSystems.worstRootError(h.zeros(), back.zeros()) < 1e-8, h + " -> " + back);
            assertEquals(h.integrators(), back.integrators(), h + " -> " + back);
            assertEquals(h.gain(), back.gain(), 1e-8 * Math.abs(h.gain()), h + " -> " + back);
        }
    }

    /**
     * One plant built three ways. Buck-type LC output filter with load R and capacitor ESR r,
     * driven by voltage u; output vo. Circuit equations (states iL, vC):
     * <pre>
     *   L·diL/dt = u − vo,  C·dvC/dt = iL − vo/R,  vo = (vC + r·iL)·R/(R + r)
     * </pre>
     * With the load branch Z = R ∥ (r + 1/(sC)) = R(1 + sCr)/(1 + sC(R + r)), vo/u = Z/(sL + Z):
     * <pre>
     *   H(s) = R(1 + sCr) / (LC(R + r)·s² + (L + RCr)·s + R)
     * </pre>
     * so the zero is at −1/(Cr), ω0² = R/(LC(R + r)) and ω0/Q = (L + RCr)/(LC(R + r)).
     */
    @Test
    void samePlantFactoredFromPolynomialsAndFromCircuitStatesAgree() {
        double l = 10e-6;
        double c = 470e-6;
        double r = 0.02;
        double rl = 2.0;
        double w0 = Math.sqrt(rl / (l * c * (rl + r)));
        double q = w0 * l * c * (rl + r) / (l + rl * c * r);
        TransferFunction factored = TransferFunction.of(1, 0, List.of(Root.real(-1 / (c * r))), List.of(Root.pair(w0, q)));
        TransferFunction fromPolynomials = TransferFunction.fromPolynomials(new double[] {rl, rl * c * r},
                new double[] {rl, l + rl * c * r, l * c * (rl + r)});
        double k = rl / (rl + r);
        StateSpace circuit = StateSpace.of(
                new double[][] {{-k * r / l, -k / l}, {(1 - k * r / rl) / c, -k / (rl * c)}},
                new double[][] {{1 / l}, {0}},
                new double[][] {{k * r, k}},
                new double[][] {{0}});
        double worst = 0;
        for (double f : FrequencyGrid.refinedFor(10, 1e6, 50, factored).frequenciesHz()) {
            Complex ref = factored.evaluate(f);
            worst = Math.max(worst, fromPolynomials.evaluate(f).subtract(ref).abs() / ref.abs());
            worst = Math.max(worst, circuit.evaluate(f).subtract(ref).abs() / ref.abs());
        }
        assertTrue(worst < 1e-9, "worst relative disagreement " + worst);
        TransferFunction fromCircuit = circuit.toTransferFunction();
        assertTrue(TestSystems.worstRootError(factored.poles(), fromCircuit.poles()) < 1e-10, fromCircuit.toString());
        assertTrue(TestSystems.worstRootError(factored.zeros(), fromCircuit.zeros()) < 1e-10, fromCircuit.toString());
    }

    @Test
    void seriesAndFeedbackMatchTransferFunctionAlgebra() {
        TransferFunction plant = TransferFunction.of(20, 0, List.of(Root.rightHalfPlaneAtHz(4e4)),
                List.of(Root.pairAtHz(2e3, 5)));
        TransferFunction comp = TransferFunction.of(300, 1, List.of(Root.realAtHz(800)), List.of(Root.realAtHz(3e4)));
        StateSpace loop = StateSpace.fromTransferFunction(comp).series(StateSpace.fromTransferFunction(plant));
        StateSpace closed = loop.feedback();
        TransferFunction loopTf = comp.times(plant);
        TransferFunction closedTf = loopTf.feedback();
        double worst = 0;
        for (double f : TestSystems.logSpace(1, 1e6, 121)) {
            Complex l = loopTf.evaluate(f);
            worst = Math.max(worst, loop.evaluate(f).subtract(l).abs() / l.abs());
            // reference for the closed loop: L/(1 + L) pointwise
            Complex t = l.divide(l.add(1));
            worst = Math.max(worst, closed.evaluate(f).subtract(t).abs() / t.abs());
            worst = Math.max(worst, closedTf.evaluate(f).subtract(t).abs() / t.abs());
        }
        assertTrue(worst < 1e-9, "worst relative disagreement " + worst);
        assertTrue(TestSystems.worstRootError(closedTf.poles(), closed.toTransferFunction().poles()) < 1e-8);
    }

    @Test
    void parallelConnectionIsTheSum() {
        TransferFunction a = TransferFunction.of(1, 0, List.of(), List.of(Root.real(-1)));
        TransferFunction b = TransferFunction.of(2.0 / 3, 0, List.of(), List.of(Root.real(-3)));
        StateSpace sum = StateSpace.fromTransferFunction(a).plus(StateSpace.fromTransferFunction(b));
        // 1/(s+1) + 2/(s+3) = (3s + 5)/((s+1)(s+3)), see TransferFunctionAlgebraTest
        TransferFunction tf = sum.toTransferFunction();
        assertEquals(0, TestSystems.worstRootError(List.of(Root.real(-5.0 / 3)), tf.zeros()), 1e-13);
        assertEquals(5.0 / 3, tf.dcGain(), 1e-13);
    }

    @Test
    void multipleChannelsByIndex() {
        // two inputs, two outputs: y0 = x/(…) from u0, y1 = 2·u1 directly
        StateSpace ss = StateSpace.of(new double[][] {{-5}}, new double[][] {{5, 0}},
                new double[][] {{1}, {0}}, new double[][] {{0, 0}, {0, 2}});
        assertEquals(1.0, ss.toTransferFunction(0, 0).dcGain(), 1e-14);
        assertEquals(2.0, ss.toTransferFunction(1, 1).dcGain(), 0);
        assertEquals(0.0, ss.toTransferFunction(0, 1).gain(), 0);
        assertThrows(IndexOutOfBoundsException.class, () -> ss.channel(2, 0));
    }

    @Test
    void improperTransferFunctionHasNoRealisation() {
        assertThrows(IllegalArgumentException.class,
                () -> StateSpace.fromTransferFunction(TransferFunction.integrators(1, -1)));
    }
}
