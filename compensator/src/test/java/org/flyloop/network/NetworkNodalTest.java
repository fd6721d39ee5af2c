package org.flyloop.network;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Every network's closed-form Gc against a modified-nodal analysis of its actual circuit
 * ({@link NodalCircuit}, EJML complex LU), at 50 log-spaced frequencies from 0.1 Hz to 10 MHz,
 * within 1e-9 relative. The part values are invented scenarios (a 12 V output with a 2.5 V
 * reference, parts of everyday sizes) and, in the properties, random log-uniform values over
 * several decades.
 */
class NetworkNodalTest {

    @Test
    void opAmpType1MatchesNodalSolve() {
        NodalAgreement.assertAgrees(OpAmpType1Network.ideal(10e3, 2.61e3, 47e-9));
    }

    @Test
    void opAmpType2MatchesNodalSolve() {
        NodalAgreement.assertAgrees(OpAmpType2Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12));
    }

    @Test
    void opAmpType3MatchesNodalSolve() {
        NodalAgreement.assertAgrees(OpAmpType3Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12, 1e3, 4.7e-9));
    }

    @Test
    void otaAtTheEdgeOfItsRandomRangeMatchesNodalSolve() {
        // A case jqwik once drew (gm = 10 mS into 1 kΩ dividers): it needs the equilibrated solve.
        NodalAgreement.assertAgrees(new OtaType2Network(0.01, 1000, 1000, 1000, 2.8840315031266117e-10,
                1.4791083881682073e-11));
    }

    @Test
    void otaMatchesNodalSolve() {
        NodalAgreement.assertAgrees(new OtaType2Network(200e-6, 37.4e3, 10e3, 15e3, 33e-9, 470e-12));
    }

    @Test
    void shuntOptoType2MatchesNodalSolve() {
        NodalAgreement.assertAgrees(new ShuntOptoNetwork(38.3e3, 10e3, 4.7e3, 47e-9, 1e3, 1e3, 1.0,
                20e3, 470e-12, 1e-9, 0));
    }

    @Test
    void shuntOptoType1MatchesNodalSolve() {
        NodalAgreement.assertAgrees(new ShuntOptoNetwork(38.3e3, 10e3, 0, 47e-9, 1e3, 1e3, 0.8,
                20e3, 470e-12, 0, 0));
    }

    @Test
    void shuntOptoWithLedDynamicResistanceMatchesNodalSolve() {
        // With r_d > 0 r_bias takes part of the signal current; the nodal circuit models that directly.
        NodalAgreement.assertAgrees(new ShuntOptoNetwork(38.3e3, 10e3, 4.7e3, 47e-9, 1e3, 680, 1.2,
                20e3, 470e-12, 1e-9, 25));
    }

    @Test
    void shuntOptoWithoutAnyPinCapacitanceMatchesNodalSolve() {
        NodalAgreement.assertAgrees(new ShuntOptoNetwork(38.3e3, 10e3, 4.7e3, 47e-9, 1e3, 1e3, 1.0,
                20e3, 0, 0, 0));
    }

    /** With an ideal LED, r_bias sees a fixed voltage: changing it must not move the response. */
    @Test
    void biasResistorHasNoAcEffectWithAnIdealLed() {
        ShuntOptoNetwork a = new ShuntOptoNetwork(38.3e3, 10e3, 4.7e3, 47e-9, 1e3, 1e3, 1.0, 20e3, 470e-12, 1e-9, 0);
        ShuntOptoNetwork b = new ShuntOptoNetwork(38.3e3, 10e3, 4.7e3, 47e-9, 1e3, 150, 1.0, 20e3, 470e-12, 1e-9, 0);
        for (double f : new double[] {1, 100, 1e4, 1e6}) {
            Complex ra = ReferenceCircuits.response(a, f);
            Complex rb = ReferenceCircuits.response(b, f);
            assertTrue(ra.subtract(rb).abs() <= 1e-12 * ra.abs(), "f = " + f);
        }
    }

    /** With an ideal op-amp the inverting input is a virtual earth: r_lower must not matter. */
    @Test
    void lowerResistorHasNoAcEffectWithAnIdealOpAmp() {
        Complex a = ReferenceCircuits.response(OpAmpType2Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12), 3e3);
        Complex b = ReferenceCircuits.response(OpAmpType2Network.ideal(10e3, 100, 22e3, 10e-9, 220e-12), 3e3);
        assertEquals(0, a.subtract(b).abs() / a.abs(), 1e-12);
    }

    @Test
    void opAmpNetworksWithFiniteGainBandwidthMatchNodalSolve() {
        // Gain-bandwidths from 100 kHz (slow, its pole well inside the band) to 10 MHz.
        for (double gbw : new double[] {1e5, 1e6, 1e7}) {
            NodalAgreement.assertAgrees(OpAmpType1Network.ideal(10e3, 2.61e3, 47e-9).withGainBandwidth(gbw));
            NodalAgreement.assertAgrees(OpAmpType2Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12)
                    .withGainBandwidth(gbw));
            NodalAgreement.assertAgrees(OpAmpType3Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12, 1e3, 4.7e-9)
                    .withGainBandwidth(gbw));
        }
    }

    @Property(tries = 60)
    void opAmpType3AgreesForRandomParts(
            @ForAll @DoubleRange(min = 3, max = 5) double rUpperExp,
            @ForAll @DoubleRange(min = 2, max = 5) double rLowerExp,
            @ForAll @DoubleRange(min = 3, max = 6) double rZeroExp,
            @ForAll @DoubleRange(min = -10, max = -6) double cZeroExp,
            @ForAll @DoubleRange(min = -12, max = -8) double cPoleExp,
            @ForAll @DoubleRange(min = 1, max = 4) double rFfExp,
            @ForAll @DoubleRange(min = -10, max = -7) double cFfExp,
            @ForAll @DoubleRange(min = 5, max = 8) double gbwExp) {
        OpAmpType3Network n = OpAmpType3Network.ideal(p(rUpperExp), p(rLowerExp), p(rZeroExp), p(cZeroExp),
                p(cPoleExp), p(rFfExp), p(cFfExp));
        NodalAgreement.assertAgrees(n);
        NodalAgreement.assertAgrees(n.withGainBandwidth(p(gbwExp)));
    }

    @Property(tries = 60)
    void otaAgreesForRandomParts(
            @ForAll @DoubleRange(min = -5, max = -2) double gmExp,
            @ForAll @DoubleRange(min = 3, max = 5) double rUpperExp,
            @ForAll @DoubleRange(min = 3, max = 5) double rLowerExp,
            @ForAll @DoubleRange(min = 3, max = 6) double rZeroExp,
            @ForAll @DoubleRange(min = -10, max = -6) double cZeroExp,
            @ForAll @DoubleRange(min = -12, max = -8) double cPoleExp) {
        NodalAgreement.assertAgrees(new OtaType2Network(p(gmExp), p(rUpperExp), p(rLowerExp), p(rZeroExp),
                p(cZeroExp), p(cPoleExp)));
    }

    @Property(tries = 60)
    void shuntOptoAgreesForRandomParts(
            @ForAll @DoubleRange(min = 3, max = 5) double rUpperExp,
            @ForAll @DoubleRange(min = 2, max = 6) double rZeroExp,
            @ForAll @DoubleRange(min = -9, max = -6) double cZeroExp,
            @ForAll @DoubleRange(min = 2, max = 4) double rLedExp,
            @ForAll @DoubleRange(min = 2, max = 4) double rBiasExp,
            @ForAll @DoubleRange(min = 0.2, max = 3) double ctr,
            @ForAll @DoubleRange(min = 3, max = 5) double rPullupExp,
            @ForAll @DoubleRange(min = -11, max = -8) double cOptoExp,
            @ForAll @DoubleRange(min = -11, max = -8) double cPullupExp,
            @ForAll @DoubleRange(min = 0, max = 2) double rDynExp) {
        NodalAgreement.assertAgrees(new ShuntOptoNetwork(p(rUpperExp), 10e3, p(rZeroExp), p(cZeroExp),
                p(rLedExp), p(rBiasExp), ctr, p(rPullupExp), p(cOptoExp), p(cPullupExp), p(rDynExp)));
    }

    private static double p(double exponent) {
        return Math.pow(10, exponent);
    }
}
