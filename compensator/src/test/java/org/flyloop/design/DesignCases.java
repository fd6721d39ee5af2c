package org.flyloop.design;

import java.util.Map;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.PlacementMethod;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.spec.ValueRange;

/** Invented design scenarios for the designer tests. */
final class DesignCases {
    private DesignCases() {
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

    /** 36–75 V telecom bus to 12 V / 0.5–4 A, voltage mode, 100 kHz. */
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
        ControlSpec c = new ControlSpec(org.flyloop.spec.ControlScheme.CURRENT, Double.NaN, 0.5, 20e3, 0.7, 1);
        return new DesignRequest(s, c, fb, new TargetsSpec(Double.NaN, 50, 10, 0.25), SeriesSpec.defaults());
    }

    /** 300–375 V to 15 V / 0.1–0.4 A, voltage mode, deep DCM everywhere. */
    static DesignRequest dcm(FeedbackSpec fb) {
        StageSpec s = new StageSpec(ValueRange.between(300, 375), 15, ValueRange.between(0.1, 0.4), 65e3, 1.5e-3, 10,
                470e-6, 80e-3, 0.6, 2);
        return new DesignRequest(s, ControlSpec.voltageMode(2.5, 0.6), fb, new TargetsSpec(Double.NaN, 50, 10, 0.25),
                SeriesSpec.defaults());
    }
}
