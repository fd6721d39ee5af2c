package org.flyloop.stage.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.OperatingPoint;
import org.junit.jupiter.api.Test;

class CurrentModeTest {

    // Invented 100 V → 12 V / 2 A, N = 4, Lm = 400 µH, 1000 µF, 100 kHz; sense 0.5 V/A.
    private final StageSpec s = StageCases.stage(100, 12, 2, 100e3, 400e-6, 4, 1000e-6, 0, 0, 0);

    /**
     * Exact periodic steady state of the ideal CCM peak-current-mode cycle: the switch opens when
     * Ri·i + Se·t = vc; the period-average current of the triangular waveform is its mid value
     * i_pk − Vin·D·Ts/(2·Lm); volt-seconds give D = N·V/(Vin + N·V); charge balance
     * V/R = N·(1 − D)·i_avg. Solved for V by bracketing.
     */
    private double steadyStateVout(double vc, double ri, double se, double r) {
        double ts = s.periodS(), n = s.turns(), vin = 100, lm = s.lm();
        return new BrentSolver(1e-14).solve(500, v -> {
            double d = n * v / (vin + n * v);
            double ipk = (vc - se * d * ts) / ri;
            double iavg = ipk - vin * d * ts / (2 * lm);
            return n * (1 - d) * iavg - v / r;
        }, 0.1, 100);
    }

    private double controlVoltage(double ri, double se, OperatingPoint op) {
        double d = op.duty();
        return ri * op.ipk() + se * d * s.periodS();
    }

    @Test
    void dcGainEqualsThePerturbedExactSteadyState() {
        for (double se : new double[] {0, 20e3, 60e3}) {
            ControlSpec cm = ControlSpec.currentMode(0.5, se, 0.75);
            OperatingPoint op = StageCases.ccm(s, 100, 2);
            StageTransferFunctions m = AnalyticStageModel.at(s, cm, op);
            double vc = controlVoltage(0.5, se, op);
            assertEquals(12, steadyStateVout(vc, 0.5, se, 6), 1e-6, "operating point consistent");
            double h = 1e-4 * vc;
            double exact = (steadyStateVout(vc + h, 0.5, se, 6) - steadyStateVout(vc - h, 0.5, se, 6)) / (2 * h);
            assertEquals(exact, m.control().gain(), 1e-3 * exact, "Se = " + se);
        }
    }

    @Test
    void noRippleFormulaIsOnlyALimit() {
        ControlSpec cm = ControlSpec.currentMode(0.5, 0, 0.75);
        OperatingPoint op = StageCases.ccm(s, 100, 2);
        StageTransferFunctions m = AnalyticStageModel.at(s, cm, op);
        double d = op.duty(), r = 6;
        // Often-quoted no-ripple result: Gvc(0) = R·N·D′/(Ri·(1 + D)), pole (1 + D)/(R·C).
        double noRippleGain = r * 4 * (1 - d) / (0.5 * (1 + d));
        double noRipplePole = (1 + d) / (r * 1000e-6);
        double gainDiffDb = 20 * Math.log10(noRippleGain / m.control().gain());
        Root pole = m.control().poles().stream().filter(p -> !p.isPair()).findFirst().orElseThrow();
        assertTrue(gainDiffDb > 0.5, "no-ripple gain sits high by " + gainDiffDb + " dB");
        assertTrue(noRipplePole < 0.95 * pole.omega0(), "no-ripple pole sits low");
        // With a large inductance (small ripple) the two agree: the no-ripple formula is the limit.
        StageSpec big = StageCases.stage(100, 12, 2, 100e3, 400e-3, 4, 1000e-6, 0, 0, 0);
        OperatingPoint opBig = StageCases.ccm(big, 100, 2);
        StageTransferFunctions mBig = AnalyticStageModel.at(big, cm, opBig);
        assertEquals(noRippleGain, mBig.control().gain(), 1e-3 * noRippleGain);
        Root poleBig = mBig.control().poles().stream().filter(p -> !p.isPair())
                .min((x, y) -> Double.compare(x.omega0(), y.omega0())).orElseThrow();
        assertEquals(noRipplePole, poleBig.omega0(), 2e-3 * noRipplePole);
    }

