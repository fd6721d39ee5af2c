package org.flyloop.verify;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.junit.jupiter.api.Test;

/** The large-signal modulator against hand-worked numbers. */
class ControlLawTest {

    @Test
    void voltageModeComparesTheFeedbackWithTheRamp() {
        // Ramp 2 V, k_fb = 0.5: d = 0.5·vc/2.
        ControlLaw law = ControlLaw.of(new ControlSpec(ControlScheme.VOLTAGE, 2, Double.NaN, 0, 0.7, 0.5));
        assertEquals(0.25, law.controlInput(1.0), 1e-15);
        assertEquals(0.7, law.controlInput(8.0), 1e-15, "duty limit");
        assertEquals(0.0, law.controlInput(-1.0), 1e-15, "no negative duty");
        assertEquals(1.2, law.amplifierOutputFor(0.3), 1e-15);
        assertFalse(law.isClamped(1.0));
        assertTrue(law.isClamped(8.0));
        assertTrue(law.isClamped(-1.0));
        // Surfaces: raw duty 0.25 and 0.7 − 0.25.
        assertArrayEquals(new double[] {0.25, 0.45}, law.clampSurfaces(1.0), 1e-15);
    }

    @Test
    void currentModeScalesTheFeedbackPinToTheThreshold() {
        ControlLaw law = ControlLaw.of(new ControlSpec(ControlScheme.CURRENT, Double.NaN, 0.25, 40e3, 0.7, 1.0 / 3));
        assertEquals(1.0, law.controlInput(3.0), 1e-15);
        assertEquals(0.0, law.controlInput(-0.3), 1e-15, "no negative threshold");
        assertEquals(3.0, law.amplifierOutputFor(1.0), 1e-15);
        assertTrue(law.isClamped(-0.3));
        assertFalse(law.isClamped(30), "the duty limit acts inside the averaged model, not here");
        assertEquals(1, law.clampSurfaces(3.0).length);
    }
}
