package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;
import org.junit.jupiter.api.Test;

/**
 * Large-signal scenarios end where the equilibrium solver (Newton on the same equations) says they
 * must: integration and root finding are different paths to the same steady state, so agreement
 * within 0.1 % checks both. The time-series record is checked for its documented content.
 */
class ScenarioTest {

    private final StageSpec stage = AveragedTestStages.busConverter();
    private final AveragedFlybackModel model = new AveragedFlybackModel(stage, AveragedTestStages.voltageMode());

    @Test
    void startUpFromZeroSettlesAtTheEquilibrium() {
        Equilibrium target = model.regulatedEquilibrium(48, 2);
        Transient tr = model.simulate(model.startUp(48, 2, target.duty()), 0.05, 500);
        TransientSample first = tr.samples().get(0);
        assertEquals(0, first.timeS());
        assertEquals(0, first.voutV(), 1e-12);
        assertEquals(0, first.imA(), 1e-12);
        assertEquals(501, tr.samples().size());
        assertEquals(0.05, tr.last().timeS(), 1e-15);
        assertEquals(target.voutV(), tr.last().voutV(), 1e-3 * target.voutV());
        assertEquals(target.imAvgPrimaryA(), tr.last().imA(), 1e-3 * target.imAvgPrimaryA());
        assertEquals(ConductionMode.CCM, tr.last().mode());
        // The first cycles have no output voltage to demagnetize against: the model must pass
        // through CCM at least once on the way up.
        assertFalse(tr.modeChanges().isEmpty());
    }

    @Test
    void currentModeStartUpSettlesAtTheEquilibrium() {
        AveragedFlybackModel cm = new AveragedFlybackModel(stage, AveragedTestStages.currentMode());
        Equilibrium target = cm.regulatedEquilibrium(48, 2);
        Transient tr = cm.simulate(cm.startUp(48, 2, target.inputs().control()), 0.04, 200);
        assertEquals(target.voutV(), tr.last().voutV(), 1e-3 * target.voutV());
        assertEquals(target.duty(), tr.last().duty(), 1e-3 * target.duty());
    }

    @Test
    void loadStepEndsAtTheEquilibriumOfTheNewLoad() {
        Scenario s = model.loadStep(48, 0.5, 2, 0.001);
        assertEquals(12 / 0.5, s.loadResistanceOhm(), 1e-12);
        Transient tr = model.simulate(s, 0.05, 500);
        Equilibrium after = model.equilibrium(s.inputs().at(1), s.loadResistanceOhm());
        assertEquals(after.voutV(), tr.last().voutV(), 1e-3 * after.voutV());
        assertEquals(12, tr.samples().get(0).voutV(), 1e-6, "starts regulated at the first load");
        // 0.5 A is DCM at 48 V, 2 A is CCM.
        assertEquals(ConductionMode.DCM, tr.samples().get(0).mode());
        assertEquals(ConductionMode.CCM, tr.last().mode());
    }

    @Test
    void lineStepEndsAtTheEquilibriumOfTheNewLine() {
        Scenario s = model.lineStep(48, 60, 1, 0.001);
        Transient tr = model.simulate(s, 0.05, 500);
        Equilibrium after = model.equilibrium(s.inputs().at(1), s.loadResistanceOhm());
        assertEquals(after.voutV(), tr.last().voutV(), 1e-3 * after.voutV());
        assertTrue(after.voutV() > 12.5, "open loop: the output follows the line up");
    }

    @Test
    void csvHasTheDocumentedColumns() {
        Transient tr = model.simulate(model.lineStep(48, 60, 1, 0.001), 0.002, 4);
        String[] lines = tr.toCsv().split("\n");
        assertEquals("time_s,vout_v,im_a,vc_v,control,d,d2,mode", lines[0]);
        assertEquals(6, lines.length);
        assertEquals(8, lines[1].split(",").length);
    }
}
