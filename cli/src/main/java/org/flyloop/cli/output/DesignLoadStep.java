package org.flyloop.cli.output;

import java.util.Optional;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignResult;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.ClosedLoop;
import org.flyloop.loop.LoadStepResponse;

/**
 * The load-step figure a design report shows: the linear closed-loop response of the output to a
 * load step of half the largest load current ({@link ClosedLoop#loadStep}), at the corner with
 * the smallest phase margin, where the response rings most. Half the full load is a middle value
 * of the 25 % to 100 % steps in use (common practice, no source).
 *
 * <p>Two windows: {@link ClosedLoop}'s own, fine enough for the fastest closed-loop pole, gives
 * the peak; a second one of eight time constants of the slowest closed-loop pole gives the
 * settling time. One window cannot do both when a fast pole sits almost on a zero (the
 * optocoupler's pole, for example): resolving it would cut the window short of the slow tail, and
 * the "settling time" would then be measured against a value the output has not reached.
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
    /** The settling window in time constants of the slowest closed-loop pole (e^-8 ≈ 0.03 %). */
    static final double SETTLING_WINDOW_TIME_CONSTANTS = 8;

    /**
     * The step at the built network's worst-phase-margin corner; empty when that corner's closed
     * loop, or its closed-loop output impedance, is not stable (a linear step response would only
     * grow).
     */
    public static Optional<DesignLoadStep> atWorstPhaseMargin(DesignResult result) {
        CornerResult worst = result.roundedLoop().worstPhaseMargin();
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
        LoadStepResponse fine = ClosedLoop.loadStep(zout, worst.loop(), step, vout);
        TransferFunction zcl = ClosedLoop.outputImpedance(zout, worst.loop());
        double fineWindow = fine.timesS()[fine.timesS().length - 1];
        double slowWindow = SETTLING_WINDOW_TIME_CONSTANTS / slowestDecayPerSecond(zcl);
        LoadStepResponse settling = slowWindow > fineWindow
                ? ClosedLoop.loadStep(zcl, step, vout, slowWindow) : fine;
        LoadStepResponse peak = Math.abs(settling.peakDeviationV()) > Math.abs(fine.peakDeviationV()) ? settling : fine;
        return Optional.of(new DesignLoadStep(worst, step, peak.peakDeviationV(), peak.peakTimeS(),
                settling.settlingBandV(), settling.settlingTimeS()));
    }

    /** The smallest |Re p| over the left-half-plane poles, 1/s (+∞ with none). */
    private static double slowestDecayPerSecond(TransferFunction f) {
        double slowest = Double.POSITIVE_INFINITY;
        for (Root p : f.poles()) {
            double sigma = Math.abs(p.re());
            if (sigma > 0) {
                slowest = Math.min(slowest, sigma);
            }
        }
        return slowest;
    }
}
