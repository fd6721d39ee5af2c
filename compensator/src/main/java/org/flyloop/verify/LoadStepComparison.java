package org.flyloop.verify;

import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.ClosedLoop;
import org.flyloop.loop.LoadStepResponse;
import org.flyloop.loop.LoopGain;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.OperatingPointSolver;
import org.flyloop.stage.model.AnalyticStageModel;
import org.flyloop.stage.model.StageTransferFunctions;

/**
 * The linear load-step prediction against the closed-loop averaged simulation, on one time base.
 *
 * <p>Linear: {@link ClosedLoop#loadStep} with the analytic stage's open-loop output impedance and
 * the loop gain T = Gc·k_fb·Gvc at the pre-step operating point (the load resistor Vout/ioutFrom,
 * as in the simulation). Averaged: {@link ClosedLoopAveragedSimulation#loadStep} sampled at the
 * linear response's times. Both are reduced by {@link LoadStepResponse#of} with the same settling
 * band: ±{@value ClosedLoop#SETTLING_BAND_FRACTION} of Vout, and also a band of
 * {@value #PEAK_BAND_FRACTION} of the linear peak deviation, for steps too small to leave the
 * first.
 *
 * @param vinV             input voltage, V
 * @param ioutFromA        load before the step, A
 * @param ioutToA          load after the step, A
 * @param stageModel       the control-to-output model of the linear side
 * @param loop             the linear side's loop gain T(s)
 * @param linear           linear response, ±1 % of Vout band
 * @param averaged         averaged response on the same times, same band
 * @param linearPeakBand   linear response with the band {@value #PEAK_BAND_FRACTION}·|linear peak|
 * @param averagedPeakBand averaged response with that same band
 * @param simulation       the full averaged time series
 */
public record LoadStepComparison(double vinV, double ioutFromA, double ioutToA, LinearStageModel stageModel,
                                 TransferFunction loop, LoadStepResponse linear, LoadStepResponse averaged,
                                 LoadStepResponse linearPeakBand, LoadStepResponse averagedPeakBand,
                                 ClosedLoopTransient simulation) {

    /** Second settling band as a fraction of the linear peak deviation (common practice, no source). */
    public static final double PEAK_BAND_FRACTION = 0.1;

    /**
     * Runs both sides for a load step {@code ioutFromA} → {@code ioutToA} at {@code vinV}, over the
     * window {@link ClosedLoop#loadStep(TransferFunction, TransferFunction, double, double)} picks.
     */
    public static LoadStepComparison run(ClosedLoopAveragedSimulation sim, double vinV, double ioutFromA,
                                         double ioutToA, LinearStageModel stageModel) {
        return run(sim, vinV, ioutFromA, ioutToA, stageModel, Double.NaN);
    }

    /** As {@link #run(ClosedLoopAveragedSimulation, double, double, double, LinearStageModel)} over {@code windowS}. */
    public static LoadStepComparison run(ClosedLoopAveragedSimulation sim, double vinV, double ioutFromA,
                                         double ioutToA, LinearStageModel stageModel, double windowS) {
        OperatingPoint op = new OperatingPointSolver(sim.stage(), sim.control()).solve(vinV, ioutFromA);
        StageTransferFunctions stage = AnalyticStageModel.at(sim.stage(), sim.control(), op);
        TransferFunction loop = new LoopGain(sim.network().transferFunction(), sim.law().feedbackGain(),
                stageModel.of(stage)).transferFunction();
        double stepA = ioutToA - ioutFromA;
        LoadStepResponse linear = Double.isNaN(windowS)
                ? ClosedLoop.loadStep(stage.outputImpedance(), loop, stepA, op.vout())
                : ClosedLoop.loadStep(ClosedLoop.outputImpedance(stage.outputImpedance(), loop), stepA, op.vout(),
                        windowS);
        double[] t = linear.timesS();
        ClosedLoopTransient averagedRun = sim.loadStep(vinV, ioutFromA, ioutToA, t);
        LoadStepResponse averaged = averagedRun.deviationResponse(stepA, linear.settlingBandV());
        double peakBand = PEAK_BAND_FRACTION * Math.abs(linear.peakDeviationV());
        return new LoadStepComparison(vinV, ioutFromA, ioutToA, stageModel, loop, linear, averaged,
                LoadStepResponse.of(t, linear.deviationV(), stepA, peakBand),
                averagedRun.deviationResponse(stepA, peakBand), averagedRun);
    }

    /** The common sample times, s. */
    public double[] timesS() {
        return linear.timesS();
    }

    /** (averaged − linear)/linear of the peak deviation. */
    public double peakDifference() {
        return averaged.peakDeviationV() / linear.peakDeviationV() - 1;
    }

    /** (averaged − linear)/linear of the settling time to ±1 % of Vout; NaN when either is NaN or 0. */
    public double settlingDifference() {
        return relative(averaged.settlingTimeS(), linear.settlingTimeS());
    }

    /** As {@link #settlingDifference()} for the band of {@value #PEAK_BAND_FRACTION} of the linear peak. */
    public double peakBandSettlingDifference() {
        return relative(averagedPeakBand.settlingTimeS(), linearPeakBand.settlingTimeS());
    }

    /** True when the linear response leaves the ±1 % of Vout band, so its settling time means something. */
    public boolean leavesSettlingBand() {
        return Math.abs(linear.peakDeviationV()) > linear.settlingBandV();
    }

    /** Largest |averaged − linear| deviation over the window, V. */
    public double largestGapV() {
        double[] a = averaged.deviationV();
        double[] l = linear.deviationV();
        double gap = 0;
        for (int i = 0; i < a.length; i++) {
            gap = Math.max(gap, Math.abs(a[i] - l[i]));
        }
        return gap;
    }

    private static double relative(double value, double reference) {
        return reference > 0 && Double.isFinite(value) ? value / reference - 1 : Double.NaN;
    }
}
