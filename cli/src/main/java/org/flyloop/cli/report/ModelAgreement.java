package org.flyloop.cli.report;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.averaged.AveragedFlybackModel;
import org.flyloop.averaged.LinearizedModel;
import org.flyloop.cli.plot.AgreementData;
import org.flyloop.cli.plot.BodeTrace;
import org.flyloop.cli.plot.Emphasis;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignResult;
import org.flyloop.linear.ComplexResponse;
import org.flyloop.linear.FrequencyGrid;
import org.flyloop.linear.FrequencyResponse;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.model.StageTransferFunctions;

/**
 * Analytic control-to-output against the averaged switch model linearized numerically at the
 * worst corner ({@link AveragedFlybackModel#linearize(double, double)}). In voltage mode the
 * averaged model's control input is the duty cycle, so its response is divided by the ramp to
 * compare with v̂o/v̂c. The averaged model has no sampling effect, so in current mode it is
 * compared with the analytic model without Ridley's sampling pair, and the comparison range stops
 * at fsw/10; the analytic model with the pair is drawn as well, uncompared.
 */
public final class ModelAgreement {

    /** Points per decade of the comparison. */
    public static final int POINTS_PER_DECADE = 40;

    private ModelAgreement() {
    }

    /**
     * The comparison at the worst-phase-margin corner from {@code lowHz} to fsw/2.
     *
     * @throws RuntimeException when the averaged model finds no regulated equilibrium there
     */
    public static AgreementData of(DesignResult r, double lowHz) {
        CornerResult worst = DesignCurves.worst(r);
        OperatingPoint p = worst.corner().point();
        StageTransferFunctions stage = worst.corner().stage();
        ControlSpec control = r.request().control();
        double fsw = r.request().stage().fswHz();
        FrequencyGrid grid = FrequencyGrid.logarithmic(lowHz, fsw / 2, POINTS_PER_DECADE);

        LinearizedModel lin = new AveragedFlybackModel(r.request().stage(), control).linearize(p.vin(), p.iout());
        int out = lin.outputIndex("vout");
        double scale = control.scheme() == ControlScheme.VOLTAGE ? 1 / control.rampV() : 1;
        ComplexResponse averaged = (f, v) -> {
            Complex h = lin.response(out, 0, f).multiply(scale);
            v[0] = h.getReal();
            v[1] = h.getImaginary();
        };
        boolean current = control.scheme() == ControlScheme.CURRENT;
        BodeTrace reference = BodeTrace.of(current ? "analytic, without sampling pair" : "analytic",
                FrequencyResponse.of(stage.controlAveraged(), grid), Emphasis.STRONG);
        BodeTrace model = BodeTrace.of("averaged switch model", FrequencyResponse.of(averaged, grid), Emphasis.NORMAL);
        List<BodeTrace> extras = new ArrayList<>();
        if (current) {
            extras.add(BodeTrace.of("analytic, with sampling pair", FrequencyResponse.of(stage.control(), grid),
                    Emphasis.NORMAL));
        }
        boolean fullBand = !current && p.isContinuous();
        double limit = fullBand ? fsw / 2 : fsw / 10;
        return new AgreementData("Model agreement: control to output",
                "at " + CornerNames.point(p) + " " + p.mode().label() + "; difference is averaged minus analytic",
                reference, model, extras, limit, List.of());
    }
}
