package org.flyloop.switching;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.Set;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;
import org.flyloop.stage.ConductionMode;
import org.flyloop.stage.ExampleStages;
import org.junit.jupiter.api.Test;

/** Peak-current control in the simulator: comparator timing, DCM energy, subharmonic stability. */
class CurrentModeSimulatorTest {

    /**
     * The on-interval is decoupled from the output (Lm·dim/dt = Vin − Rds·im), so its exact
     * solution im(t) = Vin/Rds − (Vin/Rds − i0)·e^(−Rds·t/Lm) gives the comparator instant by an
     * independent root search. Required: within 1e-12 s, in CCM and DCM.
     */
    @Test
    void turnOffInstantMatchesTheExactRamp() {
        StageSpec stage = ExampleStages.telecomBrick();
        ControlSpec control = ControlSpec.currentMode(0.25, 50e3, 0.75);
        Set<ConductionMode> seen = EnumSet.noneOf(ConductionMode.class);
        for (double r : new double[] {5.0 / 3, 10}) {
            for (double vc : new double[] {0.35, 0.65}) {
                SteadyState ss = new SwitchingSimulator(stage, control, 48, r).runToSteadyState(vc);
                double i0 = ss.periodStart().imA();
                double rds = stage.switchResistance();
                UnivariateFunction comparator = t -> vc - control.slopeVPerS() * t - control.senseVPerA()
                        * (48 / rds - (48 / rds - i0) * Math.exp(-rds * t / stage.lm()));
                double exact = new BrentSolver(1e-16, 1e-18).solve(500, comparator, 0, stage.periodS() * 0.75);
                double simulated = ss.dutyApplied() * stage.periodS();
                assertEquals(exact, simulated, 1e-12, "R=" + r + ", vc=" + vc);
                assertFalse(ss.dutyLimited());
                seen.add(ss.mode());
            }
        }
        assertEquals(EnumSet.of(ConductionMode.CCM, ConductionMode.DCM), seen, "both modes exercised");
    }

    /**
     * Lossless DCM without slope: each period stores ½·Lm·Ipk² with Ipk = vc/sense and delivers it
     * all, so Vout = √(½·Lm·fsw·R)·vc/sense and dVout/dvc = √(½·Lm·fsw·R)/sense. The DC gain is taken
     * by central differences of two steady states, as the loop-gain checks will do; 1e-5 covers the
     * output ripple's effect on the average.
     */
    @Test
    void dcmOutputAndDcGainFollowTheEnergyPerCycle() {
        StageSpec stage = new StageSpec(ValueRange.of(24), 12, ValueRange.between(0.1, 3), 100e3,
                100e-6, 1, 100e-6, 0, 0, 0);
        ControlSpec control = ControlSpec.currentMode(0.5, 0, 0.75);
        double r = 60;
        SwitchingSimulator sim = new SwitchingSimulator(stage, control, 24, r);
        double scale = Math.sqrt(0.5 * stage.lm() * stage.fswHz() * r) / control.senseVPerA();
        for (double vc : new double[] {0.2, 0.35}) {
            SteadyState ss = sim.runToSteadyState(vc);
            assertEquals(ConductionMode.DCM, ss.mode());
            assertEquals(vc / control.senseVPerA(), ss.ipkA(), ss.ipkA() * 1e-9, "comparator trip");
            assertEquals(scale * vc, ss.voutAvgV(), scale * vc * 1e-5);
            double dv = vc * 1e-4;
            double gain = (sim.runToSteadyState(vc + dv).voutAvgV() - sim.runToSteadyState(vc - dv).voutAvgV()) / (2 * dv);
            assertEquals(scale, gain, scale * 1e-5, "dVout/dvc at vc=" + vc);
        }
    }

    /**
     * The sampled current loop multiplies an inductor-current disturbance by
     * α = −(m2 − ma)/(m1 + ma) each period, m1 and m2 the sensed up and down slopes and ma the
     * compensation slope (R. B. Ridley, "A New, Continuous-Time Model for Current-Mode Control",
     * IEEE Trans. Power Electronics 6(2), 1991). One of the simulated cycle multipliers must be α
     * (the other belongs to the slow output pole); 3 % allows for the output ripple the formula
     * ignores. At D = 0.6 without slope |α| = 1.5: the orbit exists but is unstable; half the down
     * slope as compensation makes it stable.
     */
    @Test
    void currentDisturbanceRatioMatchesTheSampledLoopFormula() {
        StageSpec stage = new StageSpec(ValueRange.of(8), 12, ValueRange.between(0.1, 3), 100e3,
                100e-6, 1, 470e-6, 0, 0, 0);
        double sense = 0.1;
        double vin = 8;
        double m1 = sense * vin / stage.lm();
        double m2Estimate = sense * stage.vout() / stage.lm();
        for (double ma : new double[] {0, m2Estimate / 2}) {
            ControlSpec control = ControlSpec.currentMode(sense, ma, 0.75);
            // Peak current for 3 A at D = 0.6: Im = 7.5 A, ripple 0.48 A.
            double vc = sense * 7.74 + ma * 0.6 * stage.periodS();
            SteadyState ss = new SwitchingSimulator(stage, control, vin, 4).runToSteadyState(vc);
            assertEquals(ConductionMode.CCM, ss.mode());
            double m2 = sense * ss.voutAvgV() / stage.lm();
            double alpha = -(m2 - ma) / (m1 + ma);
            Complex closest = ss.cycleMultipliers().stream()
                    .min((a, b) -> Double.compare(a.subtract(alpha).abs(), b.subtract(alpha).abs())).orElseThrow();
            System.out.printf("ma=%.0f V/s: D=%.4f alpha=%.4f simulated %s%n", ma, ss.dutyApplied(), alpha,
                    ss.cycleMultipliers());
            assertEquals(alpha, closest.getReal(), Math.abs(alpha) * 0.03, "ma=" + ma);
            assertEquals(0, closest.getImaginary(), 1e-9);
            assertEquals(Math.abs(alpha) < 1, ss.isOrbitStable(), "ma=" + ma);
        }
    }

    @Test
    void dutyLimitTakesOverWhenTheComparatorNeverTrips() {
        StageSpec stage = ExampleStages.offlineAdapter();
        ControlSpec control = ControlSpec.currentMode(1, 0, 0.45);
        SteadyState ss = new SwitchingSimulator(stage, control, 120, 6).runToSteadyState(50);
        assertTrue(ss.dutyLimited());
        assertEquals(0.45, ss.dutyApplied(), 1e-12);
    }

    @Test
    void zeroControlVoltageKeepsTheSwitchOff() {
        ControlSpec control = ControlSpec.currentMode(1, 0, 0.75);
        SteadyState ss = new SwitchingSimulator(ExampleStages.ideal(), control, 24, 4).runToSteadyState(0);
        assertEquals(0, ss.dutyApplied());
        assertEquals(0, ss.voutAvgV(), 1e-12);
    }
}
