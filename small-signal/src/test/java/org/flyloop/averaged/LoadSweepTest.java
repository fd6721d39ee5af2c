package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * A slow load ramp from full load (2 A) down to 5 % (0.1 A) at 48 V. The load is a 120 Ω resistor
 * (0.1 A at 12 V) plus the step source ramping from 1.9 A to 0; the control input ramps at the
 * same time from the value that regulates 12 V at full load to the one that regulates it at 5 %
 * (a feed-forward schedule: without a feedback loop Vout would otherwise run away, to about 28 V
 * in voltage mode and far higher in current mode). The model must cross from CCM into DCM by
 * itself, without a failed integration and without a jump in Vout.
 *
 * <p>A jump J on top of the normal per-sample change s shows as a second difference ≈ J next to a
 * first difference ≈ s + J, so a ratio below 0.25 rules out any jump larger than a third of one
 * sample's change. A smooth crossing keeps the ratio small: Vout follows the capacitor state, and
 * only its ESR term kinks where d2 leaves its limit (measured 0.049 in voltage mode, 0.012 in
 * current mode, with 4000 samples). After a hold, Vout must
 * equal the equilibrium at the final inputs (Newton on the same equations, a different solution
 * path) within 0.1 %.
 */
class LoadSweepTest {

    private static final double RAMP_START_S = 0.005;

    @ParameterizedTest(name = "{0} mode, ramp {1} s, hold to {2} s")
    @CsvSource({
        "voltage, 0.2, 0.4",
        "current, 0.05, 0.4",
    })
    void crossesIntoDcmWithoutAJump(String scheme, double rampS, double durationS) {
        StageSpec stage = AveragedTestStages.busConverter();
        ControlSpec control = scheme.equals("voltage") ? AveragedTestStages.voltageMode()
                : AveragedTestStages.currentMode();
        AveragedFlybackModel model = new AveragedFlybackModel(stage, control);
        double r = 12 / 0.1;
        Equilibrium full = model.regulatedEquilibrium(48, r, 1.9);
        Equilibrium light = model.regulatedEquilibrium(48, r, 0);
        assertEquals(ConductionMode.CCM, full.mode());
        assertEquals(ConductionMode.DCM, light.mode());
        double rampEnd = RAMP_START_S + rampS;
        InputProfile profile = InputProfile.constant(full.inputs())
                .ramp(AveragedInputs.ISTEP, RAMP_START_S, rampEnd, 0)
                .ramp(AveragedInputs.CONTROL, RAMP_START_S, rampEnd, light.inputs().control());
        int intervals = 4000;
        Transient tr = model.simulate(new Scenario("load sweep", true, r, profile), durationS, intervals);

        List<ModeChange> changes = tr.modeChanges();
        assertEquals(1, changes.size(), "mode changes: " + changes);
        ModeChange change = changes.get(0);
        assertEquals(ConductionMode.CCM, change.from());
        assertEquals(ConductionMode.DCM, change.to());
        assertTrue(change.timeS() > RAMP_START_S && change.timeS() < rampEnd, "crossing at " + change.timeS());
        assertEquals(ConductionMode.DCM, tr.last().mode());

        double[] v = tr.voutV();
        int kc = (int) Math.round(change.timeS() / durationS * intervals);
        double firstDiff = 0;
        double secondDiff = 0;
        for (int k = Math.max(1, kc - 40); k <= Math.min(intervals - 1, kc + 40); k++) {
            firstDiff = Math.max(firstDiff, Math.abs(v[k + 1] - v[k]));
            secondDiff = Math.max(secondDiff, Math.abs(v[k + 1] - 2 * v[k] + v[k - 1]));
        }
        assertTrue(firstDiff > 0, "Vout moves during the ramp");
        assertTrue(secondDiff < 0.25 * firstDiff,
                "second difference " + secondDiff + " V vs first difference " + firstDiff + " V at the crossing");
        assertEquals(light.voutV(), tr.last().voutV(), 1e-3 * light.voutV(), "settled Vout after the sweep");
    }
}
