package org.flyloop.switching;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;
import org.flyloop.stage.ConductionMode;
import org.flyloop.stage.ExampleStages;
import org.junit.jupiter.api.Test;

/**
 * The fixed-duty simulation on its own, without the closed-form solver: published conversion
 * ratios, conservation of energy, and agreement of shooting with plain time stepping from
 * power-up. Reference: [EM] R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd
 * ed., 2001 — flyback CCM M = D/(n·(1 − D)) (Sec. 6.3.4); buck-boost DCM M = D/√K, K = 2L/(R·Ts)
 * (Ch. 5, Table 5.2), with the load referred to the primary.
 */
class SwitchingSimulatorTest {

    private static final ControlSpec CONTROL = ExampleStages.voltageMode(0.95);

    private static StageSpec ideal(double turns, double cout) {
        return new StageSpec(ValueRange.between(18, 36), 12, ValueRange.between(0.1, 3), 100e3,
                100e-6, turns, cout, 0, 0, 0);
    }

    /**
     * Ideal parts in DCM. The ratio is exact for a ripple-free output; with 100 µF the output ripple
     * is under 0.1 % of vout, which moves the average by its square, so 1e-5 is a fair bound.
     */
    @Test
    void dcmOutputFollowsTheBuckBoostRatio() {
        for (double turns : new double[] {1, 3}) {
            StageSpec stage = ideal(turns, 100e-6);
            for (double duty : new double[] {0.1, 0.2}) {
                double r = 120;
                SteadyState ss = new SwitchingSimulator(stage, CONTROL, 24, r).runToSteadyState(duty);
                assertEquals(ConductionMode.DCM, ss.mode());
                // [EM] Table 5.2: Vout = Vin·D·√(R·Ts/(2·Lm)), N drops out.
                double expected = 24 * duty * Math.sqrt(r * stage.periodS() / (2 * stage.lm()));
                assertEquals(expected, ss.voutAvgV(), expected * 1e-5, "N=" + turns + ", D=" + duty);
            }
        }
    }

    /**
     * Ideal parts in CCM. The ratio assumes a ripple-free output; here the 100 µF output ripples by
     * about 0.3 % of vout, which shifts the demagnetizing volt-seconds by a similar fraction of the
     * ripple; 0.1 % is the bound (measured about 0.02 %).
     */
    @Test
    void ccmOutputFollowsTheFlybackRatio() {
        for (double turns : new double[] {0.5, 2}) {
            StageSpec stage = ideal(turns, 100e-6);
            for (double duty : new double[] {0.3, 0.5, 0.7}) {
                double expected = 24 / turns * duty / (1 - duty); // [EM] Sec. 6.3.4
                double r = expected / 6; // about 6 A of load: deep CCM for every case
                SteadyState ss = new SwitchingSimulator(stage, CONTROL, 24, r).runToSteadyState(duty);
                assertEquals(ConductionMode.CCM, ss.mode());
                assertEquals(expected, ss.voutAvgV(), expected * 1e-3, "N=" + turns + ", D=" + duty);
                assertEquals(duty, ss.dutyApplied(), 1e-12);
            }
        }
    }

    /** Energy in = energy out + losses + change of stored energy, term by term from the simulation. */
    @Test
    void everyCycleConservesEnergy() {
        for (StageSpec stage : ExampleStages.all()) {
            for (double duty : new double[] {0.1, 0.45}) {
                double vin = stage.vin().min();
                double r = stage.vout() / stage.iout().max();
                SteadyState ss = new SwitchingSimulator(stage, CONTROL, vin, r).runToSteadyState(duty);
                PowerBalance p = ss.power();
                assertEquals(0, p.residualW(), p.inputW() * 1e-8, p.toString());
                assertTrue(p.efficiency() <= 1 + 1e-9 && p.efficiency() > 0.5, p.toString());
            }
        }
        // Also far from steady state: the first cycles after power-up.
        StageSpec stage = ExampleStages.offlineAdapter();
        SwitchingSimulator sim = new SwitchingSimulator(stage, CONTROL, 120, 6);
        CycleRunner runner = new CycleRunner(new FlybackCircuit(stage, 120, 6, 0), stage.periodS(), 1, 12);
        CircuitState state = CircuitState.DISCHARGED;
        for (int k = 0; k < 20; k++) {
            CycleResult cycle = runner.run(state, new FixedDuty(0.4));
            double stored = 0.5 * stage.lm() * (sq(cycle.end().imA()) - sq(state.imA()))
                    + 0.5 * stage.cout() * (sq(cycle.end().vcV()) - sq(state.vcV()));
            double in = 120 * cycle.integral(FlybackCircuit.INT_ISW);
            double out = cycle.integral(FlybackCircuit.INT_LOAD_ENERGY)
                    + stage.switchResistance() * cycle.integral(FlybackCircuit.INT_ISW_SQ)
                    + stage.rectifierDrop() * cycle.integral(FlybackCircuit.INT_ISEC)
                    + stage.esr() * cycle.integral(FlybackCircuit.INT_IC_SQ);
            assertEquals(in, out + stored, in * 1e-9, "cycle " + k);
            state = cycle.end();
        }
        assertTrue(sim.runToSteadyState(0.4).voutAvgV() > state.vcV(), "still charging after 20 cycles");
    }

