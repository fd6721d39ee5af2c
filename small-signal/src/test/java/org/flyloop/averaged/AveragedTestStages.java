package org.flyloop.averaged;

import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;

/**
 * Invented stages for the averaged-model tests. The 48 V → 12 V telecom-style stage is in CCM at
 * its 2 A full load and in DCM below about 0.54 A at 48 V, so one part set covers both modes.
 */
final class AveragedTestStages {

    private AveragedTestStages() {
    }

    /** 36–72 V in, 12 V / 0.2–2 A out, N = 2, Lm = 200 µH, 100 kHz, 470 µF / 20 mΩ, 0.5 V diode, 0.1 Ω switch. */
    static StageSpec busConverter() {
        return new StageSpec(ValueRange.between(36, 72), 12, ValueRange.between(0.2, 2), 100e3, 200e-6, 2,
                470e-6, 0.02, 0.5, 0.1);
    }

    /** The same stage without losses or ESR: the textbook case for closed-form references. */
    static StageSpec lossless() {
        return new StageSpec(ValueRange.between(36, 72), 12, ValueRange.between(0.2, 2), 100e3, 200e-6, 2,
                470e-6, 0, 0, 0);
    }

    /** Voltage mode; the control input of the averaged model is the duty cycle itself. */
    static ControlSpec voltageMode() {
        return ControlSpec.voltageMode(1, 0.7);
    }

    /** Peak current mode: 0.5 V/A sense, 20 kV/s (0.2 V per period) compensation ramp. */
    static ControlSpec currentMode() {
        return ControlSpec.currentMode(0.5, 20e3, 0.7);
    }
}
