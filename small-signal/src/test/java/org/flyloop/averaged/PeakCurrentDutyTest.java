package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;
import org.junit.jupiter.api.Test;

/**
 * The peak-current duty solve away from equilibrium (where the blend matters): it satisfies the
 * published averaged relations in each mode and is continuous across the CCM/DCM boundary.
 */
class PeakCurrentDutyTest {

    private static final StageSpec STAGE = AveragedTestStages.busConverter();
    private static final ControlSpec CONTROL = AveragedTestStages.currentMode();
    private static final double VIN = 48;
    private static final double VC = 0.8;
    /** Capacitor voltage held below its equilibrium so that the off-equilibrium term is large. */
    private static final double VCAP = 9;

    private final AveragedFlybackCircuit circuit = new AveragedFlybackModel(STAGE, CONTROL).circuit(12);

    private SwitchCycle at(double iL) {
        return circuit.cycle(new double[] {iL, VCAP}, new AveragedInputs(VC, VIN, 0));
    }

    @Test
    void deepCcmDutySatisfiesTheMoreAccurateAveragedRelation() {
        // Erickson & Maksimović 2001, §12.3: ⟨iL⟩ = ic − ma·d·Ts − m1·d²·Ts/2 − m2·d′²·Ts/2 with
        // ic = N·vc/Ri, ma = N·Se/Ri, m1 = v_on/Ls, m2 = (v_o + Vf)/Ls (secondary-referred).
        double iL = 2.0;
        SwitchCycle c = at(iL);
        assertEquals(ConductionMode.CCM, c.mode());
        double n = STAGE.turns();
        double ts = STAGE.periodS();
        double ls = STAGE.secondaryInductance();
        double d = c.duty();
        double ic = n * VC / CONTROL.senseVPerA();
        double ma = n * CONTROL.slopeVPerS() / CONTROL.senseVPerA();
        double m1 = c.onVoltageV() / ls;
        double m2 = (c.outputVoltageV() + STAGE.rectifierDrop()) / ls;
        double average = ic - ma * d * ts - m1 * d * d * ts / 2 - m2 * (1 - d) * (1 - d) * ts / 2;
        assertEquals(iL, average, 1e-9 * iL);
        // Off equilibrium: the waveform is not volt-second balanced, so the relation differs from
        // the equilibrium form i_pk = iL + m1·d·Ts/2 by a visible amount.
        double equilibriumForm = iL + m1 * d * ts / 2;
        assertTrue(Math.abs(equilibriumForm - c.peakCurrentA()) > 0.05, "off-equilibrium term is exercised");
    }

    @Test
    void dcmDutyComesFromThePeakAlone() {
        // DCM: each cycle starts at zero, so i_pk = v_on·d·Ts/Ls = N·(vc − Se·d·Ts)/Ri, whatever iL
        // (Erickson & Maksimović 2001, §12.4: in DCM the peak is set by the controller alone).
        SwitchCycle a = at(1.0);
        SwitchCycle b = at(1.2);
        assertEquals(ConductionMode.DCM, a.mode());
        assertEquals(ConductionMode.DCM, b.mode());
        assertEquals(a.duty(), b.duty(), 1e-12);
        assertTrue(a.duty2() > 0 && b.duty2() > a.duty2(), "the rectifier conducts, longer at the higher current");
        assertEquals(a.duty(), at(0.2).duty(), 1e-12, "also when the rectifier idles (d2 = 0)");
        double n = STAGE.turns();
        double ts = STAGE.periodS();
        double commanded = n * (VC - CONTROL.slopeVPerS() * a.duty() * ts) / CONTROL.senseVPerA();
        assertEquals(commanded, a.onVoltageV() * a.duty() * ts / STAGE.secondaryInductance(), 1e-9 * commanded);
    }

    @Test
    void dutyIsContinuousAcrossTheModeBoundary() {
        // Lipschitz test: halving the grid spacing three times must shrink the largest neighbour-to-
        // neighbour change of d by about 8×; a jump would not shrink at all.
        double lo = 0.3;
        double hi = 1.6;
        assertEquals(ConductionMode.DCM, at(lo).mode());
        assertEquals(ConductionMode.CCM, at(hi).mode());
        double coarse = largestStep(lo, hi, 2000);
        double fine = largestStep(lo, hi, 16000);
        assertTrue(coarse > 0);
        assertTrue(fine < coarse / 4, "largest change of d: " + coarse + " at 2000 points, " + fine + " at 16000");
    }

    private double largestStep(double lo, double hi, int points) {
        double worst = 0;
        double prev = at(lo).duty();
        for (int k = 1; k <= points; k++) {
            double d = at(lo + (hi - lo) * k / points).duty();
            worst = Math.max(worst, Math.abs(d - prev));
            prev = d;
        }
        return worst;
    }
}
