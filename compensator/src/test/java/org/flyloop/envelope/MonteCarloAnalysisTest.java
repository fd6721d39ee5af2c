package org.flyloop.envelope;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.concurrent.atomic.AtomicInteger;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.Designer;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.spec.Tolerance;
import org.flyloop.spec.TolerancesSpec;
import org.junit.jupiter.api.Test;

class MonteCarloAnalysisTest {

    private static EnvelopeSetup fullTolerances() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(0));
        return EnvelopeSetup.forMonteCarlo(r, Designer.design(r).rounded(), EnvelopeCases.full(),
                EnvelopeSetup.DEFAULT_POINTS);
    }

    @Test
    void parallelRunsEqualTheSequentialRunBitForBit() {
        EnvelopeSetup setup = fullTolerances();
        MonteCarloResult one = MonteCarloAnalysis.run(setup, 600, 7, 1, d -> { });
        for (int threads : new int[] {2, 3}) {
            MonteCarloResult many = MonteCarloAnalysis.run(setup, 600, 7, threads, d -> { });
            for (int c = 0; c < setup.corners().size(); c++) {
                assertArrayEquals(one.phaseMarginsDeg(c), many.phaseMarginsDeg(c));
                assertArrayEquals(one.gainMarginsDb(c), many.gainMarginsDb(c));
                assertArrayEquals(one.crossoversHz(c), many.crossoversHz(c));
                assertEquals(one.corners().get(c), many.corners().get(c));
            }
            assertEquals(one.worstPhaseMarginDeg(), many.worstPhaseMarginDeg());
            assertEquals(one.fractionFailing(), many.fractionFailing());
        }
    }

    @Test
    void theSeedDecidesTheSamples() {
        EnvelopeSetup setup = fullTolerances();
        MonteCarloResult a = MonteCarloAnalysis.run(setup, 50, 11, 1, d -> { });
        MonteCarloResult b = MonteCarloAnalysis.run(setup, 50, 11, 2, d -> { });
        MonteCarloResult c = MonteCarloAnalysis.run(setup, 50, 12, 1, d -> { });
        assertArrayEquals(a.phaseMarginsDeg(0), b.phaseMarginsDeg(0));
        assertNotEquals(Arrays.toString(a.phaseMarginsDeg(0)), Arrays.toString(c.phaseMarginsDeg(0)));
        // a shorter run is the start of a longer one: samples depend on their index only
        MonteCarloResult longer = MonteCarloAnalysis.run(setup, 80, 11, 2, d -> { });
        assertArrayEquals(a.phaseMarginsDeg(1), Arrays.copyOf(longer.phaseMarginsDeg(1), 50));
    }

    @Test
    void progressCountsEverySample() {
        AtomicInteger last = new AtomicInteger();
        MonteCarloAnalysis.run(fullTolerances(), 300, 1, 2, d -> last.accumulateAndGet(d, Math::max));
        assertEquals(300, last.get());
    }

    @Test
    void theWorstCaseBoundEnclosesEverySample() {
        EnvelopeSetup setup = fullTolerances();
        WorstCase worst = WorstCaseAnalysis.run(EnvelopeSetup.forWorstCase(setup.request(), setup.network(),
                setup.tolerances(), EnvelopeSetup.DEFAULT_POINTS));
        MonteCarloResult mc = MonteCarloAnalysis.run(setup, 2000, 2024, 2, d -> { });
        double slack = 1e-9;
        for (int c = 0; c < setup.corners().size(); c++) {
            for (double pm : mc.phaseMarginsDeg(c)) {
                assertTrue(worst.phaseMargin().value() <= pm + slack, pm + " < " + worst.phaseMargin().value());
            }
            for (double gm : mc.gainMarginsDb(c)) {
                assertTrue(Math.abs(worst.gainMargin().value()) <= gm + slack);
            }
            for (double f : mc.crossoversHz(c)) {
                assertTrue(worst.lowestCrossover().value() <= f * (1 + slack));
                assertTrue(worst.highestCrossover().value() >= f * (1 - slack));
            }
        }
    }

    @Test
    void fractionFailingCountsSamplesThatMissATargetAnywhere() {
        EnvelopeSetup setup = fullTolerances();
        MonteCarloResult mc = MonteCarloAnalysis.run(setup, 500, 3, 2, d -> { });
        double pmTarget = setup.request().targets().phaseMarginDeg();
        double gmTarget = setup.request().targets().gainMarginDb();
        int failing = 0;
        for (int i = 0; i < 500; i++) {
            boolean failed = false;
            for (int c = 0; c < setup.corners().size(); c++) {
                failed |= mc.phaseMarginsDeg(c)[i] < pmTarget || mc.gainMarginsDb(c)[i] < gmTarget;
            }
            failing += failed ? 1 : 0;
        }
        assertEquals(failing / 500.0, mc.fractionFailing());
        assertTrue(mc.fractionFailing() > 0 && mc.fractionFailing() < 1, "the scenario should straddle a target");
    }

    /**
     * With one toleranced capacitor the phase margin at a corner is a monotonic function g of its
     * position u, so its p-quantile is g(p) (or g(1 − p)). The sample p-quantile of N uniform
     * positions has standard deviation √(p(1 − p)/N) (the binomial count of samples below the true
     * quantile; H. A. David and H. N. Nagaraja, Order Statistics, 3rd ed., 2003, §7.1), so the
     * estimate must lie within g(p ± 4σ) and that window narrows as 1/√N.
     */
    @Test
    void percentilesConvergeToTheExactQuantilesAsSamplesGrow() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(0));
        CompensatorNetwork n = Designer.design(r).rounded();
        TolerancesSpec oneCap = new TolerancesSpec(Tolerance.NONE, Tolerance.NONE, Tolerance.NONE, Tolerance.NONE,
                false, Tolerance.NONE, Tolerance.symmetric(0.1));
        EnvelopeSetup all = EnvelopeSetup.forMonteCarlo(r, n, oneCap, EnvelopeSetup.DEFAULT_POINTS);
        // keep only c_zero: the other capacitors at nominal
        int j = all.box().parameters().stream().map(ToleranceParameter::name).toList().indexOf("parts.c_zero");
        assertTrue(j >= 0);
        LoopEngine engine = new LoopEngine(all);
        LocalWorstSearch probe = new LocalWorstSearch(engine);
        int corner = 1;
        java.util.function.DoubleUnaryOperator g = u -> {
            double[] x = new double[all.box().size()];
            Arrays.fill(x, 0.5);
            x[j] = u;
            return probe.evaluate(corner, x).phaseMarginDeg();
        };
        boolean rising = g.applyAsDouble(1) > g.applyAsDouble(0);
        for (double u = 0; u < 1; u += 0.05) {
            assertEquals(rising, g.applyAsDouble(u + 0.05) > g.applyAsDouble(u), "g must be monotonic");
        }
        double previousWidth = Double.POSITIVE_INFINITY;
        for (int samples : new int[] {250, 1000, 4000}) {
            MonteCarloResult mc = MonteCarloAnalysis.run(singleCapacitor(r, n, oneCap, j), samples, 99, 2, d -> { });
            Distribution d = mc.corners().get(corner).phaseMarginDeg();
            for (double p : new double[] {0.01, 0.5, 0.99}) {
                double sigma = Math.sqrt(p * (1 - p) / samples);
                double q = rising ? p : 1 - p;
                double a = g.applyAsDouble(Math.max(0, q - 4 * sigma));
                double b = g.applyAsDouble(Math.min(1, q + 4 * sigma));
                double estimate = p == 0.01 ? d.p01() : p == 0.5 ? d.p50() : d.p99();
                assertTrue(estimate >= Math.min(a, b) && estimate <= Math.max(a, b),
                        "N=" + samples + " p=" + p + ": " + estimate + " outside [" + a + ", " + b + "]");
            }
            double width = Math.abs(g.applyAsDouble(0.5 + 4 * Math.sqrt(0.25 / samples))
                    - g.applyAsDouble(0.5 - 4 * Math.sqrt(0.25 / samples)));
            assertTrue(width < previousWidth);
            previousWidth = width;
        }
    }

    /** A Monte Carlo setup whose box holds only box quantity {@code j}. */
    private static EnvelopeSetup singleCapacitor(DesignRequest r, CompensatorNetwork n, TolerancesSpec t, int j) {
        return EnvelopeSetup.forMonteCarlo(r, n, t, EnvelopeSetup.DEFAULT_POINTS).keepOnly(j);
    }
}
