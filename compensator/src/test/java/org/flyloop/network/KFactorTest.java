package org.flyloop.network;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.flyloop.linear.TransferFunction;
import org.junit.jupiter.api.Test;

/**
 * Venable's K factor (H. D. Venable, "The K factor: a new mathematical tool for stability analysis
 * and synthesis", Proc. Powercon 10, 1983): K = tan(B/2 + 45°) for type 2, K = tan²(B/4 + 45°) for
 * type 3, Boost = M − P − 90°. Hand values in each test; the boost actually delivered is measured
 * independently by evaluating the pole–zero pair's transfer function at the crossover.
 */
class KFactorTest {

    @Test
    void sixtyDegreesOfBoostByHand() {
        // Type 2: tan(60/2 + 45) = tan 75° = (√3 + 1)/(√3 − 1) = 2 + √3 = 3.7320508.
        KFactor t2 = KFactor.forBoost(2, 1e3, 60);
        assertEquals(2 + Math.sqrt(3), t2.k(), 1e-12);
        assertEquals(1e3 / (2 + Math.sqrt(3)), t2.zeroHz(), 1e-9);
        assertEquals(1e3 * (2 + Math.sqrt(3)), t2.poleHz(), 1e-9);
        // Type 3: tan²(60/4 + 45) = tan² 60° = 3; double zero at fc/√3, double pole at fc·√3.
        KFactor t3 = KFactor.forBoost(3, 1e3, 60);
        assertEquals(3, t3.k(), 1e-12);
        assertEquals(1e3 / Math.sqrt(3), t3.zeroHz(), 1e-9);
        assertEquals(1e3 * Math.sqrt(3), t3.poleHz(), 1e-9);
        assertEquals(2, t3.zeros().size());
    }

    @Test
    void moreHandValues() {
        // tan(30/2 + 45) = tan 60° = √3.
        assertEquals(Math.sqrt(3), KFactor.forBoost(2, 1e3, 30).k(), 1e-12);
        // tan²(90/4 + 45) = tan² 67.5° = (1 + √2)² = 3 + 2√2.
        assertEquals(3 + 2 * Math.sqrt(2), KFactor.forBoost(3, 1e3, 90).k(), 1e-12);
        assertEquals(1, KFactor.forBoost(1, 1e3, -10).k(), 0);
        assertEquals(0, KFactor.forBoost(1, 1e3, -10).deliveredBoostDeg(), 0);
    }

    @Test
    void boostFromMarginAndStagePhase() {
        // M = 60°, P = −120°: 60 + 120 − 90 = 90°.
        assertEquals(90, KFactor.requiredBoostDeg(60, -120), 1e-12);
        // M = 45°, P = −150°: 45 + 150 − 90 = 105°, beyond type 2.
        assertEquals(105, KFactor.requiredBoostDeg(45, -150), 1e-12);
        assertEquals(3, KFactor.lowestTypeFor(105));
        assertEquals(2, KFactor.lowestTypeFor(40));
        assertEquals(1, KFactor.lowestTypeFor(0));
        assertThrows(IllegalArgumentException.class, () -> KFactor.lowestTypeFor(180));
    }

    @Test
    void boostsOutsideATypesRangeAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> KFactor.forBoost(1, 1e3, 10));
        assertThrows(IllegalArgumentException.class, () -> KFactor.forBoost(2, 1e3, 90));
        assertThrows(IllegalArgumentException.class, () -> KFactor.forBoost(2, 1e3, 0));
        assertThrows(IllegalArgumentException.class, () -> KFactor.forBoost(3, 1e3, 180));
        assertThrows(IllegalArgumentException.class, () -> KFactor.forBoost(4, 1e3, 30));
    }

    @Property(tries = 200)
    void type2PairBoostsThePhaseByBAtCrossover(@ForAll @DoubleRange(min = 0.5, max = 89.5) double boost,
                                               @ForAll @DoubleRange(min = 1, max = 6) double fcExp) {
        double fc = Math.pow(10, fcExp);
        KFactor kf = KFactor.forBoost(2, fc, boost);
        double phase = TransferFunction.of(1, 0, kf.zeros(), kf.poles()).phaseDeg(fc);
        assertEquals(boost, phase, 1e-9);
    }

    @Property(tries = 200)
    void type3PairsBoostThePhaseByBAtCrossover(@ForAll @DoubleRange(min = 0.5, max = 179.5) double boost,
                                               @ForAll @DoubleRange(min = 1, max = 6) double fcExp) {
        double fc = Math.pow(10, fcExp);
        KFactor kf = KFactor.forBoost(3, fc, boost);
        double phase = TransferFunction.of(1, 0, kf.zeros(), kf.poles()).phaseDeg(fc);
        assertEquals(boost, phase, 1e-9);
    }

    /**
     * End to end: a stage with −120° at 2 kHz and 60° margin wanted needs 90° of boost, so type 3;
     * the placed op-amp network, measured through its nodal circuit, gives the loop 60° margin.
     */
    @Test
    void placedType3NetworkDeliversTheMargin() {
        double fc = 2e3;
        double stagePhase = -120;
        double boost = KFactor.requiredBoostDeg(60, stagePhase);
        KFactor kf = KFactor.forBoost(KFactor.lowestTypeFor(boost), fc, boost);
        OpAmpType3Network n = OpAmpType3Network.place(FeedbackDivider.forOutput(10e3, 12, 2.5),
                GainTarget.atFrequency(1.3, fc), kf.zeroHz(), kf.zeroHz(), kf.poleHz(), kf.poleHz());
        double compensatorPhase = Math.toDegrees(ReferenceCircuits.response(n, fc).getArgument());
        double margin = 180 + stagePhase + compensatorPhase;
        assertEquals(60, margin, 1e-9);
        assertEquals(1.3, ReferenceCircuits.response(n, fc).abs(), 1.3e-9);
    }
}
