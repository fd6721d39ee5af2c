package org.flyloop.cli.output;

import java.util.Optional;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignResult;
import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.ClosedLoop;
import org.flyloop.loop.LoadStepResponse;

/**
 * The load-step figure a design report shows: the linear closed-loop response of the output to a
 * load step of half the largest load current up to full load ({@link ClosedLoop#loadStep}), at
 * the full-load corner with the smallest phase margin, where the response rings most. Half the
 * full load is a middle value of the 25 % to 100 % steps in use (common practice, no source).
 *
 * @param corner         the corner the step is simulated at
 * @param stepA          the step, A (positive: more load)
 * @param peakDeviationV largest |deviation| with its sign, V
 * @param peakTimeS      when it occurs, s
 * @param settlingBandV  half-width of the settling band, V
 * @param settlingTimeS  time after which the deviation stays in the band around its final value,
 *                       s (0 when it never leaves the band; NaN when not settled in the window)
 */
public record DesignLoadStep(CornerResult corner, double stepA, double peakDeviationV, double peakTimeS,
                             double settlingBandV, double settlingTimeS) {

    /** The step as a fraction of the largest load current. */
    public static final double STEP_FRACTION_OF_MAX_LOAD = 0.5;

    /**
     * The step at the built network's load-step corner (full load, smallest phase margin there;
     * {@link org.flyloop.design.LoopEvaluation#loadStepCorner}); empty when that corner's closed
     * loop, or its closed-loop output impedance, is not stable (a linear step response would only
     * grow).
     */
    public static Optional<DesignLoadStep> atLoadStepCorner(DesignResult result) {
        CornerResult worst = result.roundedLoop().loadStepCorner();
        if (!worst.margins().isStable()) {
            return Optional.empty();
        }
        double step = STEP_FRACTION_OF_MAX_LOAD * result.request().stage().iout().max();
        double vout = result.request().stage().vout();
        TransferFunction zout = worst.corner().stage().outputImpedance();
        if (ClosedLoop.outputImpedance(zout, worst.loop()).rightHalfPlanePoleCount() > 0) {
            // A stable loop with an unstable closed-loop output impedance means the stage model's
            // output impedance itself has a right-half-plane pole; a step through it only grows.
            return Optional.empty();
        }
        LoadStepResponse r = ClosedLoop.loadStep(zout, worst.loop(), step, vout);
        return Optional.of(new DesignLoadStep(worst, step, r.peakDeviationV(), r.peakTimeS(),
                r.settlingBandV(), r.settlingTimeS()));
    }
}
