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
     * −Zcl(s)·ΔI/s, from the closed-loop state-space model (exact step response through the matrix
     * exponential, so any sample times may be used). The window covers eight time constants of the
     * slowest closed-loop pole; the samples are spaced logarithmically from a thousandth of the
     * fastest pole's time constant, so a fast pole that nearly cancels a zero (the optocoupler's,
     * or the current loop's) and the slow tail are both resolved.
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
            }
            fastest = Math.max(fastest, p.omega0());
        }
        if (Double.isInfinite(slowest) || fastest == 0) {
            throw new IllegalArgumentException("the closed-loop output impedance has no decaying pole");
        }
        double window = 8 / slowest;
        double first = 1e-3 / fastest;
        double[] t = new double[SAMPLES + 1];
        t[0] = 0;
        double ratio = window / first;
        for (int i = 1; i <= SAMPLES; i++) {
            t[i] = first * Math.pow(ratio, (i - 1.0) / (SAMPLES - 1));
        }
        return loadStep(zcl, stepA, voutV, t);
    }

    /** The step response of a closed-loop output impedance on a uniform grid over {@code windowS}. */
    public static LoadStepResponse loadStep(TransferFunction closedLoopZout, double stepA, double voutV,
                                            double windowS) {
        double[] t = new double[SAMPLES + 1];
        for (int i = 0; i <= SAMPLES; i++) {
            t[i] = windowS * i / SAMPLES;
        }
        return loadStep(closedLoopZout, stepA, voutV, t);
    }

    /** As {@link #loadStep(TransferFunction, TransferFunction, double, double)} at given sample times. */
    public static LoadStepResponse loadStep(TransferFunction closedLoopZout, double stepA, double voutV,
                                            double[] timesS) {
        StateSpace ss = StateSpace.fromTransferFunction(closedLoopZout);
        double[] unit = ss.stepResponse(timesS);
        double[] dv = new double[timesS.length];
        for (int i = 0; i < timesS.length; i++) {
            dv[i] = -stepA * unit[i];
        }
        return LoadStepResponse.of(timesS, dv, stepA, SETTLING_BAND_FRACTION * voutV);
    }
}
