package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Phase and magnitude of the factored form at points where the exact value is known. */
class TransferFunctionPhaseTest {

    private static final double TWO_PI = 2 * Math.PI;

    @Test
    void tripleRealPoleAtRootThree() {
        // H = 1/(s+1)³ at ω = √3: 1 + j√3 = 2·e^(j60°), so |H| = 1/2³ = 1/8 and arg H = −3·60° = −180°.
        TransferFunction h = TransferFunction.of(1, 0, List.of(),
                List.of(Root.real(-1), Root.real(-1), Root.real(-1)));
        double f = Math.sqrt(3) / TWO_PI;
        assertEquals(-180.0, h.phaseDeg(f), 1e-12);
        assertEquals(0.125, h.magnitude(f), 1e-15);
    }

    @Test
    void tripleIntegratorIsMinus270EverywhereNeverPlus90() {
        // 1/(jω)³ = j/ω³: principal value +90°, continuous value −3·90° = −270°.
        TransferFunction h = TransferFunction.integrators(1, 3);
        for (double f : TestSystems.logSpace(1e-3, 1e7, 41)) {
            assertEquals(-270.0, h.phaseDeg(f), 1e-12);
            assertEquals(Math.pow(TWO_PI * f, -3), h.magnitude(f), 1e-12 * Math.pow(TWO_PI * f, -3));
        }
    }

    @Test
    void negativeGainIsMinus180NotPlus180() {
        // Convention: a negative gain contributes −180°.
        assertEquals(-180.0, TransferFunction.constant(-3).phaseDeg(1.0), 0);
        // −1/(1 + s) tends to −180° − 90° = −270° at high frequency.
        TransferFunction h = TransferFunction.of(-1, 0, List.of(), List.of(Root.real(-1)));
        assertEquals(-270.0, h.phaseDeg(1e9), 1e-6);
        assertEquals(-180.0, h.phaseDeg(1e-9), 1e-6);
    }

    @Test
    void polePairOnTheAxisGivesNoNaNAwayFromResonance() {
        // 1/(s² + 1): |H| = 1/|1 − ω²|, phase 0° below ω = 1 and −180° above (limit Q → +∞).
        TransferFunction h = TransferFunction.of(1, 0, List.of(), List.of(new Root(0, 1)));
        for (double w : new double[] {0.01, 0.5, 0.999, 1.001, 2, 100}) {
            double f = w / TWO_PI;
            double mag = h.magnitude(f);
            assertTrue(Double.isFinite(mag) && Double.isFinite(h.phaseDeg(f)), "finite at ω = " + w);
            assertEquals(1 / Math.abs(1 - w * w), mag, 1e-9 * mag);
            assertEquals(w < 1 ? 0.0 : -180.0, h.phaseDeg(f), 1e-12);
        }
    }

    @Test
    void zeroPairOnTheAxisGivesNoNaNAwayFromNotch() {
        // (s² + 4)/4 as a zero pair at 2 rad/s: value 1 − ω²/4, phase 0° below, +180° above.
        TransferFunction h = TransferFunction.of(1, 0, List.of(new Root(0, 2)), List.of());
        for (double w : new double[] {0.1, 1.9, 2.1, 50}) {
            double f = w / TWO_PI;
            assertEquals(Math.abs(1 - w * w / 4), h.magnitude(f), 1e-12 * Math.abs(1 - w * w / 4) + 1e-15);
            assertEquals(w < 2 ? 0.0 : 180.0, h.phaseDeg(f), 1e-12);
        }
    }

    @Test
    void dcGainOnlyWhereFinite() {
        TransferFunction lag = TransferFunction.of(2.5, 0, List.of(Root.real(-3)), List.of(Root.real(-1)));
        assertEquals(2.5, lag.dcGain(), 0);
        assertEquals(0.0, TransferFunction.integrators(4, -1).dcGain(), 0);
        assertTrue(!TransferFunction.integrators(4, 1).hasFiniteDcGain());
        org.junit.jupiter.api.Assertions.assertThrows(ArithmeticException.class,
                () -> TransferFunction.integrators(4, 1).dcGain());
    }

    @Test
    void manyFactorsNeitherOverflowNorLoseAccuracy() {
        // 1e300 / (1 + s/ω1)^70 with ω1 = 2π·1 Hz, at 1e5 Hz: the pole product alone is ~1e350 (overflow),
        // the value is |H| = 1e300·(1 + 1e10)^(−35), arg H = −70·atan(1e5).
        List<Root> poles = new java.util.ArrayList<>();
        for (int i = 0; i < 70; i++) {
            poles.add(Root.realAtHz(1));
        }
        TransferFunction h = TransferFunction.of(1e300, 0, List.of(), poles);
        double log10Mag = 300 - 35 * Math.log10(1 + 1e10);
        double[] out = new double[2];
        h.evaluateInto(1e5, out);
        assertEquals(log10Mag, Math.log10(Math.hypot(out[0], out[1])), 1e-12);
        double expectedPhase = -70 * Math.toDegrees(Math.atan(1e5));
        assertEquals(PhaseUnwrapper.wrapDeg(expectedPhase), Math.toDegrees(Math.atan2(out[1], out[0])), 1e-9);
        assertEquals(expectedPhase, h.phaseDeg(1e5), 1e-9);
    }

    @Test
    void pointwiseProductKeepsContinuousPhase() {
        // The product of responses equals the factored product; its phase is the sum of the phases.
        TransferFunction a = TransferFunction.integrators(10, 2);
        TransferFunction b = TransferFunction.of(-1, 0, List.of(Root.realAtHz(30)), List.of(Root.pairAtHz(1e3, 3)));
        ComplexResponse product = ComplexResponse.product(a, b);
        assertTrue(product instanceof ContinuousPhaseResponse);
        TransferFunction exact = a.times(b);
        for (double f : TestSystems.logSpace(1, 1e5, 21)) {
            assertEquals(0, product.evaluate(f).subtract(exact.evaluate(f)).abs() / exact.magnitude(f), 1e-14);
            assertEquals(exact.phaseDeg(f), ((ContinuousPhaseResponse) product).phaseDeg(f), 1e-12);
        }
        ComplexResponse bare = ComplexResponse.product(a::evaluateInto, b);
        assertTrue(!(bare instanceof ContinuousPhaseResponse));
    }
}
