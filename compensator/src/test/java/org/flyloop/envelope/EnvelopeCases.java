package org.flyloop.envelope;

import java.util.Map;
import org.flyloop.design.DesignRequest;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.OpAmpType3Network;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.PlacementMethod;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.spec.Tolerance;
import org.flyloop.spec.TolerancesSpec;
import org.flyloop.spec.ValueRange;

/** Invented scenarios for the envelope tests. */
final class EnvelopeCases {

    private EnvelopeCases() {
    }

    static FeedbackSpec opamp(int type) {
        return new FeedbackSpec(AmplifierKind.OPAMP, type, PlacementMethod.BEST, 2.5, 10e3, Double.NaN, Double.NaN,
                Double.NaN, ValueRange.of(1), Double.NaN, 5, 1, Double.NaN, Double.NaN, Double.NaN, 1, 2.5, 1e-3,
                0.1, Map.of());
    }

    static FeedbackSpec opampWithGbw(double gbwHz) {
        return new FeedbackSpec(AmplifierKind.OPAMP, 3, PlacementMethod.BEST, 2.5, 10e3, Double.NaN, gbwHz,
                Double.NaN, ValueRange.of(1), Double.NaN, 5, 1, Double.NaN, Double.NaN, Double.NaN, 1, 2.5, 1e-3,
                0.1, Map.of());
    }

    static FeedbackSpec ota(double gm) {
        return new FeedbackSpec(AmplifierKind.OTA, 0, PlacementMethod.BEST, 2.5, 10e3, Double.NaN, Double.NaN, gm,
                ValueRange.of(1), Double.NaN, 5, 1, Double.NaN, Double.NaN, Double.NaN, 1, 2.5, 1e-3, 0.1, Map.of());
    }

    static FeedbackSpec shuntOpto(double ctrMin, double ctrMax, double optoPoleHz) {
        return new FeedbackSpec(AmplifierKind.SHUNT_OPTO, 0, PlacementMethod.BEST, 2.5, 10e3, Double.NaN,
                Double.NaN, Double.NaN, ValueRange.between(ctrMin, ctrMax), 10e3, 5, 1, optoPoleHz, Double.NaN,
                Double.NaN, 1, 2.5, 1e-3, 0.1, Map.of());
    }

    /** 36–75 V to 12 V / 2–4 A, voltage mode, 100 kHz: CCM everywhere. */
    static DesignRequest voltageModeCcm(FeedbackSpec fb) {
        StageSpec s = new StageSpec(ValueRange.between(36, 75), 12, ValueRange.between(2, 4), 100e3, 60e-6, 1,
                2200e-6, 20e-3, 0.4, 0.05);
        return new DesignRequest(s, ControlSpec.voltageMode(1.8, 0.7), fb, new TargetsSpec(Double.NaN, 50, 10, 0.25),
                SeriesSpec.defaults());
    }

    /** The same stage with light load down to 0.5 A, so the CCM/DCM boundary lies inside the load range. */
    static DesignRequest voltageModeAcrossBoundary(FeedbackSpec fb) {
        StageSpec s = new StageSpec(ValueRange.between(36, 75), 12, ValueRange.between(0.5, 4), 100e3, 60e-6, 1,
                2200e-6, 20e-3, 0.4, 0.05);
        return new DesignRequest(s, ControlSpec.voltageMode(1.8, 0.7), fb, new TargetsSpec(Double.NaN, 50, 10, 0.25),
                SeriesSpec.defaults());
    }

    /** 90–375 V to 12 V / 0.2–2 A, peak current mode, 65 kHz. */
    static DesignRequest currentMode(FeedbackSpec fb) {
        StageSpec s = new StageSpec(ValueRange.between(90, 375), 12, ValueRange.between(0.2, 2), 65e3, 700e-6, 8,
                1000e-6, 40e-3, 0.5, 0.5);
        ControlSpec c = new ControlSpec(ControlScheme.CURRENT, Double.NaN, 0.5, 20e3, 0.7, 1);
        return new DesignRequest(s, c, fb, new TargetsSpec(Double.NaN, 50, 10, 0.25), SeriesSpec.defaults());
    }

    /** 300–375 V to 15 V / 0.1–0.4 A, voltage mode, DCM everywhere. */
    static DesignRequest dcm(FeedbackSpec fb) {
        StageSpec s = new StageSpec(ValueRange.between(300, 375), 15, ValueRange.between(0.1, 0.4), 65e3, 1.5e-3, 10,
                470e-6, 80e-3, 0.6, 2);
        return new DesignRequest(s, ControlSpec.voltageMode(2.5, 0.6), fb, new TargetsSpec(Double.NaN, 50, 10, 0.25),
                SeriesSpec.defaults());
    }

    /**
     * 18–75 V (48 V nominal) to 12 V / 2–4 A (3 A nominal), voltage mode, CCM everywhere; with
     * {@link #tunedAtNominal()} the loop has 51° at 48 V / 3 A and is unstable at 18 V / 4 A,
     * where the RHP zero is lowest.
     */
    static DesignRequest wideLine() {
        StageSpec s = new StageSpec(new ValueRange(18, 48, 75), 12, new ValueRange(2, 3, 4), 100e3, 60e-6, 1, 2200e-6,
                20e-3, 0.4, 0.05);
        return new DesignRequest(s, ControlSpec.voltageMode(1.8, 0.75), opamp(3),
                new TargetsSpec(Double.NaN, 45, 6, 0.25), SeriesSpec.defaults());
    }

    /**
     * A type 3 network placed by K factor for an 8 kHz crossover at 48 V / 3 A only (E96/E12 parts):
     * fine there, too fast for low line.
     */
    static CompensatorNetwork tunedAtNominal() {
        return OpAmpType3Network.ideal(38.3e3, 10e3, 100e3, 470e-12, 100e-12, 8.66e3, 1e-9);
    }

    /** lm ±20 %, cout ±20 %, esr −50…+100 %, fsw ±5 %, resistors ±1 %, capacitors ±10 %. */
    static TolerancesSpec full() {
        return new TolerancesSpec(Tolerance.symmetric(0.2), Tolerance.symmetric(0.2), new Tolerance(-0.5, 1.0),
                Tolerance.symmetric(0.05), false, Tolerance.symmetric(0.01), Tolerance.symmetric(0.1));
    }

    /** Only the compensator's parts: resistors ±1 %, capacitors ±10 %. */
    static TolerancesSpec partsOnly() {
        return new TolerancesSpec(Tolerance.NONE, Tolerance.NONE, Tolerance.NONE, Tolerance.NONE, false,
                Tolerance.symmetric(0.01), Tolerance.symmetric(0.1));
    }
}
