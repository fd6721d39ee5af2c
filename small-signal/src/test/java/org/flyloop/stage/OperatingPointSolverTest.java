package org.flyloop.stage;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;
import org.junit.jupiter.api.Test;

/**
 * Closed-form operating points against published conversion ratios and the CCM/DCM criterion,
 * with continuity and energy checks. References:
 * <ul>
 *   <li>[EM] R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd ed., 2001:
 *       flyback CCM ratio M = D/(n·(1 − D)) (Sec. 6.3.4), DCM buck-boost ratio M = D/√K with
 *       K = 2L/(R·Ts) and the boundary K = Kcrit = (1 − D)² (Ch. 5, Table 5.2).</li>
 * </ul>
 * The flyback is the buck-boost with the load referred to the primary, R′ = N²·R; with that
 * substitution Vout = Vin·D·√(R·Ts/(2·Lm)), independent of N.
 */
class OperatingPointSolverTest {

    private static final double TIGHT = 1e-9;

    private static StageSpec idealWithTurns(double turns) {
        return new StageSpec(ValueRange.between(18, 36), 12, ValueRange.between(0.1, 3), 100e3,
                100e-6, turns, 100e-6, 0, 0, 0);
    }

    private static OperatingPointSolver solver(StageSpec stage) {
        return new OperatingPointSolver(stage, ExampleStages.voltageMode(0.95));
    }

    @Test
    void ccmRatioMatchesFlybackFormula() {
        for (double turns : new double[] {0.5, 1, 2.5}) {
            StageSpec stage = idealWithTurns(turns);
            for (double vin : new double[] {18, 24, 36}) {
                OperatingPoint op = solver(stage).solve(vin, 3);
                assertEquals(ConductionMode.CCM, op.mode(), "3 A is well above the boundary");
                // [EM] Sec. 6.3.4: Vout = (Vin/N)·D/(1 − D).
                double expected = vin / turns * op.duty() / (1 - op.duty());
                assertEquals(expected, 12, 12 * TIGHT, "N=" + turns + ", vin=" + vin);
            }
        }
    }

    @Test
    void dcmRatioMatchesBuckBoostFormulaAndIgnoresTurns() {
        for (double vin : new double[] {18, 24, 36}) {
            for (double iout : new double[] {0.1, 0.2}) {
                double dutyAtN1 = Double.NaN;
                for (double turns : new double[] {1, 3}) {
                    StageSpec stage = idealWithTurns(turns);
                    OperatingPoint op = solver(stage).solve(vin, iout);
                    assertEquals(ConductionMode.DCM, op.mode());
                    double r = 12 / iout;
                    // [EM] Table 5.2, M = D/√K with R′ = N²R: Vout = Vin·D·√(R·Ts/(2·Lm)).
                    double expected = vin * op.duty() * Math.sqrt(r * stage.periodS() / (2 * stage.lm()));
                    assertEquals(expected, 12, 12 * TIGHT, "N=" + turns);
                    if (Double.isNaN(dutyAtN1)) {
                        dutyAtN1 = op.duty();
                    } else {
                        assertEquals(dutyAtN1, op.duty(), TIGHT, "DCM duty does not depend on N");
                    }
                }
            }
        }
    }

    @Test
    void modeFollowsCriticalK() {
        StageSpec stage = idealWithTurns(2);
        for (double vin : new double[] {18, 27, 36}) {
            double vr = stage.turns() * stage.vout();
            double dCcm = vr / (vin + vr);
            for (double iout = 0.1; iout <= 3; iout += 0.05) {
                double rPrimary = stage.turns() * stage.turns() * stage.vout() / iout;
                double k = 2 * stage.lm() / (rPrimary * stage.periodS());
                double kCrit = (1 - dCcm) * (1 - dCcm); // [EM] Table 5.2, buck-boost
                OperatingPoint op = solver(stage).solve(vin, iout);
                if (op.mode() == ConductionMode.BOUNDARY) {
                    assertEquals(kCrit, k, 0.0101 * kCrit, "boundary label only within 1 % of the load");
                } else {
                    assertEquals(k > kCrit ? ConductionMode.CCM : ConductionMode.DCM, op.mode(),
                            "vin=" + vin + ", iout=" + iout + ", K=" + k + ", Kcrit=" + kCrit);
                }
            }
        }
    }

