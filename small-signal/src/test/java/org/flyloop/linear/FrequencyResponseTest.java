package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Continuous phase from sampled evaluators, against analytic phases. */
class FrequencyResponseTest {

    @Test
    void tripleIntegratorStateSpaceIsMinus270() {
        // Chain of three integrators x1' = u, x2' = x1, x3' = x2, y = x3: H = 1/s³, phase −270°.
        StateSpace chain = StateSpace.of(new double[][] {{0, 0, 0}, {1, 0, 0}, {0, 1, 0}},
                new double[][] {{1}, {0}, {0}}, new double[][] {{0, 0, 1}}, new double[][] {{0}});
        FrequencyResponse r = FrequencyResponse.of(chain, FrequencyGrid.logarithmic(0.01, 1e4, 20));
        for (int i = 0; i < r.size(); i++) {
            assertEquals(-270.0, r.phaseDeg(i), 1e-9);
        }
    }

    @Test
    void negativeRealResponseIsMinus180() {
        // −2/(1 + s/10) from states: −180° at low frequency, towards −270° at high frequency (never +90°).
        StateSpace ss = StateSpace.fromTransferFunction(
                TransferFunction.of(-2, 0, List.of(), List.of(Root.real(-10))));
        FrequencyResponse r = FrequencyResponse.of(ss, FrequencyGrid.logarithmic(1e-3, 1e4, 20));
        for (int i = 0; i < r.size(); i++) {
            // arg of −2/(1 + jω/10), branch continuous from −180° at ω → 0
            double expected = -180 - Math.toDegrees(Math.atan(2 * Math.PI * r.frequencyHz(i) / 10));
            assertEquals(expected, r.phaseDeg(i), 1e-9);
        }
        // a static negative gain, no states at all
        StateSpace k = StateSpace.of(new double[0][0], new double[0][0], new double[0][0], new double[][] {{-1}});
        assertEquals(-180.0, FrequencyResponse.of(k, new double[] {1, 10}).phaseDeg(1), 0);
    }

    @Test
    void unwrappedStateSpacePhaseEqualsAnalyticPhaseOfTenthOrder() {
        // The phase falls by several turns; unwrapping samples must reproduce the factor sum.
        TransferFunction h = TestSystems.tenthOrder();
        FrequencyGrid grid = FrequencyGrid.refinedFor(0.1, 1e7, 50, h);
        FrequencyResponse exact = FrequencyResponse.of(h, grid);
        FrequencyResponse sampled = FrequencyResponse.of(StateSpace.fromTransferFunction(h), grid);
        for (int i = 0; i < grid.size(); i++) {
            assertEquals(exact.phaseDeg(i), sampled.phaseDeg(i), 1e-7, "f = " + grid.frequencyHz(i));
        }
        assertTrue(exact.phaseDeg(grid.size() - 1) < -600, "phase keeps falling past −360°");
    }

    @Test
    void lightlyDampedPairIsFollowedEvenOnACoarseGrid() {
        // 1/(1 + s/(ω0·Q) + s²/ω0²) with Q = 500 at 1 kHz: phase drops 180° within ±0.1% of f0.
        // A 5-per-decade grid puts no sample near f0; subdivision must still follow the swing.
        TransferFunction h = TransferFunction.of(1, 0, List.of(), List.of(Root.pairAtHz(1e3, 500)));
        ComplexResponse bare = h::evaluateInto;
        FrequencyResponse r = FrequencyResponse.of(bare, FrequencyGrid.logarithmic(1, 1e6, 5));
        for (int i = 0; i < r.size(); i++) {
            assertEquals(h.phaseDeg(r.frequencyHz(i)), r.phaseDeg(i), 1e-9);
        }
    }

    @Test
    void jwAxisPolesGiveFiniteSamplesAndTheLosslessBranch() {
        // 1/(s(s² + 1)): −90° below 1 rad/s, −270° above (pole pair taken as the Q → +∞ limit).
        TransferFunction h = TransferFunction.of(1, 1, List.of(), List.of(new Root(0, 1)));
        FrequencyGrid grid = FrequencyGrid.refinedFor(0.001, 10, 50, h);
        FrequencyResponse exact = FrequencyResponse.of(h, grid);
        FrequencyResponse sampled = FrequencyResponse.of(StateSpace.fromTransferFunction(h), grid);
        for (int i = 0; i < grid.size(); i++) {
            assertTrue(Double.isFinite(exact.magnitudeDb(i)) && Double.isFinite(exact.phaseDeg(i)));
            assertTrue(Double.isFinite(sampled.magnitudeDb(i)) && Double.isFinite(sampled.phaseDeg(i)));
            double expected = grid.frequencyHz(i) * 2 * Math.PI < 1 ? -90 : -270;
            assertEquals(expected, exact.phaseDeg(i), 1e-9);
            assertEquals(expected, sampled.phaseDeg(i), 1e-6);
        }
    }
}
