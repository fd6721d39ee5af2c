package org.flyloop.verify;

import java.util.Map;
import org.flyloop.design.DesignRequest;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.PlacementMethod;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.spec.ValueRange;

/**
 * Invented design scenarios for the closed-loop averaged checks: low-voltage outputs on modest
 * output capacitors, so that a 10 % load step moves the output by more than 2 % and the ±1 %
 * settling band is really left.
 */
final class VerifyCases {

    private VerifyCases() {
    }

    /** Ideal op-amp, 2.5 V reference, 10 kΩ lower divider resistor, type chosen by the designer. */
    static FeedbackSpec opamp() {
        return new FeedbackSpec(AmplifierKind.OPAMP, 0, PlacementMethod.BEST, 2.5, 10e3, Double.NaN, Double.NaN,
                Double.NaN, ValueRange.of(1), Double.NaN, 5, 1, Double.NaN, Double.NaN, Double.NaN, 1, 2.5, 1e-3,
                0.1, Map.of());
    }

    /** Ideal OTA of {@code gm} siemens, 2.5 V reference, 10 kΩ lower divider resistor. */
    static FeedbackSpec ota(double gm) {
        return new FeedbackSpec(AmplifierKind.OTA, 0, PlacementMethod.BEST, 2.5, 10e3, Double.NaN, Double.NaN,
                gm, ValueRange.of(1), Double.NaN, 5, 1, Double.NaN, Double.NaN, Double.NaN, 1, 2.5, 1e-3, 0.1,
                Map.of());
    }

    /**
     * Shunt regulator and optocoupler: 2.5 V reference, 10 kΩ lower divider resistor,
     * CTR 1 (one corner), 10 kΩ pull-up to 5 V, optocoupler pole at {@code optoPoleHz}.
     */
    static FeedbackSpec shuntOpto(double optoPoleHz) {
        return new FeedbackSpec(AmplifierKind.SHUNT_OPTO, 0, PlacementMethod.BEST, 2.5, 10e3, Double.NaN,
                Double.NaN, Double.NaN, ValueRange.of(1), 10e3, 5, 1, optoPoleHz, Double.NaN, Double.NaN, 1, 2.5,
                1e-3, 0.1, Map.of());
    }

    private static TargetsSpec targets(double crossoverHz) {
        return new TargetsSpec(crossoverHz, 50, 10, 0.25);
    }

    /**
     * 36–72 V bus to 3.3 V / 2–10 A, N = 5, Lm = 100 µH, 100 kHz, 330 µF / 10 mΩ, 0.4 V rectifier,
     * 30 mΩ switch: CCM above 2.0 A (36 V) to 2.9 A (72 V), so 9–10 A is CCM at every input.
     */
    static StageSpec ccmStage() {
        return new StageSpec(ValueRange.between(36, 72), 3.3, ValueRange.between(2, 10), 100e3, 100e-6, 5, 330e-6,
                10e-3, 0.4, 0.03);
    }

    /**
     * 36–72 V bus to 3.3 V / 0.2–2 A, N = 5, Lm = 48 µH, 100 kHz, 150 µF / 5 mΩ, 0.4 V rectifier,
     * 50 mΩ switch: the CCM boundary lies above 4.2 A, so every load is DCM.
     */
    static StageSpec dcmStage() {
        return new StageSpec(ValueRange.between(36, 72), 3.3, ValueRange.between(0.2, 2), 100e3, 48e-6, 5, 150e-6,
                5e-3, 0.4, 0.05);
    }

    /**
     * 36–72 V bus to 12 V / 0.5–3 A, N = 2, Lm = 150 µH, 100 kHz, 220 µF / 15 mΩ: enough output
     * voltage to bias an LED and a shunt regulator; CCM above 0.72 A at 48 V.
     */
    static StageSpec twelveVoltStage() {
        return new StageSpec(ValueRange.between(36, 72), 12, ValueRange.between(0.5, 3), 100e3, 150e-6, 2, 220e-6,
                15e-3, 0.5, 0.1);
    }

    static ControlSpec voltageMode() {
        return ControlSpec.voltageMode(1.8, 0.7);
    }

    /** 0.25 V/A sense, 40 kV/s compensation ramp (0.4 V per period). */
    static ControlSpec currentMode() {
        return new ControlSpec(ControlScheme.CURRENT, Double.NaN, 0.25, 40e3, 0.7, 1);
    }

    static DesignRequest request(StageSpec stage, ControlSpec control, FeedbackSpec feedback) {
        return request(stage, control, feedback, Double.NaN);
    }

    static DesignRequest request(StageSpec stage, ControlSpec control, FeedbackSpec feedback, double crossoverHz) {
        return new DesignRequest(stage, control, feedback, targets(crossoverHz), SeriesSpec.defaults());
    }
}