    @Test
    void boundaryLoadMatchesCriticalK() {
        StageSpec stage = idealWithTurns(2);
        for (double vin : new double[] {18, 24, 36}) {
            double vr = stage.turns() * stage.vout();
            double d = vr / (vin + vr);
            // [EM] Table 5.2: K = Kcrit ⇔ 2·Lm/(N²·R·Ts) = (1 − D)², so Rb = 2·Lm/(N²·Ts·(1 − D)²).
            double rb = 2 * stage.lm() / (stage.turns() * stage.turns() * stage.periodS() * (1 - d) * (1 - d));
            assertEquals(stage.vout() / rb, solver(stage).boundaryLoad(vin), stage.vout() / rb * TIGHT);
        }
    }

    @Test
    void ccmAndDcmFormulasAgreeAtTheBoundaryWithLosses() {
        for (StageSpec stage : ExampleStages.all()) {
            OperatingPointSolver solver = solver(stage);
            for (double vin : stage.vin().corners()) {
                double ib = solver.boundaryLoad(vin);
                double ccm = solver.ccmDuty(vin, ib);
                double dcm = solver.dcmDuty(vin, ib);
                assertEquals(ccm, dcm, 1e-9, "continuity at the boundary, vin=" + vin);
                assertEquals(ConductionMode.CCM, solver.solve(vin, ib * 1.02).mode());
                assertTrue(solver.solve(vin, ib * 1.02).ivalley() > 0);
                assertEquals(ConductionMode.DCM, solver.solve(vin, ib * 0.98).mode());
                assertEquals(ConductionMode.BOUNDARY, solver.solve(vin, ib * 1.005).mode());
                assertEquals(ConductionMode.BOUNDARY, solver.solve(vin, ib * 0.995).mode());
            }
        }
    }

    @Test
    void dcmEnergyPerCycleIsOutputPower() {
        StageSpec stage = ExampleStages.ideal();
        for (double vin : stage.vin().corners()) {
            OperatingPoint op = solver(stage).solve(vin, 0.1);
            assertEquals(ConductionMode.DCM, op.mode());
            // Energy ½·Lm·Ipk² stored each period, all delivered to the load (ideal parts).
            double energyRate = 0.5 * stage.lm() * op.ipk() * op.ipk() * stage.fswHz();
            assertEquals(op.vout() * op.iout(), energyRate, op.vout() * op.iout() * TIGHT);
        }
    }

    /**
     * Input power = output + rectifier loss Vf·Iout + switch loss. The switch loss is the one the
     * model carries: Rds times the on-interval average current times the average switch current,
     * Rds·D·Ion² with Ion = (ipk + ivalley)/2. It is below the true Rds·Irms² by Rds·D·ΔI²/12.
     */
    @Test
    void inputPowerIsOutputPlusModelledLosses() {
        for (StageSpec stage : ExampleStages.all()) {
            for (OperatingPoint op : solver(stage).corners()) {
                double ion = (op.ipk() + op.ivalley()) / 2;
                double losses = stage.rectifierDrop() * op.iout() + stage.switchResistance() * op.duty() * ion * ion;
                double pin = op.vin() * op.iinAvg();
                assertEquals(pin, op.vout() * op.iout() + losses, pin * 1e-6, op.toString());
            }
        }
    }

    @Test
    void reportedQuantitiesHangTogether() {
        for (StageSpec stage : ExampleStages.all()) {
            for (OperatingPoint op : solver(stage).corners()) {
                double n = stage.turns();
                double vr = n * (stage.vout() + stage.rectifierDrop());
                assertAll(op.toString(),
                        () -> assertEquals(1, op.duty() + op.duty2() + op.duty3(), TIGHT),
                        () -> assertEquals(n * op.ipk(), op.isecPk(), TIGHT),
                        () -> assertEquals(op.vin() + vr, op.vswMax(), TIGHT),
                        // charge balance: average rectifier current is the load current
                        () -> assertEquals(op.iout(), n * op.duty2() * (op.ipk() + op.ivalley()) / 2, op.iout() * TIGHT),
                        // volt-second balance on the demagnetizing side: ΔI = D2·Vr·Ts/Lm
                        () -> assertEquals(op.ipk() - op.ivalley(), op.duty2() * vr * stage.periodS() / stage.lm(),
                                op.ipk() * TIGHT),
                        () -> assertEquals(solver(stage).boundaryLoad(op.vin()), op.ioutBoundary(), 0));
            }
        }
    }

    @Test
    void cornersRunVinAscendingThenIoutAscending() {
        List<OperatingPoint> corners = solver(ExampleStages.offlineAdapter()).corners();
        double[][] expected = {{120, 0.2}, {120, 2}, {325, 0.2}, {325, 2}, {375, 0.2}, {375, 2}};
        assertEquals(expected.length, corners.size());
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i][0], corners.get(i).vin());
            assertEquals(expected[i][1], corners.get(i).iout());
        }
    }
}
