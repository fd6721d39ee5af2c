package org.flyloop.verify;

import java.util.List;
import java.util.Locale;
import org.flyloop.averaged.ModeChange;
import org.flyloop.loop.LoadStepResponse;

/**
 * The result of a closed-loop averaged simulation: samples at the requested times, located
 * CCM/DCM changes, and the equilibrium it started from. Immutable.
 *
 * @param scenarioName short label
 * @param start        the closed-loop equilibrium before the disturbance
 * @param samples      rows in time order
 * @param modeChanges  located CCM/DCM crossings
 * @param clampEvents  how many times the control law entered or left a clamp
 */
public record ClosedLoopTransient(String scenarioName, ClosedLoopEquilibrium start, List<ClosedLoopSample> samples,
                                  List<ModeChange> modeChanges, int clampEvents) {

    public ClosedLoopTransient {
        samples = List.copyOf(samples);
        modeChanges = List.copyOf(modeChanges);
    }

    /** Sample times, s. */
    public double[] timeS() {
        return samples.stream().mapToDouble(ClosedLoopSample::timeS).toArray();
    }

    /** Output voltages, V. */
    public double[] voutV() {
        return samples.stream().mapToDouble(ClosedLoopSample::voutV).toArray();
    }

    /** vo(t) − vo before the disturbance, V. */
    public double[] voutDeviationV() {
        double before = start.voutV();
        return samples.stream().mapToDouble(s -> s.voutV() - before).toArray();
    }

    /**
     * Peak and settling of the output deviation, reduced exactly as the linear prediction is
     * ({@link LoadStepResponse#of}; the final value is the last sample).
     *
     * @param stepA         the disturbance's load step, A (recorded only)
     * @param settlingBandV half-width of the settling band, V
     */
    public LoadStepResponse deviationResponse(double stepA, double settlingBandV) {
        return LoadStepResponse.of(timeS(), voutDeviationV(), stepA, settlingBandV);
    }

    /** True when any sample, or any instant between samples, had the control law in a clamp. */
    public boolean everClamped() {
        return clampEvents > 0 || samples.stream().anyMatch(ClosedLoopSample::clamped);
    }

    /** Comma-separated table with a header row: time_s, vout_v, im_a, vc_v, control, duty, mode, clamped. */
    public String toCsv() {
        StringBuilder sb = new StringBuilder("time_s,vout_v,im_a,vc_v,control,duty,mode,clamped\n");
        for (ClosedLoopSample s : samples) {
            sb.append(String.format(Locale.ROOT, "%.9g,%.9g,%.9g,%.9g,%.9g,%.9g,%s,%b%n", s.timeS(), s.voutV(),
                    s.imA(), s.amplifierV(), s.controlInput(), s.duty(), s.mode().label(), s.clamped()));
        }
        return sb.toString();
    }
}
