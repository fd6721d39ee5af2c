package org.flyloop.stage.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.OperatingPointSolver;
import org.flyloop.switching.SwitchingSimulator;
import org.junit.jupiter.api.Test;

/**
 * The current-mode DC gain against the cycle-by-cycle switching simulation (an independent method:
 * the piecewise circuit integrated with events at the comparator trip and the rectifier turn-off),
 * with rectifier drop, switch resistance and ESR present. The simulated control voltage is
 * perturbed by ±0.1 % and the cycle-averaged output differentiated.
 */
class CurrentModeSimulationTest {

    private void check(StageSpec s, double vin, double iout, ControlSpec cm, double tolerance) {
        OperatingPoint op = new OperatingPointSolver(s, cm).solve(vin, iout);
        StageTransferFunctions m = AnalyticStageModel.at(s, cm, op);
        double vc = cm.senseVPerA() * op.ipk() + cm.slopeVPerS() * op.duty() * s.periodS();
        SwitchingSimulator sim = new SwitchingSimulator(s, cm, vin, op.loadResistance());
        double h = 1e-3 * vc;
        double up = sim.runToSteadyState(vc + h).voutAvgV();
        double down = sim.runToSteadyState(vc - h).voutAvgV();
        double simulated = (up - down) / (2 * h);
        assertEquals(simulated, m.control().gain(), tolerance * simulated,
                op.mode() + " at vin=" + vin + " iout=" + iout);
    }

    @Test
    void ccmWithLossesAndRamp() {
        StageSpec s = StageCases.stage(150, 12, 3, 80e3, 500e-6, 6, 680e-6, 30e-3, 0.45, 0.4);
        check(s, 150, 3, ControlSpec.currentMode(0.3, 30e3, 0.75), 0.01);
    }

    @Test
    void ccmIdealWithoutRamp() {
        StageSpec s = StageCases.stage(100, 12, 2, 100e3, 400e-6, 4, 1000e-6, 0, 0, 0);
        check(s, 100, 2, ControlSpec.currentMode(0.5, 0, 0.75), 0.005);
    }

    @Test
    void dcmWithLossesAndRamp() {
        StageSpec s = StageCases.stage(150, 12, 3, 80e3, 500e-6, 6, 680e-6, 30e-3, 0.45, 0.4);
        check(s, 150, 0.3, ControlSpec.currentMode(0.3, 30e3, 0.75), 0.01);
    }
}