    /**
     * Shooting against brute force: a small output capacitor settles within a few hundred cycles
     * (slowest decay about 20 periods here), so plain time stepping from a discharged circuit must
     * land on the same orbit, in CCM (4 Ω, D = 0.4) and in DCM (40 Ω, D = 0.25).
     */
    @Test
    void powerUpSettlesOnTheShootingOrbit() {
        StageSpec stage = ideal(1, 10e-6);
        StageSpec lossy = new StageSpec(stage.vin(), 12, stage.iout(), 100e3, 100e-6, 1, 10e-6, 0.02, 0.5, 0.2);
        double[][] cases = {{4, 0.4}, {40, 0.25}};
        ConductionMode[] modes = {ConductionMode.CCM, ConductionMode.DCM};
        for (StageSpec s : new StageSpec[] {stage, lossy}) {
            for (int c = 0; c < cases.length; c++) {
                double r = cases[c][0];
                double duty = cases[c][1];
                SwitchingSimulator sim = new SwitchingSimulator(s, CONTROL, 18, r);
                SteadyState ss = sim.runToSteadyState(duty);
                assertEquals(modes[c], ss.mode());
                Waveform powerUp = sim.simulate(new FixedDuty(duty), CircuitState.DISCHARGED, 700, 1);
                CircuitState end = powerUp.finalState();
                assertEquals(ss.periodStart().vcV(), end.vcV(), ss.periodStart().vcV() * 1e-7, "vc, R=" + r);
                assertEquals(ss.periodStart().imA(), end.imA(), Math.max(ss.ipkA() * 1e-7, 1e-12), "im, R=" + r);
                assertTrue(ss.isOrbitStable());
                assertTrue(ss.lastCycleChange() < SwitchingSimulator.SETTLED_CHANGE);
            }
        }
    }

    @Test
    void extraLoadCurrentActsLikeTheEquivalentResistor() {
        StageSpec stage = ExampleStages.telecomBrick();
        SwitchingSimulator base = new SwitchingSimulator(stage, CONTROL, 48, 5);
        SteadyState withSink = base.withExtraLoadCurrent(1.5).runToSteadyState(0.3);
        double v = withSink.voutAvgV();
        // A resistor drawing the same average current at that voltage; the ripple makes the two
        // loads differ only by the ripple's effect on v/R, far below 1e-4.
        double equivalent = v / (v / 5 + 1.5);
        SteadyState withResistor = new SwitchingSimulator(stage, CONTROL, 48, equivalent).runToSteadyState(0.3);
        assertEquals(withResistor.voutAvgV(), v, v * 1e-4);
        assertEquals(withResistor.ipkA(), withSink.ipkA(), withSink.ipkA() * 1e-4);
        assertTrue(v < base.runToSteadyState(0.3).voutAvgV(), "more load, lower open-loop output");
    }

    @Test
    void waveformSamplesAreOrderedAndEdgesAreSharp() {
        StageSpec stage = ExampleStages.offlineAdapter();
        SwitchingSimulator sim = new SwitchingSimulator(stage, CONTROL, 120, 6);
        SteadyState ss = sim.runToSteadyState(0.4);
        Waveform w = sim.simulate(new FixedDuty(0.4), ss.periodStart(), 3, 50);
        double[] t = w.timeS();
        double[] sw = w.switchCurrentA();
        double[] rect = w.rectifierCurrentA();
        assertEquals(0, t[0]);
        assertEquals(3 * stage.periodS(), t[t.length - 1], 1e-18);
        for (int i = 1; i < t.length; i++) {
            assertTrue(t[i] >= t[i - 1], "time never runs back");
        }
        for (int i = 0; i < t.length; i++) {
            assertTrue(sw[i] == 0 || rect[i] == 0, "switch and rectifier never conduct together");
        }
        assertTrue(w.size() >= 150, "grid samples present");
        assertEquals(ss.periodStart().vcV(), w.finalState().vcV(), ss.periodStart().vcV() * 1e-9);
    }

    @Test
    void fixedDutyAboveTheLimitIsRefused() {
        SwitchingSimulator sim = new SwitchingSimulator(ExampleStages.ideal(), ExampleStages.voltageMode(0.6), 24, 4);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> sim.runToSteadyState(0.7));
        assertTrue(e.getMessage().contains("control.duty_max"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new FixedDuty(1));
        assertThrows(IllegalArgumentException.class,
                () -> new SwitchingSimulator(ExampleStages.ideal(), CONTROL, 24, 0));
    }

    private static double sq(double x) {
        return x * x;
    }
}
