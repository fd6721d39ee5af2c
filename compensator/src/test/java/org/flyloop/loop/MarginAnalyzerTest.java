package org.flyloop.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.junit.jupiter.api.Test;

/**
 * The margin engine against loops whose answers follow in closed form (each derivation beside its
 * case), and properties on random loops. Frequencies below are in rad/s, converted to Hz.
 */
class MarginAnalyzerTest {

    private static final double TWO_PI = 2 * Math.PI;

    private static LoopMargins analyze(TransferFunction l) {
        return MarginAnalyzer.analyze(l, 1e-4, 1e3);
    }

    @Test
    void tripleLagHasGainMargin8AtRoot3() {
        // L = 1/(s+1)³: ∠L = −3·atan ω = −180° at ω = tan 60° = √3; |L| = 1/(1+3)^(3/2) = 1/8 → GM 18.06 dB.
        // |L| ≤ 1 with equality only at ω = 0: no gain crossover.
        TransferFunction l = TransferFunction.of(1, 0, List.of(), List.of(Root.real(-1), Root.real(-1), Root.real(-1)));
        LoopMargins m = analyze(l);
        assertTrue(m.hasNoCrossover());
        assertEquals(1, m.phaseCrossovers().size());
        assertEquals(Math.sqrt(3), TWO_PI * m.phaseCrossovers().get(0).frequencyHz(), 1e-9);
        assertEquals(20 * Math.log10(8), m.gainMarginDb(), 1e-9);
        assertEquals(StabilityVerdict.STABLE, m.verdict());
        assertTrue(Double.isNaN(m.phaseMarginDeg()));
    }

    @Test
    void unstableThirdOrderLoop() {
        // L = 50/(5s³ + 10.25s² + 6.25s + 1) = 10/((s+1)(s+0.25)(s+0.8)).
        // |L(jω)| = 1 at ω = 2.0225 rad/s where ∠L = −215.06°: PM = −35.06°; closed loop unstable.
        TransferFunction l = TransferFunction.fromPolynomials(new double[] {50}, new double[] {1, 6.25, 10.25, 5});
        LoopMargins m = analyze(l);
        assertEquals(1, m.gainCrossovers().size());
        assertEquals(2.0225, TWO_PI * m.crossoverHz(), 5e-5);
        assertEquals(-35.06, m.phaseMarginDeg(), 0.005);
        assertEquals(StabilityVerdict.UNSTABLE, m.verdict());
        assertEquals(2, m.closedLoopRhpPoles());
        assertTrue(m.gainMarginDb() < 0);
    }

    @Test
    void conditionallyStableLoop() {
        // L = (s² + 0.5s + 0.05)/s³: phase −270° + two zero phases, −180° at ω = √0.05 = 0.2236 where
        // |L| = 10 (−20 dB margin, the gain may only fall); PM 63.84° at 1.065 rad/s.
        TransferFunction l = TransferFunction.fromPolynomials(new double[] {0.05, 0.5, 1}, new double[] {0, 0, 0, 1});
        LoopMargins m = analyze(l);
        assertEquals(StabilityVerdict.STABLE, m.verdict());
        assertEquals(1, m.gainCrossovers().size());
        assertEquals(1.065, TWO_PI * m.crossoverHz(), 5e-4);
        assertEquals(63.84, m.phaseMarginDeg(), 0.01);
        PhaseCrossover lower = m.phaseCrossovers().get(0);
        assertEquals(Math.sqrt(0.05), TWO_PI * lower.frequencyHz(), 1e-9);
        assertEquals(-20, lower.gainMarginDb(), 1e-9);
    }

    @Test
    void openLoopUnstableClosedLoopStable() {
        // L = 2(s+1)/(s(s−1)): at ω = 2, L = (−4 − 3j)/5, |L| = 1, ∠L = −143.13° → PM 36.87°.
        // P = 1; the locus encircles −1 once counter-clockwise, so the closed loop
        // s² + s + 2 is stable.
        TransferFunction l = TransferFunction.of(-2, 1, List.of(Root.real(-1)), List.of(Root.real(1)));
        assertEquals(new Complex(-0.8, -0.6).subtract(l.evaluate(2 / TWO_PI)).abs(), 0, 1e-12);
        LoopMargins m = analyze(l);
        assertEquals(1, m.openLoopRhpPoles());
        assertEquals(2, TWO_PI * m.crossoverHz(), 1e-9);
        assertEquals(36.87, m.phaseMarginDeg(), 0.005);
        assertEquals(StabilityVerdict.STABLE, m.verdict());
    }

