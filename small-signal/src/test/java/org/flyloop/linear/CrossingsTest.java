package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Level crossings against closed-form crossover and phase-crossover frequencies. */
class CrossingsTest {

    private static final double TWO_PI = 2 * Math.PI;

    @Test
    void crossoverOfIntegratorWithPoleMatchesClosedForm() {
        // L = K/(s(s + a)): |L(jω)| = K/(ω·√(ω² + a²)) = 1 ⇔ ω⁴ + a²ω² − K² = 0
        // ⇔ ω² = (−a² + √(a⁴ + 4K²))/2. Phase −90° − atan(ω/a) never reaches −180°.
        double k = 4e6;
        double a = 1000;
        TransferFunction loop = TransferFunction.of(k / a, 1, List.of(), List.of(Root.real(-a)));
        FrequencyGrid grid = FrequencyGrid.refinedFor(1, 1e6, 50, loop);
        List<Crossing> gain = Crossings.magnitudeCrossings(loop, grid);
        double wc = Math.sqrt((-a * a + Math.sqrt(a * a * a * a + 4 * k * k)) / 2);
        assertEquals(1, gain.size());
        assertEquals(wc / TWO_PI, gain.get(0).frequencyHz(), 1e-12 * wc / TWO_PI);
        assertEquals(Crossing.Direction.FALLING, gain.get(0).direction());
        assertTrue(Crossings.phaseCrossings(loop, grid).isEmpty());
    }

    @Test
    void tripleLagCrossesMinus180AtRootThree() {
        // L = 4/(s + 1)³: arg = −3·atan ω = −180° at ω = √3, where |L| = 4/8 (gain margin 2);
        // |L| = 1 where (1 + ω²)^(3/2) = 4, ω = √(4^(2/3) − 1).
        TransferFunction loop = TransferFunction.of(4, 0, List.of(),
                List.of(Root.real(-1), Root.real(-1), Root.real(-1)));
        FrequencyGrid grid = FrequencyGrid.logarithmic(0.001, 100, 50);
        List<Crossing> phase = Crossings.phaseCrossings(loop, grid);
        assertEquals(1, phase.size());
        assertEquals(Math.sqrt(3) / TWO_PI, phase.get(0).frequencyHz(), 1e-13);
        assertEquals(-180.0, phase.get(0).level(), 0);
        assertEquals(0.5, loop.magnitude(phase.get(0).frequencyHz()), 1e-12);
        List<Crossing> gain = Crossings.magnitudeCrossings(loop, grid);
        assertEquals(1, gain.size());
        assertEquals(Math.sqrt(Math.pow(4, 2.0 / 3) - 1) / TWO_PI, gain.get(0).frequencyHz(), 1e-13);
    }

    @Test
    void jwAxisPolesGiveNoFalsePhaseCrossing() {
        // L = 1/(s(s² + 1)): phase jumps from −90° to −270° at ω = 1 — a discontinuity, no crossing.
        // |L| = 1/(ω·|1 − ω²|) = 1 only above ω = 1, at the real root of ω³ − ω − 1 = 0,
        // ω = 1.324717957244746 (Cardano: ∛((9 + √69)/18) + ∛((9 − √69)/18)).
        double plastic = Math.cbrt((9 + Math.sqrt(69)) / 18) + Math.cbrt((9 - Math.sqrt(69)) / 18);
        TransferFunction loop = TransferFunction.of(1, 1, List.of(), List.of(new Root(0, 1)));
        FrequencyGrid grid = FrequencyGrid.refinedFor(0.001, 10, 50, loop);
        for (ComplexResponse h : List.of(loop, StateSpace.fromTransferFunction(loop))) {
            assertTrue(Crossings.phaseCrossings(h, grid).isEmpty(), "no phase crossing for " + h);
            List<Crossing> gain = Crossings.magnitudeCrossings(h, grid);
            assertEquals(1, gain.size(), "one gain crossing for " + h);
            assertEquals(plastic / TWO_PI, gain.get(0).frequencyHz(), 1e-12);
        }
        // 1/(s² + 1): |H| = 1/(ω² − 1) = 1 at ω = √2; below ω = 1 |H| > 1 without crossing.
        TransferFunction tank = TransferFunction.of(1, 0, List.of(), List.of(new Root(0, 1)));
        FrequencyGrid g2 = FrequencyGrid.refinedFor(0.001, 10, 50, tank);
        assertTrue(Crossings.phaseCrossings(tank, g2).isEmpty());
        List<Crossing> gain = Crossings.magnitudeCrossings(tank, g2);
        assertEquals(1, gain.size());
        assertEquals(Math.sqrt(2) / TWO_PI, gain.get(0).frequencyHz(), 1e-13);
    }

    @Test
    void conditionallyStableLoopReportsEveryBranch() {
        // L = 3e4·(1 + s)² / (s³·(1 + s/100)⁶): phase −270° at low frequency, up towards −90° from
        // the double zero, then down to −630°: crosses −180° rising, −180° falling, −540° falling.
        List<Root> poles = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            poles.add(Root.real(-100));
        }
        TransferFunction loop = TransferFunction.of(3e4, 3, List.of(Root.real(-1), Root.real(-1)), poles);
        FrequencyGrid grid = FrequencyGrid.logarithmic(1e-4, 1e5, 50);
        List<Crossing> phase = Crossings.phaseCrossings(loop, grid);
        assertEquals(3, phase.size(), phase.toString());
        assertEquals(-180.0, phase.get(0).level(), 0);
        assertEquals(Crossing.Direction.RISING, phase.get(0).direction());
        assertEquals(-180.0, phase.get(1).level(), 0);
        assertEquals(Crossing.Direction.FALLING, phase.get(1).direction());
        assertEquals(-540.0, phase.get(2).level(), 0);
        for (Crossing c : phase) {
            assertEquals(c.level(), loop.phaseDeg(c.frequencyHz()), 1e-9 * 180);
        }
        // the first crossing in closed form: −270° + 2·atan ω − 6·atan(ω/100) = −180°; with the
        // small-angle terms it sits just above ω = 1 (2·atan ω = 90° at ω = 1); a bisection on the
        // closed-form phase is the reference.
        double lo = 0.5;
        double hi = 2;
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            double ph = -270 + 2 * Math.toDegrees(Math.atan(mid)) - 6 * Math.toDegrees(Math.atan(mid / 100));
            if (ph < -180) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        assertEquals(lo / TWO_PI, phase.get(0).frequencyHz(), 1e-12 * lo);
    }

    @Test
    void aSampleExactlyOnTheLevelCountsOnce() {
        // The level is the exact |H| of the middle sample, so g = 0 there with opposite signs around it.
        TransferFunction h = TransferFunction.of(1, 0, List.of(), List.of(Root.realAtHz(10)));
        FrequencyGrid grid = FrequencyGrid.logarithmic(1, 100, 10);
        double level = h.magnitude(grid.frequencyHz(10));
        List<Crossing> c = Crossings.magnitudeCrossings(h, grid, level);
        assertEquals(1, c.size());
        assertEquals(grid.frequencyHz(10), c.get(0).frequencyHz(), 0);
    }
}
