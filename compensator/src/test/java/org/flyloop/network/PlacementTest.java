package org.flyloop.network;

import static org.flyloop.network.RootAssertions.assertRealRootsAtHz;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flyloop.linear.TransferFunction;
import org.junit.jupiter.api.Test;

/**
 * Parts from poles and zeros, round trip: the requested zeros, poles and gain must come back out
 * of the resulting network's transfer function within 1e-9 relative, and the placed network must
 * still agree with its nodal circuit (so the round trip is not closed through the same formula).
 * Scenario: a 12 V output, 2.5 V reference, crossover near 2 kHz.
 */
class PlacementTest {
    private static final double TOL = 1e-9;
    private static final FeedbackDivider DIVIDER = FeedbackDivider.forOutput(10e3, 12, 2.5);

    @Test
    void dividerSetsTheOutputWithTheReference() {
        // r_lower = 10k·2.5/(12 − 2.5) = 2631.58 Ω.
        assertEquals(2631.578947368421, DIVIDER.rLower(), 1e-9);
        assertEquals(12, DIVIDER.regulatedOutputV(2.5), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> FeedbackDivider.forOutput(10e3, 2, 2.5));
    }

    @Test
    void opAmpType1MeetsTheGainAtCrossover() {
        OpAmpType1Network n = OpAmpType1Network.place(DIVIDER, GainTarget.atFrequency(2.5, 2e3));
        TransferFunction tf = n.transferFunction();
        assertEquals(2.5, tf.magnitude(2e3), 2.5 * TOL);
        assertEquals(1, tf.integrators());
        assertEquals(DIVIDER.rLower(), n.rLower(), 0);
        NodalAgreement.assertAgrees(n);
        assertThrows(IllegalArgumentException.class,
                () -> OpAmpType1Network.place(DIVIDER, GainTarget.midband(3)));
    }

    @Test
    void opAmpType2ReturnsItsZeroPoleAndGain() {
        OpAmpType2Network n = OpAmpType2Network.place(DIVIDER, GainTarget.atFrequency(3.2, 2e3), 500, 8e3);
        TransferFunction tf = n.transferFunction();
        assertRealRootsAtHz(tf.zeros(), 500);
        assertRealRootsAtHz(tf.poles(), 8e3);
        assertEquals(1, tf.integrators());
        assertEquals(3.2, tf.magnitude(2e3), 3.2 * TOL);
        NodalAgreement.assertAgrees(n);
    }

    @Test
    void opAmpType2AcceptsIntegratorAndMidbandTargets() {
        OpAmpType2Network a = OpAmpType2Network.place(DIVIDER, GainTarget.integratorUnityAtHz(300), 500, 8e3);
        assertEquals(2 * Math.PI * 300, a.transferFunction().gain(), 2 * Math.PI * 300 * TOL);
        OpAmpType2Network b = OpAmpType2Network.place(DIVIDER, GainTarget.midband(4), 500, 8e3);
        // Mid-band asymptote ωI/ωz = Rz·Cz/(Ru·(Cz + Cp)).
        assertEquals(4, b.rZero() * b.cZero() / (b.rUpper() * (b.cZero() + b.cPole())), 4 * TOL);
    }

    @Test
    void opAmpType3ReturnsBothZerosAndPoles() {
        OpAmpType3Network n = OpAmpType3Network.place(DIVIDER, GainTarget.atFrequency(1.7, 2e3),
                300, 600, 12e3, 50e3);
        TransferFunction tf = n.transferFunction();
        assertRealRootsAtHz(tf.zeros(), 300, 600);
        assertRealRootsAtHz(tf.poles(), 12e3, 50e3);
        assertEquals(1.7, tf.magnitude(2e3), 1.7 * TOL);
        // Zero 2 and pole 1 belong to the r_ff–c_ff pair.
        assertEquals(600, 1 / (2 * Math.PI * (n.rUpper() + n.rFf()) * n.cFf()), 600 * TOL);
        assertEquals(12e3, 1 / (2 * Math.PI * n.rFf() * n.cFf()), 12e3 * TOL);
        NodalAgreement.assertAgrees(n);
    }

    @Test
    void opAmpType3TakesCoincidentZerosAndPoles() {
        OpAmpType3Network n = OpAmpType3Network.place(DIVIDER, GainTarget.atFrequency(0.8, 3e3),
                1e3, 1e3, 9e3, 9e3);
        assertRealRootsAtHz(n.transferFunction().zeros(), 1e3, 1e3);
        assertRealRootsAtHz(n.transferFunction().poles(), 9e3, 9e3);
        NodalAgreement.assertAgrees(n);
    }

    @Test
    void otaReturnsItsZeroPoleAndGain() {
        OtaType2Network n = OtaType2Network.place(100e-6, DIVIDER, GainTarget.atFrequency(2.2, 2e3), 400, 15e3);
        TransferFunction tf = n.transferFunction();
        assertRealRootsAtHz(tf.zeros(), 400);
        assertRealRootsAtHz(tf.poles(), 15e3);
        assertEquals(2.2, tf.magnitude(2e3), 2.2 * TOL);
        NodalAgreement.assertAgrees(n);
    }