    @Test
    void noGainCrossoverIsReportedNotThrown() {
        // L = 0.25/(s³ + 2s² + s + 1): at ω = 1 the denominator is −1 − j + j·1... = (1 − 2) + j(1 − 1) = −1,
        // so L = −0.25: phase crossover at 1 rad/s with GM 4 (12.04 dB); |L| < 1 everywhere.
        TransferFunction l = TransferFunction.fromPolynomials(new double[] {0.25}, new double[] {1, 1, 2, 1});
        LoopMargins m = analyze(l);
        assertTrue(m.hasNoCrossover());
        assertTrue(Double.isNaN(m.crossoverHz()));
        assertTrue(Double.isNaN(m.delayMarginS()));
        assertEquals(1, TWO_PI * m.worstGain().frequencyHz(), 1e-9);
        assertEquals(20 * Math.log10(4), m.gainMarginDb(), 1e-9);
        assertEquals(StabilityVerdict.STABLE, m.verdict());
    }

    @Test
    void delayMarginIsPhaseMarginOverOmega() {
        // L = 1/s: crossover at 1 rad/s, PM 90°, delay margin (π/2)/1 s.
        LoopMargins m = analyze(TransferFunction.integrators(1, 1));
        assertEquals(Math.PI / 2, m.delayMarginS(), 1e-9);
        assertEquals(1, m.peakSensitivity(), 1e-6);
    }

    @Test
    void randomLoopsSatisfyTheirEquationsAndNyquistAgreesWithClosedLoopPoles() {
        Random rnd = new Random(20261201L);
        for (int trial = 0; trial < 200; trial++) {
            int nPoles = 1 + rnd.nextInt(4);
            List<Root> poles = new java.util.ArrayList<>();
            for (int i = 0; i < nPoles; i++) {
                double w = Math.pow(10, -1 + 3 * rnd.nextDouble());
                poles.add(rnd.nextBoolean() ? Root.real(-w) : Root.pair(w, 0.6 + 3 * rnd.nextDouble()));
            }
            List<Root> zeros = rnd.nextBoolean() ? List.of(Root.real(-Math.pow(10, -1 + 3 * rnd.nextDouble())))
                    : List.of();
            int integrators = rnd.nextInt(2);
            double k = Math.pow(10, -1 + 3 * rnd.nextDouble());
            TransferFunction l = TransferFunction.of(k, integrators, zeros, poles);
            LoopMargins m = MarginAnalyzer.analyze(l, 1e-4, 1e4);
            for (GainCrossover g : m.gainCrossovers()) {
                assertEquals(1, l.magnitude(g.frequencyHz()), 1e-9, "|L(jωc)| = 1");
            }
            for (PhaseCrossover p : m.phaseCrossovers()) {
                double ph = l.phaseDeg(p.frequencyHz());
                double off = ph + 180 - 360 * Math.round((ph + 180) / 360);
                assertEquals(0, off, 1e-9 * 180, "∠L = −180° (mod 360°)");
            }
            // S + T = 1 pointwise.
            TransferFunction s = ClosedLoop.sensitivity(l);
            TransferFunction t = ClosedLoop.referenceToOutput(l);
            for (double f : new double[] {0.01, 0.3, 7, 90}) {
                Complex sum = s.evaluate(f).add(t.evaluate(f));
                assertEquals(0, sum.subtract(Complex.ONE).abs(), 1e-7, "S + T = 1");
            }
            // Nyquist count against the closed-loop poles computed directly from 1 + L = 0.
            int rhp = t.rightHalfPlanePoleCount();
            if (m.verdict() != StabilityVerdict.MARGINAL) {
                assertEquals(rhp, m.closedLoopRhpPoles(), "trial " + trial + ": " + l);
            }
        }
    }
}
