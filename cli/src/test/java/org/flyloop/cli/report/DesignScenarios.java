package org.flyloop.cli.report;

import java.util.Map;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.DesignResult;
import org.flyloop.design.Designer;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.PlacementMethod;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.spec.ValueRange;

/** Invented design scenarios (copied from the designer's test cases), designed once per JVM. */
final class DesignScenarios {

    private static DesignResult voltageMode;
    private static DesignResult currentModeOpto;
    private static DesignResult dcmOta;

    private DesignScenarios() {
    }

    static FeedbackSpec opamp(int type) {
        return new FeedbackSpec(AmplifierKind.OPAMP, type, PlacementMethod.BEST, 2.5, 10e3, Double.NaN, Double.NaN,
                Double.NaN, ValueRange.of(1), Double.NaN, 5, 1, Double.NaN, Double.NaN, Double.NaN, 1, 2.5, 1e-3,
                0.1, Map.of());
    }

    static FeedbackSpec shuntOpto(double ctrMin, double ctrMax, double optoPoleHz) {
        return new FeedbackSpec(AmplifierKind.SHUNT_OPTO, 0, PlacementMethod.BEST, 2.5, 10e3, Double.NaN,
                Double.NaN, Double.NaN, ValueRange.between(ctrMin, ctrMax), 10e3, 5, 1, optoPoleHz, Double.NaN,
                Double.NaN, 1, 2.5, 1e-3, 0.1, Map.of());
    }

    static FeedbackSpec ota(double gm) {
        return new FeedbackSpec(AmplifierKind.OTA, 0, PlacementMethod.BEST, 2.5, 10e3, Double.NaN, Double.NaN,
                gm, ValueRange.of(1), Double.NaN, 5, 1, Double.NaN, Double.NaN, Double.NaN, 1, 2.5, 1e-3, 0.1,
                Map.of());
    }

    /** 36–75 V telecom bus to 12 V / 2–4 A, voltage mode, 100 kHz. */
    static DesignRequest voltageModeCcm(FeedbackSpec fb) {
        StageSpec s = new StageSpec(ValueRange.between(36, 75), 12, ValueRange.between(2, 4), 100e3, 60e-6, 1,
                2200e-6, 20e-3, 0.4, 0.05);
        return new DesignRequest(s, ControlSpec.voltageMode(1.8, 0.7), fb, new TargetsSpec(Double.NaN, 50, 10, 0.25),
                SeriesSpec.defaults());
    }

    /** 90–375 V bulk to 12 V / 0.2–2 A, peak current mode, 65 kHz. */
    static DesignRequest currentMode(FeedbackSpec fb) {
        StageSpec s = new StageSpec(ValueRange.between(90, 375), 12, ValueRange.between(0.2, 2), 65e3, 700e-6, 8,
                1000e-6, 40e-3, 0.5, 0.5);
        ControlSpec c = new ControlSpec(ControlScheme.CURRENT, Double.NaN, 0.5, 20e3, 0.7, 1);
        return new DesignRequest(s, c, fb, new TargetsSpec(Double.NaN, 50, 10, 0.25), SeriesSpec.defaults());
    }

    /** 300–375 V to 15 V / 0.1–0.4 A, voltage mode, deep DCM everywhere. */
    static DesignRequest dcm(FeedbackSpec fb) {
        StageSpec s = new StageSpec(ValueRange.between(300, 375), 15, ValueRange.between(0.1, 0.4), 65e3, 1.5e-3, 10,
                470e-6, 80e-3, 0.6, 2);
        return new DesignRequest(s, ControlSpec.voltageMode(2.5, 0.6), fb, new TargetsSpec(Double.NaN, 50, 10, 0.25),
                SeriesSpec.defaults());
    }

    /** Op-amp, automatic type (3), voltage mode, CCM. */
    static synchronized DesignResult voltageMode() {
        if (voltageMode == null) {
            voltageMode = Designer.design(voltageModeCcm(opamp(0)));
        }
        return voltageMode;
    }

    /** Shunt regulator and optocoupler with a 2:1 CTR spread, peak current mode. */
    static synchronized DesignResult currentModeOpto() {
        if (currentModeOpto == null) {
            currentModeOpto = Designer.design(currentMode(shuntOpto(0.5, 1.0, 8e3)));
        }
        return currentModeOpto;
    }

    /** OTA, voltage mode, DCM at every corner. */
    static synchronized DesignResult dcmOta() {
        if (dcmOta == null) {
            dcmOta = Designer.design(dcm(ota(200e-6)));
        }
        return dcmOta;
    }
}
