package org.flyloop.envelope;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flyloop.design.Corner;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.OperatingPointSolver;
import org.flyloop.stage.model.AnalyticStageModel;

/**
 * The corners of the operating envelope: vin {min, nominal if given, max} × iout {min, nominal if
 * given, max}, plus at each vin the loads just either side of the CCM/DCM boundary
 * ({@value #DCM_SIDE}× and {@value #CCM_SIDE}× the boundary load) where those lie inside the load
 * range, × the CTR extremes of {@code feedback.ctr} for a shunt-opto network.
 *
 * <p>The boundary corners are there because the small-signal model changes form at the boundary
 * (the CCM double pole and RHP zero give way to the DCM single pole), so the loop can be at its worst
 * on either side of it; 2 % keeps each corner outside the solver's 1 % boundary band, so each is
 * analysed with the model of its own side.
 */
public final class EnvelopeCorners {

    /** Load of the DCM-side boundary corner, as a fraction of the boundary load. */
    public static final double DCM_SIDE = 0.98;
    /** Load of the CCM-side boundary corner, as a fraction of the boundary load. */
    public static final double CCM_SIDE = 1.02;

    private EnvelopeCorners() {
    }

    /** Every corner of the envelope, vin ascending, then load ascending, then CTR ascending. */
    public static List<EnvelopeCorner> of(StageSpec stage, ControlSpec control, FeedbackSpec feedback) {
        OperatingPointSolver solver = new OperatingPointSolver(stage, control);
        ValueRange iout = stage.iout();
        List<EnvelopeCorner> out = new ArrayList<>();
        for (double vin : stage.vin().corners()) {
            List<EnvelopeCorner> loads = new ArrayList<>();
            for (double i : iout.corners()) {
                loads.add(new EnvelopeCorner(vin, new LoadSetting.Fixed(i), Double.NaN, i));
            }
            double boundary = solver.boundaryLoad(vin);
            for (double factor : new double[] {DCM_SIDE, CCM_SIDE}) {
                double i = factor * boundary;
                if (i >= iout.min() && i <= iout.max()) {
                    loads.add(new EnvelopeCorner(vin, new LoadSetting.Boundary(factor), Double.NaN, i));
                }
            }
            loads.sort(Comparator.comparingDouble(EnvelopeCorner::nominalIoutA));
            for (EnvelopeCorner c : loads) {
                for (double ctr : ctrValues(feedback)) {
                    out.add(new EnvelopeCorner(c.vinV(), c.load(), ctr, c.nominalIoutA()));
                }
            }
        }
        return out;
    }

    /** The operating conditions of {@code corners} once each, without CTR (for a sampled CTR). */
    public static List<EnvelopeCorner> withoutCtr(List<EnvelopeCorner> corners) {
        Map<String, EnvelopeCorner> distinct = new LinkedHashMap<>();
        for (EnvelopeCorner c : corners) {
            EnvelopeCorner bare = c.withoutCtr();
            distinct.putIfAbsent(bare.label(), bare);
        }
        return new ArrayList<>(distinct.values());
    }

    /** The CTR values each operating point is taken at: NaN alone when there is no optocoupler. */
    static List<Double> ctrValues(FeedbackSpec feedback) {
        if (feedback == null || feedback.amplifier() != AmplifierKind.SHUNT_OPTO) {
            return List.of(Double.NaN);
        }
        if (feedback.ctr().isSingle()) {
            return List.of(feedback.ctr().min());
        }
        return List.of(feedback.ctr().min(), feedback.ctr().max());
    }

    /**
     * The corner for the given stage (nominal or a tolerance variant): its operating point and
     * small-signal model.
     *
     * @throws org.flyloop.stage.InfeasibleOperatingPointException when the stage cannot run there
     */
    public static Corner resolve(EnvelopeCorner corner, StageSpec stage, ControlSpec control,
                                 OperatingPointSolver solver) {
        double iout = corner.load().ioutA(solver, corner.vinV(), stage.iout());
        OperatingPoint p = solver.solve(corner.vinV(), iout);
        return new Corner(p, corner.ctr(), AnalyticStageModel.at(stage, control, p));
    }

    /** Every corner resolved for one stage. */
    public static List<Corner> resolveAll(List<EnvelopeCorner> corners, StageSpec stage, ControlSpec control) {
        OperatingPointSolver solver = new OperatingPointSolver(stage, control);
        List<Corner> out = new ArrayList<>();
        for (EnvelopeCorner c : corners) {
            out.add(resolve(c, stage, control, solver));
        }
        return out;
    }
}
