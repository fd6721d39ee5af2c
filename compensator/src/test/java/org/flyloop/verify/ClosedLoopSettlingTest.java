package org.flyloop.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flyloop.averaged.AveragedFlybackModel;
import org.flyloop.averaged.Equilibrium;
import org.flyloop.design.DesignResult;
import org.flyloop.design.Designer;
import org.flyloop.spec.ControlSpec;
import org.flyloop.stage.ConductionMode;
import org.junit.jupiter.api.Test;

/**
 * Large steps, where no linear model applies: with an integrating compensator the loop must come
 * to rest at the averaged stage's regulated equilibrium for the new load. The reference is that
 * equilibrium found directly (Newton on the averaged equations inside Brent's method on the
 * control input, {@link AveragedFlybackModel#regulatedEquilibrium}), not by integrating in time.
 * The steps cross from DCM to CCM and, in the last case, drive the duty into its limit.
 */
class ClosedLoopSettlingTest {

    private static final double WINDOW_S = 0.04;

    /** Asserts the end of {@code run} is the regulated equilibrium at the new load. */
    private static void assertSettlesToEquilibrium(ClosedLoopAveragedSimulation sim, ClosedLoopTransient run,
                                                   double vinV, double ioutFromA, double ioutToA) {
        AveragedFlybackModel model = sim.averagedModel();
        Equilibrium target = model.regulatedEquilibrium(vinV, model.loadResistanceFor(ioutFromA), ioutToA - ioutFromA);
        ClosedLoopSample last = run.samples().get(run.samples().size() - 1);
        // 1e-5 of Vout and of the control input: the slowest closed-loop pole has decayed by far more
        // than that after 40 ms, and the equilibrium solve is converged to 1e-14.
        assertEquals(target.voutV(), last.voutV(), 1e-5 * target.voutV());
        assertEquals(target.inputs().control(), last.controlInput(), 1e-5 * target.inputs().control());
        assertEquals(target.imAvgPrimaryA(), last.imA(), 1e-4 * target.imAvgPrimaryA());
        assertEquals(target.mode(), last.mode());
    }

    @Test
    void voltageModeStepFromDcmIntoCcmSettlesAtTheRegulatedPoint() {
        DesignResult d = Designer.design(VerifyCases.request(VerifyCases.ccmStage(), VerifyCases.voltageMode(),
                VerifyCases.opamp()));
        ClosedLoopAveragedSimulation sim = ClosedLoopAveragedSimulation.of(d);
        ClosedLoopTransient run = sim.loadStep(48, 1.5, 10, WINDOW_S, 2000);
        assertEquals(ConductionMode.DCM, run.samples().get(0).mode());
        assertEquals(1, run.modeChanges().size(), run.modeChanges().toString());
        assertEquals(ConductionMode.CCM, run.modeChanges().get(0).to());
        assertFalse(run.everClamped());
        assertSettlesToEquilibrium(sim, run, 48, 1.5, 10);
    }

    @Test
    void currentModeStepFromDcmIntoCcmSettlesAtTheRegulatedPoint() {
        DesignResult d = Designer.design(VerifyCases.request(VerifyCases.ccmStage(), VerifyCases.currentMode(),
                VerifyCases.opamp(), 3e3));
        ClosedLoopAveragedSimulation sim = ClosedLoopAveragedSimulation.of(d);
        ClosedLoopTransient run = sim.loadStep(48, 1.5, 10, WINDOW_S, 2000);
        assertEquals(1, run.modeChanges().size(), run.modeChanges().toString());
        assertSettlesToEquilibrium(sim, run, 48, 1.5, 10);
    }

    @Test
    void dutyLimitHoldsDuringTheStepAndTheLoopStillSettles() {
        // Duty limit 0.36 just above the 0.34 the full load needs at 36 V, and three times the
        // designed feedback gain so the transient asks for more than the limit.
        ControlSpec control = ControlSpec.voltageMode(1.8, 0.36);
        DesignResult d = Designer.design(VerifyCases.request(VerifyCases.ccmStage(), control, VerifyCases.opamp()));
        ClosedLoopAveragedSimulation sim = new ClosedLoopAveragedSimulation(d.request().stage(), control, d.rounded(),
                3 * control.fbGain());
        ClosedLoopTransient run = sim.loadStep(36, 2, 10, WINDOW_S, 2000);
        assertTrue(run.clampEvents() >= 2, "the duty limit was reached and left: " + run.clampEvents());
        assertTrue(run.everClamped());
        double highest = 0;
        for (ClosedLoopSample s : run.samples()) {
            highest = Math.max(highest, s.duty());
            assertTrue(s.duty() <= control.dutyMax() + 1e-15, "duty " + s.duty() + " at " + s.timeS());
            assertEquals(s.controlInput(), s.duty(), 1e-15, "in voltage mode the control input is the duty");
        }
        assertEquals(control.dutyMax(), highest, 1e-12, "some sample sits on the limit");
        assertSettlesToEquilibrium(sim, run, 36, 2, 10);
    }
}
