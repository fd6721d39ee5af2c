package org.flyloop.switching;

import org.flyloop.spec.StageSpec;
import org.flyloop.stage.*;
import org.junit.jupiter.api.Test;

class ScratchTest {
    @Test
    void print() {
        StageSpec[] stages = {ExampleStages.offlineAdapter(), ExampleStages.telecomBrick(), ExampleStages.auxiliaryRail(),
            ExampleStages.standbySupply(), ExampleStages.notebookAdapter(), ExampleStages.ideal()};
        for (StageSpec s : stages) {
            OperatingPointSolver solver = new OperatingPointSolver(s, ExampleStages.voltageMode(0.9));
            for (OperatingPoint op : solver.corners()) {
                long t0 = System.nanoTime();
                SwitchingSimulator sim = new SwitchingSimulator(s, ExampleStages.voltageMode(0.9), op.vin(), op.loadResistance());
                SteadyState ss = sim.runToSteadyState(op.duty());
                long t1 = System.nanoTime();
                System.out.printf("%s vin=%.0f iout=%.2f D=%.4f mode=%s | sim mode=%s vout err=%.4f%% ipk err=%.4f%% rmsSw %.3f%% rmsRect %.3f%% cycles=%d change=%.1e res=%.2e mult=%.4f %.1f ms%n",
                    s.vout(), op.vin(), op.iout(), op.duty(), op.mode(), ss.mode(),
                    100*(ss.voutAvgV()/op.vout()-1), 100*(ss.ipkA()/op.ipk()-1),
                    100*(ss.switchRmsA()/op.iswRms()-1), 100*(ss.rectifierRmsA()/op.irectRms()-1),
                    ss.cyclesSimulated(), ss.lastCycleChange(), ss.power().residualW()/ss.power().inputW(), ss.largestMultiplierMagnitude(), (t1-t0)/1e6);
            }
        }
    }
}
