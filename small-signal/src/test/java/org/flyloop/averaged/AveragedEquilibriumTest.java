package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;
import org.flyloop.stage.ExampleStages;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.OperatingPointSolver;
import org.junit.jupiter.api.Test;

/** DC solutions of the averaged model against published conversion ratios and the operating-point solver. */
class AveragedEquilibriumTest {

    @Test
    void losslessCcmFollowsTheFlybackConversionRatio() {
        // Flyback in CCM: V = (Vin/N)·D/(1 − D), iL,sec = I/(1 − D)
        // (R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd ed., 2001, §6.3.4).
        StageSpec stage = AveragedTestStages.lossless();
        AveragedFlybackModel model = new AveragedFlybackModel(stage, AveragedTestStages.voltageMode());
        double d = 0.4;
        double r = 6;
        Equilibrium e = model.equilibrium(new AveragedInputs(d, 48, 0), r);
        double v = 48 / 2.0 * d / (1 - d);
        assertEquals(ConductionMode.CCM, e.mode());
        assertEquals(v, e.voutV(), 1e-9 * v);
        assertEquals(v / r / (1 - d), e.ilSecondaryA(), 1e-9 * v / r);
        assertEquals(1 - d, e.duty2(), 1e-12);
    }

    @Test
    void losslessDcmFollowsTheBuckBoostDcmConversionRatio() {
        // Buck-boost in DCM: |M| = D/√K with K = 2L/(R·Ts) (Erickson & Maksimović 2001, Table 5.2),
        // applied on the secondary side: Vg′ = Vin/N, L = Lm/N²; D2 = D·Vg′/V (volt-second balance).
        StageSpec stage = AveragedTestStages.lossless();
        AveragedFlybackModel model = new AveragedFlybackModel(stage, AveragedTestStages.voltageMode());
        double d = 0.15;
        double r = 120;
        Equilibrium e = model.equilibrium(new AveragedInputs(d, 48, 0), r);
        double k = 2 * stage.secondaryInductance() / (r * stage.periodS());
        double v = 24 * d / Math.sqrt(k);
        assertEquals(ConductionMode.DCM, e.mode());
        assertEquals(v, e.voutV(), 1e-9 * v);
        assertEquals(d * 24 / v, e.duty2(), 1e-9);
    }

    @Test
    void dcmWithRectifierDropDeliversTheStoredEnergy() {
        // Energy conservation in a DCM flyback: each cycle stores ½·Ls·i_pk² (i_pk = Vg′·D·Ts/Ls)
        // and delivers all of it through the rectifier, ½·Ls·i_pk²·fsw = (V + Vf)·V/R — a
        // different route from the model's volt-second and charge balances — so
        // V = (−Vf/R + √(Vf²/R² + 4P/R))·R/2.
        StageSpec base = AveragedTestStages.lossless();
        StageSpec stage = new StageSpec(base.vin(), base.vout(), base.iout(), base.fswHz(), base.lm(), base.turns(),
                base.cout(), 0, 0.7, 0);
        AveragedFlybackModel model = new AveragedFlybackModel(stage, AveragedTestStages.voltageMode());
        double d = 0.2;
        double r = 100;
        Equilibrium e = model.equilibrium(new AveragedInputs(d, 48, 0), r);
        double ipk = 24 * d * stage.periodS() / stage.secondaryInductance();
        double p = 0.5 * stage.secondaryInductance() * ipk * ipk * stage.fswHz();
        double g = 1 / r;
        double v = (-0.7 * g + Math.sqrt(0.49 * g * g + 4 * g * p)) / (2 * g);
        assertEquals(ConductionMode.DCM, e.mode());
        assertEquals(v, e.voutV(), 1e-9 * v);
    }

    @Test
    void agreesWithTheOperatingPointSolverInCcmAndDcm() {
        // Same loss approximations on both sides (Rds drop at the on-interval average current,
        // closed-form DCM peak): vout, duty and magnetizing current must agree within 0.1 %.
        int ccm = 0;
        int dcm = 0;
        for (StageSpec stage : ExampleStages.all()) {
            ControlSpec control = ControlSpec.voltageMode(1, 0.9);
            OperatingPointSolver ops = new OperatingPointSolver(stage, control);
            AveragedFlybackModel model = new AveragedFlybackModel(stage, control);
            for (OperatingPoint op : ops.corners()) {
                if (op.mode() == ConductionMode.BOUNDARY) {
                    continue;
                }
                Equilibrium atDuty = model.equilibrium(op.vin(), op.iout(), op.duty());
                String where = stage + " @ " + op.vin() + " V, " + op.iout() + " A";
                assertEquals(op.mode(), atDuty.mode(), where);
                assertEquals(op.vout(), atDuty.voutV(), 1e-3 * op.vout(), where);
                assertEquals(op.imAvg(), atDuty.imAvgPrimaryA(), 1e-3 * op.imAvg(), where);
                assertEquals(op.duty2(), atDuty.duty2(), 1e-3 * op.duty2(), where);
                Equilibrium regulated = model.regulatedEquilibrium(op.vin(), op.iout());
                assertEquals(op.duty(), regulated.duty(), 1e-3 * op.duty(), where);
                assertEquals(op.imAvg(), regulated.imAvgPrimaryA(), 1e-3 * op.imAvg(), where);
                if (op.mode() == ConductionMode.CCM) {
                    ccm++;
                } else {
                    dcm++;
                }
            }
        }
        assertTrue(ccm >= 3 && dcm >= 3, "both modes covered: " + ccm + " CCM, " + dcm + " DCM");
    }

    @Test
    void currentModeRegulatesToTheSameOperatingPoint() {
        // The duty that regulates Vout depends on the power stage only, not on how it is controlled.
        StageSpec stage = AveragedTestStages.busConverter();
        OperatingPointSolver ops = new OperatingPointSolver(stage, AveragedTestStages.currentMode());
        AveragedFlybackModel model = new AveragedFlybackModel(stage, AveragedTestStages.currentMode());
        for (double iout : List.of(2.0, 0.2)) {
            OperatingPoint op = ops.solve(48, iout);
            Equilibrium e = model.regulatedEquilibrium(48, iout);
            assertEquals(op.duty(), e.duty(), 1e-3 * op.duty());
            assertEquals(op.imAvg(), e.imAvgPrimaryA(), 1e-3 * op.imAvg());
            // Peak-current relation at equilibrium: N·(vc − Se·D·Ts)/Ri = i_pk (secondary-referred);
            // the peak from the operating-point solver is primary-referred.
            double vc = e.inputs().control();
            double commandedPrimary = (vc - 20e3 * e.duty() * stage.periodS()) / 0.5;
            assertEquals(op.ipk(), commandedPrimary, 1e-3 * op.ipk());
        }
    }
}
