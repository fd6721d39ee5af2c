package org.flyloop.switching;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * A starting point for the shooting iteration from the lossless textbook relations (switch
 * resistance and ESR ignored, rectifier drop kept). It only has to land near the orbit; Newton
 * shooting removes the rest.
 */
final class InitialGuess {

    private final FlybackCircuit circuit;
    private final double periodS;

    InitialGuess(FlybackCircuit circuit, double periodS) {
        this.circuit = circuit;
        this.periodS = periodS;
    }

    /** Period-start state estimate for this modulator. */
    CircuitState startFor(Modulator modulator) {
        if (modulator instanceof FixedDuty fixed) {
            return estimate(fixed.duty()).start;
        }
        PeakCurrent peak = (PeakCurrent) modulator;
        if (peak.controlVoltage() <= 0) {
            return CircuitState.DISCHARGED;
        }
        UnivariateFunction overshoot = d -> peak.senseVPerA() * estimate(d).peak
                + peak.slopeVPerS() * d * periodS - peak.controlVoltage();
        double duty = peak.dutyMax();
        if (overshoot.value(duty) > 0) {
            duty = new BrentSolver(1e-10, 1e-12).solve(200, overshoot, 0, peak.dutyMax());
        }
        return estimate(duty).start;
    }

    /**
     * Lossless estimate at duty D. DCM: Ipk = Vin·D·Ts/Lm and the energy ½·Lm·Ipk²·fsw goes into
     * (V + Vf)·Iload. CCM: N·(V + Vf) = Vin·D/(1 − D) and the valley Im − ΔI/2 with
     * Im = Iload/(N·(1 − D)). DCM is chosen when its D2 fits in the period.
     */
    private Estimate estimate(double d) {
        double vin = circuit.vin();
        double lm = circuit.lm();
        double n = circuit.turns();
        double vf = circuit.rectifierDrop();
        double r = circuit.loadResistance();
        double ix = circuit.extraLoadCurrent();
        double ramp = vin * d * periodS / lm;
        if (d <= 0) {
            return new Estimate(CircuitState.DISCHARGED, 0);
        }
        double power = 0.5 * lm * ramp * ramp / periodS;
        // (V + Vf)·(V/R + Ix) = P, a quadratic in V.
        double b = ix + vf / r;
        double c = vf * ix - power;
        double vDcm = Math.max(0, (-b + Math.sqrt(b * b - 4 * c / r)) * r / 2);
        double d2 = lm * ramp / (n * (vDcm + vf) * periodS);
        if (d + d2 <= 1) {
            return new Estimate(new CircuitState(0, vDcm), ramp);
        }
        double vCcm = Math.max(0, vin * d / (n * (1 - d)) - vf);
        double im = (vCcm / r + ix) / (n * (1 - d));
        double valley = Math.max(0, im - ramp / 2);
        return new Estimate(new CircuitState(valley, vCcm), valley + ramp);
    }

    private record Estimate(CircuitState start, double peak) {
    }
}