    @Test
    void shuntOptoReturnsItsZeroPoleAndMidbandGain() {
        ShuntOptoFixedParts fixed = ShuntOptoFixedParts.withOptoPoleHz(
                FeedbackDivider.forOutput(38.3e3, 12, 2.495), 2.2e3, 1e3, 1.0, 20e3, 15e3);
        // Floor = CTR·r_pullup/r_led = 20k/2.2k = 9.09; ask for 14.
        ShuntOptoNetwork n = ShuntOptoNetwork.place(fixed, GainTarget.midband(14), 90, 3e3);
        TransferFunction tf = n.transferFunction();
        assertRealRootsAtHz(tf.zeros(), 90);
        assertRealRootsAtHz(tf.poles(), 3e3);
        assertEquals(14, n.midbandGain(), 14 * TOL);
        assertEquals(20e3 / 2.2e3, n.fastLaneFloor(), 1e-12);
        // The pin pole is shared between the optocoupler and c_pullup.
        assertEquals(1 / (2 * Math.PI * 3e3 * 20e3) - 1 / (2 * Math.PI * 15e3 * 20e3), n.cPullup(), 1e-21);
        assertEquals(2, n.type());
        NodalAgreement.assertAgrees(n);
    }

    @Test
    void shuntOptoMeetsAGainAtCrossover() {
        ShuntOptoFixedParts fixed = ShuntOptoFixedParts.withOptoPoleHz(
                FeedbackDivider.forOutput(38.3e3, 12, 2.495), 2.2e3, 1e3, 1.0, 20e3, 15e3);
        ShuntOptoNetwork n = ShuntOptoNetwork.place(fixed, GainTarget.atFrequency(12, 1.5e3), 90, 3e3);
        assertEquals(12, n.transferFunction().magnitude(1.5e3), 12 * TOL);
        NodalAgreement.assertAgrees(n);
    }

    @Test
    void shuntOptoType1HasTheFloorAsItsMidbandGain() {
        ShuntOptoFixedParts fixed = ShuntOptoFixedParts.withOptoPoleHz(
                FeedbackDivider.forOutput(38.3e3, 12, 2.495), 2.2e3, 1e3, 1.0, 20e3, 15e3);
        ShuntOptoNetwork n = ShuntOptoNetwork.placeType1(fixed, 90, 3e3);
        assertEquals(1, n.type());
        assertRealRootsAtHz(n.transferFunction().zeros(), 90);
        assertEquals(n.fastLaneFloor(), n.midbandGain(), 0);
        NodalAgreement.assertAgrees(n);
        // Asking a type 2 placement for exactly the floor yields the same network.
        ShuntOptoNetwork same = ShuntOptoNetwork.place(fixed, GainTarget.midband(20e3 / 2.2e3), 90, 3e3);
        assertEquals(1, same.type());
    }

    @Test
    void shuntOptoCannotGoBelowTheFastLaneFloor() {
        ShuntOptoFixedParts fixed = ShuntOptoFixedParts.withOptoPoleHz(
                FeedbackDivider.forOutput(38.3e3, 12, 2.495), 2.2e3, 1e3, 1.0, 20e3, 15e3);
        UnrealisablePlacementException e = assertThrows(UnrealisablePlacementException.class,
                () -> ShuntOptoNetwork.place(fixed, GainTarget.midband(5), 90, 3e3));
        assertTrue(e.getMessage().contains("fast-lane floor"), e.getMessage());
        // r_led needed for a floor of 5: 1.0·20k/5 = 4k.
        assertEquals(4e3, ShuntOptoNetwork.minimumLedResistance(1.0, 20e3, 5), 1e-9);
        assertTrue(e.getMessage().contains("4000"), e.getMessage());
    }

    @Test
    void shuntOptoPoleCannotLieAboveTheOptocouplerPole() {
        ShuntOptoFixedParts fixed = ShuntOptoFixedParts.withOptoPoleHz(
                FeedbackDivider.forOutput(38.3e3, 12, 2.495), 2.2e3, 1e3, 1.0, 20e3, 15e3);
        assertThrows(UnrealisablePlacementException.class,
                () -> ShuntOptoNetwork.place(fixed, GainTarget.midband(14), 90, 20e3));
        // At exactly the optocoupler's pole, c_pullup is zero and left out of the parts.
        ShuntOptoNetwork n = ShuntOptoNetwork.place(fixed, GainTarget.midband(14), 90, 15e3);
        assertEquals(0, n.cPullup(), 0);
        assertTrue(!n.parts().containsKey(PartNames.C_PULLUP));
    }

    @Test
    void polesBelowTheirZerosAreUnrealisable() {
        assertThrows(UnrealisablePlacementException.class,
                () -> OpAmpType2Network.place(DIVIDER, GainTarget.atFrequency(1, 2e3), 8e3, 500));
        assertThrows(UnrealisablePlacementException.class,
                () -> OtaType2Network.place(100e-6, DIVIDER, GainTarget.atFrequency(1, 2e3), 500, 500));
        assertThrows(UnrealisablePlacementException.class,
                () -> OpAmpType3Network.place(DIVIDER, GainTarget.atFrequency(1, 2e3), 300, 600, 500, 50e3));
        assertThrows(UnrealisablePlacementException.class,
                () -> OpAmpType3Network.place(DIVIDER, GainTarget.atFrequency(1, 2e3), 300, 600, 12e3, 200));
    }
}
