package org.flyloop.bench;

import java.util.Map;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.Designer;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.PlacementMethod;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.spec.Tolerance;
import org.flyloop.spec.TolerancesSpec;
import org.flyloop.spec.ValueRange;

/** The invented scenario the benchmarks share. */
final class BenchScenarios {

    private BenchScenarios() {
    }

    /**
     * 36–75 V (48 V nominal) to 12 V / 2–4 A (3 A nominal), voltage mode, op-amp type 3: 3 vin × 3
     * iout = 9 corners, all CCM (the boundary load stays below 2 A), so no boundary corners.
     */
    static DesignRequest nineCorners() {
        StageSpec s = new StageSpec(new ValueRange(36, 48, 75), 12, new ValueRange(2, 3, 4), 100e3, 60e-6, 1, 2200e-6,
                20e-3, 0.4, 0.05);
        FeedbackSpec fb = new FeedbackSpec(AmplifierKind.OPAMP, 3, PlacementMethod.BEST, 2.5, 10e3, Double.NaN,
                Double.NaN, Double.NaN, ValueRange.of(1), Double.NaN, 5, 1, Double.NaN, Double.NaN, Double.NaN, 1, 2.5,
                1e-3, 0.1, Map.of());
        return new DesignRequest(s, ControlSpec.voltageMode(1.8, 0.7), fb, new TargetsSpec(Double.NaN, 50, 10, 0.25),
                SeriesSpec.defaults());
    }

    /** The designer's built network for {@link #nineCorners()}. */
    static CompensatorNetwork designedNetwork() {
        return Designer.design(nineCorners()).rounded();
    }

    /**
     * The four stage quantities, lm ±20 %, cout ±20 %, esr −50…+100 %, fsw ±5 %: 2⁴ = 16 vertices,
     * each needing new operating points and stage models at every corner (the expensive side).
     */
    static TolerancesSpec fourQuantities() {
        return new TolerancesSpec(Tolerance.symmetric(0.2), Tolerance.symmetric(0.2), new Tolerance(-0.5, 1.0),
                Tolerance.symmetric(0.05), false, Tolerance.NONE, Tolerance.NONE);
    }

    /** Every tolerance: the four stage quantities, resistors ±1 %, capacitors ±10 %. */
    static TolerancesSpec everything() {
        return new TolerancesSpec(Tolerance.symmetric(0.2), Tolerance.symmetric(0.2), new Tolerance(-0.5, 1.0),
                Tolerance.symmetric(0.05), false, Tolerance.symmetric(0.01), Tolerance.symmetric(0.1));
    }

    /** Only the compensator's parts: resistors ±1 %, capacitors ±10 %. */
    static TolerancesSpec partsOnly() {
        return new TolerancesSpec(Tolerance.NONE, Tolerance.NONE, Tolerance.NONE, Tolerance.NONE, false,
                Tolerance.symmetric(0.01), Tolerance.symmetric(0.1));
    }
}
