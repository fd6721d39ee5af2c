package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.flyloop.linear.StateSpace;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * A 1 % control step simulated on the nonlinear averaged model (Dormand–Prince, Commons Math)
 * against the unit-step response of its linearization computed independently by the matrix
 * exponential (Van Loan's block method in the core's {@link StateSpace#stepResponse}), scaled by
 * the step. "1 %" is relative: d → 1.01·d (or vc → 1.01·vc), small enough that the curvature of
 * the CCM conversion ratio (second-order term ≈ Δd/(1 − D) ≈ 0.5 % here) stays below the 2 %
 * tolerance on the final value and on the peak deviation.
 */
class ControlStepTest {

    @ParameterizedTest(name = "{0} mode at {1} A ({2}), {3} s")
    @CsvSource({
        "voltage, 2.0, CCM, 0.04",
        "voltage, 0.2, DCM, 0.15",
        "current, 2.0, CCM, 0.04",
    })
    void smallStepFollowsTheLinearizedModel(String scheme, double ioutA, ConductionMode mode, double durationS) {
        StageSpec stage = AveragedTestStages.busConverter();
        ControlSpec control = scheme.equals("voltage") ? AveragedTestStages.voltageMode()
                : AveragedTestStages.currentMode();
        AveragedFlybackModel model = new AveragedFlybackModel(stage, control);
        Equilibrium e = model.regulatedEquilibrium(48, ioutA);
        assertEquals(mode, e.mode());
        double u0 = e.inputs().control();
        double du = 0.01 * u0;
        int intervals = 2000;
        Transient tr = model.simulate(model.controlStep(e, u0 + du, 0), durationS, intervals);

        StateSpace lin = model.linearize(e).toStateSpace();
        double[] times = tr.timeS();
        double[] unit = lin.stepResponse(times, 0, AveragedInputs.CONTROL);
        double[] vout = tr.voutV();
        double peakLinear = 0;
        double peakNonlinear = 0;
        for (int k = 0; k < times.length; k++) {
            peakLinear = Math.max(peakLinear, Math.abs(du * unit[k]));
            peakNonlinear = Math.max(peakNonlinear, Math.abs(vout[k] - e.voutV()));
        }
        double finalLinear = du * unit[times.length - 1];
        double finalNonlinear = vout[times.length - 1] - e.voutV();
        assertEquals(finalLinear, finalNonlinear, 0.02 * Math.abs(finalLinear), "final deviation, V");
        assertEquals(peakLinear, peakNonlinear, 0.02 * peakLinear, "peak deviation, V");
    }
}
