package org.flyloop.design;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.OperatingPointSolver;
import org.flyloop.stage.model.AnalyticStageModel;

/**
 * The corners a design is checked at: every vin × iout corner of the spec and, for a shunt-opto
 * network, each at the lowest and the highest CTR of {@code feedback.ctr} (the CTR spread moves
 * the loop gain by its full ratio, so it is a corner dimension like line and load).
 */
public final class Corners {

    private Corners() {
    }

    /** Corners of the spec's vin × iout × CTR-extremes grid. */
    public static List<Corner> of(StageSpec stage, ControlSpec control, FeedbackSpec feedback) {
        return at(stage, control, feedback, new OperatingPointSolver(stage, control).corners());
    }

    /** Corners at the given operating points, times the CTR extremes where they apply. */
    public static List<Corner> at(StageSpec stage, ControlSpec control, FeedbackSpec feedback,
                                  List<OperatingPoint> points) {
        List<Corner> out = new ArrayList<>();
        for (OperatingPoint p : points) {
            var model = AnalyticStageModel.at(stage, control, p);
            for (double ctr : ctrValues(feedback)) {
                out.add(new Corner(p, ctr, model));
            }
        }
        return out;
    }

    /** The CTR values each operating point is taken at: NaN alone when there is no optocoupler. */
    static List<Double> ctrValues(FeedbackSpec feedback) {
        if (feedback.amplifier() != AmplifierKind.SHUNT_OPTO) {
            return List.of(Double.NaN);
        }
        if (feedback.ctr().isSingle()) {
            return List.of(feedback.ctr().min());
        }
        return List.of(feedback.ctr().min(), feedback.ctr().max());
    }
}
