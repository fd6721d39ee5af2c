package org.flyloop.stage.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.OperatingPoint;
import org.junit.jupiter.api.Test;

class VoltageModeDcmTest {

    // Invented 300 V → 12 V / 0.3 A light-load point, N = 8, Lm = 700 µH, 65 kHz: deep DCM.
    private final StageSpec s = StageCases.stage(300, 12, 0.3, 65e3, 700e-6, 8, 1000e-6, 0, 0, 0);
    private final ControlSpec vm = ControlSpec.voltageMode(2.5, 0.75);

    @Test
    void lowFrequencyPartIsTheReducedOrderModel() {
        OperatingPoint op = StageCases.dcm(s, 300, 0.3);
        TransferFunction gvd = AnalyticStageModel.at(s, vm, op).duty();
        // Erickson & Maksimović 2001, ch. 11 (DCM averaged switch model, buck-boost):
        // Gvd(0) = V/D and the low-frequency pole ωp = 2/(R·C).
        assertEquals(12 / op.duty(), gvd.gain(), 1e-6 * 12 / op.duty());
        double wp = 2 / (40 * 1000e-6);
        Root low = gvd.poles().stream().min((x, y) -> Double.compare(x.omega0(), y.omega0())).orElseThrow();
        assertEquals(wp, low.omega0(), 0.01 * wp);
    }

    @Test
    void highFrequencyPoleAndRhpZeroOfTheFullOrderModel() {
        OperatingPoint op = StageCases.dcm(s, 300, 0.3);
        TransferFunction gvd = AnalyticStageModel.at(s, vm, op).duty();
        // Sun, Mitchell, Greuel, Krein, Bass, IEEE Trans. PE 16(4) 2001: second pole near
        // 2·fsw/D2 and RHP zero near 2·fsw/D, both in rad/s.
        double w2 = 2 * 65e3 / op.duty2();
        double wz = 2 * 65e3 / op.duty();
        Root high = gvd.poles().stream().max((x, y) -> Double.compare(x.omega0(), y.omega0())).orElseThrow();
        assertEquals(w2, high.omega0(), 0.02 * w2);
        Root rhp = gvd.zeros().stream().filter(Root::isRightHalfPlane).findFirst().orElseThrow();
        assertEquals(wz, rhp.omega0(), 0.02 * wz);
    }

    @Test
    void onePoleModelIsNotEnoughAtATenthOfFsw() {
        // A DCM point at 80 % of the boundary load (5.6 A): D2 large, so the second pole comes down.
        StageSpec heavy = StageCases.stage(120, 12, 4.5, 100e3, 150e-6, 6, 470e-6, 0, 0, 0);
        OperatingPoint op = StageCases.dcm(heavy, 120, 4.5);
        TransferFunction full = AnalyticStageModel.at(heavy, vm, op).duty();
        double r = op.loadResistance();
        TransferFunction onePole = TransferFunction.of(12 / op.duty(), 0, java.util.List.of(),
                java.util.List.of(Root.real(-2 / (r * 470e-6))));
        double f = heavy.fswHz() / 10;
        double diff = Math.abs(full.phaseDeg(f) - onePole.phaseDeg(f));
        assertTrue(diff > 10, "full-order vs one-pole phase difference at fsw/10 = " + diff + "°");
    }

    @Test
    void dcmModelHasNoCcmRhpZeroReported() {
        StageTransferFunctions m = AnalyticStageModel.at(s, vm, StageCases.dcm(s, 300, 0.3));
        assertTrue(Double.isNaN(m.rhpZeroHz()));
        assertTrue(m.features().stream().anyMatch(p -> p.label().equals("DCM high-frequency pole")));
    }
}
