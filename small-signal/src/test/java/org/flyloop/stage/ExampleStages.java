package org.flyloop.stage;

import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;

/**
 * Invented flyback stages used across the stage and switching tests. Part values are ordinary
 * catalogue-like numbers, chosen so that every stage has both CCM and DCM corners.
 */
public final class ExampleStages {

    private ExampleStages() {
    }

    /** 12 V / 2 A offline adapter, 120–375 V bulk, 100 kHz. */
    public static StageSpec offlineAdapter() {
        return new StageSpec(new ValueRange(120, 325, 375), 12, ValueRange.between(0.2, 2), 100e3,
                600e-6, 6, 1000e-6, 0.015, 0.5, 0.6);
    }

    /** 5 V / 4 A telecom brick, 36–72 V, 200 kHz, Schottky rectifier. */
    public static StageSpec telecomBrick() {
        return new StageSpec(new ValueRange(36, 48, 72), 5, ValueRange.between(0.5, 4), 200e3,
                60e-6, 4, 940e-6, 0.005, 0.35, 0.05);
    }

    /** 24 V / 1 A auxiliary rail from a 48 V bus, 150 kHz, 1:1 winding. */
    public static StageSpec auxiliaryRail() {
        return new StageSpec(ValueRange.of(48), 24, ValueRange.between(0.1, 1), 150e3,
                100e-6, 1, 220e-6, 0.03, 0.7, 0.1);
    }

    /** 3.3 V / 0.5 A standby supply, 100–400 V, 65 kHz, polymer output capacitor, high-resistance switch. */
    public static StageSpec standbySupply() {
        return new StageSpec(ValueRange.between(100, 400), 3.3, ValueRange.between(0.05, 0.5), 65e3,
                3e-3, 20, 680e-6, 0.015, 0.4, 3);
    }

    /** 19 V / 3.4 A notebook adapter at low line, 85–375 V, 65 kHz. */
    public static StageSpec notebookAdapter() {
        return new StageSpec(ValueRange.between(85, 375), 19, ValueRange.between(0.3, 3.4), 65e3,
                400e-6, 8, 2000e-6, 0.01, 0.6, 0.3);
    }

    /** Lossless 24 V → 12 V stage, 1:1, 100 kHz: the textbook case. */
    public static StageSpec ideal() {
        return new StageSpec(ValueRange.between(18, 36), 12, ValueRange.between(0.1, 3), 100e3,
                100e-6, 1, 100e-6, 0, 0, 0);
    }

    /** The five lossy stages and the lossless one. */
    public static java.util.List<StageSpec> all() {
        return java.util.List.of(offlineAdapter(), telecomBrick(), auxiliaryRail(), standbySupply(),
                notebookAdapter(), ideal());
    }

    /** Voltage-mode control with a 2 V ramp and a 0.75 duty limit. */
    public static ControlSpec voltageMode() {
        return ControlSpec.voltageMode(2, 0.75);
    }

    /** Same stage with a tighter duty limit, to provoke refusals. */
    public static ControlSpec voltageMode(double dutyMax) {
        return ControlSpec.voltageMode(2, dutyMax);
    }
}
