package org.flyloop.loop;

import org.flyloop.linear.Root;
import org.flyloop.linear.StateSpace;
import org.flyloop.linear.TransferFunction;

/**
 * Closed-loop responses of a unity negative-feedback loop around T(s).
 */
public final class ClosedLoop {

    /** Settling band used for load steps: ±1 % of the output voltage (common practice, no source). */
    public static final double SETTLING_BAND_FRACTION = 0.01;
    private static final int SAMPLES = 4000;

    private ClosedLoop() {
    }

    /** S = 1/(1 + T). */
    public static TransferFunction sensitivity(TransferFunction loop) {
        return TransferFunction.constant(1).feedback(loop);
    }

    /**
     * T/(1 + T): the closed-loop response from the reference to the output, normalised to its
     * DC value (the divider ratio Vout/Vref multiplies it in absolute terms).
     */
    public static TransferFunction referenceToOutput(TransferFunction loop) {
        return loop.feedback();
    }

    /** Closed-loop output impedance Zout/(1 + T), Ω. */
    public static TransferFunction outputImpedance(TransferFunction openLoopZout, TransferFunction loop) {
        return openLoopZout.times(sensitivity(loop));
    }

    /**
     * Linear response of the output to a load step of {@code stepA} amperes: Δvo(s) =
     * −Zcl(s)·ΔI/s, simulated from the closed-loop state-space model. The window covers the
     * slowest closed-loop pole's decay (eight time constants, at least five crossover periods).
     */
    public static LoadStepResponse loadStep(TransferFunction openLoopZout, TransferFunction loop,
                                            double stepA, double voutV) {
        TransferFunction zcl = outputImpedance(openLoopZout, loop);
        double slowest = Double.POSITIVE_INFINITY;
        double fastest = 0;
        for (Root p : zcl.poles()) {
            double sigma = Math.abs(p.re());
            if (sigma > 0) {
                slowest = Math.min(slowest, sigma);
                fastest = Math.max(fastest, p.omega0());
            }
        }
        double window = Double.isInfinite(slowest) ? 1e-3 : 8 / slowest;
        window = Math.min(window, 2000 / Math.max(fastest, 1e-12));
        return loadStep(zcl, stepA, voutV, window);
    }

    /** As {@link #loadStep(TransferFunction, TransferFunction, double, double)} over a given window. */
    public static LoadStepResponse loadStep(TransferFunction closedLoopZout, double stepA, double voutV,
                                            double windowS) {
        StateSpace ss = StateSpace.fromTransferFunction(closedLoopZout);
        double[] t = new double[SAMPLES + 1];
        for (int i = 0; i <= SAMPLES; i++) {
            t[i] = windowS * i / SAMPLES;
        }
        double[] unit = ss.stepResponse(t);
        double[] dv = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            dv[i] = -stepA * unit[i];
        }
        return LoadStepResponse.of(t, dv, stepA, SETTLING_BAND_FRACTION * voutV);
    }
}
