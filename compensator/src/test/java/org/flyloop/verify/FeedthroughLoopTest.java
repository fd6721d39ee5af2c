package org.flyloop.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.flyloop.design.DesignResult;
import org.flyloop.design.Designer;
import org.flyloop.network.ShuntOptoNetwork;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.junit.jupiter.api.Test;

/**
 * A compensator with direct feedthrough and a feedback gain other than one: a shunt-regulator and
 * optocoupler network whose feedback pin has no capacitance, so Gc = K·(1 + s/ωz)/s stays flat at
 * high frequency, driving a current-mode controller that divides its feedback pin by 3. The
 * output voltage then depends on itself within one instant (through the ESR and the duty), which
 * the simulation solves as an algebraic loop.
 */
class FeedthroughLoopTest {

    private static final double VIN = 48;

    private static ClosedLoopAveragedSimulation bareOptoLoop(ControlSpec control) {
        DesignResult d = Designer.design(VerifyCases.request(VerifyCases.twelveVoltStage(), control,
                VerifyCases.shuntOpto(20e3)));
        ShuntOptoNetwork n = (ShuntOptoNetwork) d.rounded();
        ShuntOptoNetwork bare = new ShuntOptoNetwork(n.rUpper(), n.rLower(), n.rZero(), n.cZero(), n.rLed(), n.rBias(),
                n.ctr(), n.rPullup(), 0, 0, n.rLedDynamic());
        return new ClosedLoopAveragedSimulation(d.request().stage(), control, bare, control.fbGain());
    }

    @Test
    void feedthroughIsTheMidBandGainOfTheNetwork() {
        ControlSpec control = new ControlSpec(ControlScheme.CURRENT, Double.NaN, 0.25, 40e3, 0.7, 1.0 / 3);
        ClosedLoopAveragedSimulation sim = bareOptoLoop(control);
        ShuntOptoNetwork n = (ShuntOptoNetwork) sim.network();
        // Gc(s → ∞) = CTR·r_pullup/(R_e·r_upper)·(r_upper + r_zero), from the network's nodal
        // derivation (ideal shunt regulator, ideal LED, no pin capacitance), written out here.
        double expected = n.ctr() * n.rPullup() * (n.rUpper() + n.rZero()) / (n.rLed() * n.rUpper());
        assertEquals(expected, sim.compensator().feedthrough(), 1e-9 * expected);
    }

    @Test
    void loadStepAgreesWithTheLinearPrediction() {
        ControlSpec control = new ControlSpec(ControlScheme.CURRENT, Double.NaN, 0.25, 40e3, 0.7, 1.0 / 3);
        ClosedLoopAveragedSimulation sim = bareOptoLoop(control);
        assertTrue(sim.compensator().feedthrough() > 0);
        for (double step : new double[] {0.01, 0.1}) {
            LoadStepComparison c = LoadStepComparison.run(sim, VIN, 2.7, 2.7 + step * 3, LinearStageModel.AVERAGED);
            System.out.printf(Locale.ROOT, "shunt-opto with feedthrough, k_fb = 1/3, %.0f %% step: peak lin %.5g V "
                            + "avg %.5g V (%+.2f %%), settling to 10 %% of peak %+.2f %%%n", 100 * step,
                    c.linear().peakDeviationV(), c.averaged().peakDeviationV(), 100 * c.peakDifference(),
                    100 * c.peakBandSettlingDifference());
            assertTrue(!c.simulation().everClamped());
            // Same tolerances as the op-amp loops: 5 % at a 10 % step, 0.5 % in the small-step limit.
            double tol = step < 0.05 ? 0.005 : 0.05;
            assertTrue(Math.abs(c.peakDifference()) < tol, "peak " + c.peakDifference());
            assertTrue(Math.abs(c.peakBandSettlingDifference()) < tol, "settling " + c.peakBandSettlingDifference());
        }
    }
}