    @Test
    void samplingPoleFollowsRidley() {
        double se = 20e3;
        ControlSpec cm = ControlSpec.currentMode(0.5, se, 0.75);
        OperatingPoint op = StageCases.ccm(s, 100, 2);
        StageTransferFunctions m = AnalyticStageModel.at(s, cm, op);
        // Ridley 1991: ωn = π·fsw, Qp = 1/(π·(mc·D′ − 0.5)), mc = 1 + Se/Sn, Sn = Ri·Vin/Lm.
        double sn = 0.5 * 100 / 400e-6;
        double mc = 1 + se / sn;
        double qp = 1 / (Math.PI * (mc * (1 - op.duty()) - 0.5));
        assertEquals(qp, m.qp(), 1e-12);
        Root pair = m.control().poles().stream().filter(Root::isPair).findFirst().orElseThrow();
        assertEquals(Math.PI * 100e3, pair.omega0(), 1e-6);
        assertEquals(qp, pair.q(), 1e-9);
        // slope for Qp = 1: mc·D′ = 0.5 + 1/π.
        double mc1 = (0.5 + 1 / Math.PI) / (1 - op.duty());
        assertEquals((mc1 - 1) * sn, m.slopeForUnityQpVPerS(), 1e-6);
        assertEquals(2, m.control().poles().size(), "output pole + sampling pair, current-loop pole replaced");
    }

    @Test
    void subharmonicRiskIsFlagged() {
        // D > 0.5 without slope compensation: mc·D′ < 0.5.
        StageSpec lowLine = StageCases.stage(30, 12, 2, 100e3, 400e-6, 4, 1000e-6, 0, 0, 0);
        OperatingPoint op = StageCases.ccm(lowLine, 30, 2);
        assertTrue(op.duty() > 0.5);
        StageTransferFunctions m = AnalyticStageModel.at(lowLine, ControlSpec.currentMode(0.5, 0, 0.75), op);
        assertFalse(m.warnings().isEmpty());
        assertTrue(m.control().rightHalfPlanePoleCount() == 2 || Double.isInfinite(m.qp()));
        StageTransferFunctions fixed = AnalyticStageModel.at(lowLine,
                ControlSpec.currentMode(0.5, m.slopeForUnityQpVPerS(), 0.75), op);
        assertEquals(1, fixed.qp(), 1e-9);
        assertTrue(fixed.warnings().isEmpty());
    }

    @Test
    void dcmDcGainFromPowerBalanceWithRampCorrection() {
        StageSpec light = StageCases.stage(300, 12, 0.3, 65e3, 700e-6, 8, 1000e-6, 0, 0, 0);
        OperatingPoint op = StageCases.dcm(light, 300, 0.3);
        double se = 20e3, ri = 0.5;
        TransferFunction gvc = AnalyticStageModel.at(light, ControlSpec.currentMode(ri, se, 0.75), op).control();
        // ½·Lm·Ipk²·fsw = V²/R with Ipk = Vc/(Ri·mc), mc = 1 + Se·Lm/(Ri·Vin)  ⇒  V ∝ Vc and
        // Gvc(0) = √(Lm·fsw·R/2)/(Ri·mc); output pole 2/(R·C).
        double mc = 1 + se * 700e-6 / (ri * 300);
        double expected = Math.sqrt(700e-6 * 65e3 * 40 / 2) / (ri * mc);
        assertEquals(expected, gvc.gain(), 1e-6 * expected);
        Root low = gvc.poles().stream().min((x, y) -> Double.compare(x.omega0(), y.omega0())).orElseThrow();
        assertEquals(2 / (40 * 1000e-6), low.omega0(), 0.01 * 2 / (40 * 1000e-6));
    }

    @Test
    void everyModelHasAContinuousPhaseFrom1HzToHalfFsw() {
        StageSpec lossy = StageCases.stage(150, 12, 3, 80e3, 500e-6, 6, 680e-6, 30e-3, 0.45, 0.4);
        OperatingPoint ccm = StageCases.ccm(lossy, 150, 3);
        OperatingPoint dcm = StageCases.dcm(lossy, 150, 0.2);
        for (ControlSpec c : new ControlSpec[] {ControlSpec.voltageMode(2, 0.75),
                ControlSpec.currentMode(0.3, 30e3, 0.75)}) {
            for (OperatingPoint op : new OperatingPoint[] {ccm, dcm}) {
                StageTransferFunctions m = AnalyticStageModel.at(lossy, c, op);
                for (TransferFunction tf : new TransferFunction[] {m.control(), m.duty(), m.line(),
                        m.outputImpedance()}) {
                    double last = tf.phaseDeg(1);
                    for (int k = 1; k <= 1000; k++) {
                        double f = Math.pow(lossy.fswHz() / 2, k / 1000.0);
                        double ph = tf.phaseDeg(f);
                        assertTrue(Math.abs(ph - last) < 10, c.scheme() + " " + op.mode() + " jump at " + f);
                        last = ph;
                    }
                }
            }
        }
    }
}
