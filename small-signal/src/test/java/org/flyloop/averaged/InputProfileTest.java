package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Steps are right-continuous, ramps linear, breakpoints complete. */
class InputProfileTest {

    private final AveragedInputs u = new AveragedInputs(0.3, 48, 0);

    @Test
    void stepTakesTheNewValueAtItsInstant() {
        InputProfile p = InputProfile.constant(u).step(AveragedInputs.VIN, 0.01, 60);
        assertEquals(48, p.valueAt(AveragedInputs.VIN, 0.0099999));
        assertEquals(60, p.valueAt(AveragedInputs.VIN, 0.01));
        assertEquals(48, p.before(0.01).vinV());
        assertEquals(0.3, p.at(1).control());
        assertArrayEquals(new double[] {0, 0.01}, p.breakpoints());
    }

    @Test
    void stepAtTimeZeroLeavesTheLeftLimitForTheInitialSteadyState() {
        InputProfile p = InputProfile.constant(u).step(AveragedInputs.CONTROL, 0, 0.31);
        assertEquals(0.3, p.before(0).control());
        assertEquals(0.31, p.at(0).control());
    }

    @Test
    void rampIsLinearAndHoldsItsEnds() {
        InputProfile p = InputProfile.constant(u).ramp(AveragedInputs.ISTEP, 0.1, 0.3, 2);
        assertEquals(0, p.valueAt(AveragedInputs.ISTEP, 0.05));
        assertEquals(0, p.valueAt(AveragedInputs.ISTEP, 0.1));
        assertEquals(1, p.valueAt(AveragedInputs.ISTEP, 0.2), 1e-12);
        assertEquals(2, p.valueAt(AveragedInputs.ISTEP, 0.3));
        assertEquals(2, p.valueAt(AveragedInputs.ISTEP, 5));
        assertArrayEquals(new double[] {0, 0.1, 0.3}, p.breakpoints());
    }

    @Test
    void pointsMustComeInTimeOrder() {
        InputProfile p = InputProfile.constant(u).step(AveragedInputs.VIN, 0.2, 60);
        assertThrows(IllegalArgumentException.class, () -> p.step(AveragedInputs.VIN, 0.1, 40));
    }
}
