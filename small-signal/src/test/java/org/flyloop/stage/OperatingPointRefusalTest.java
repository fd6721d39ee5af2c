package org.flyloop.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;
import org.junit.jupiter.api.Test;

/** Points the stage cannot run at must be refused with one line naming the key and the limits. */
class OperatingPointRefusalTest {

    @Test
    void dutyAboveLimitIsRefusedNamingTheKey() {
        for (ControlSpec control : new ControlSpec[] {ExampleStages.voltageMode(0.3),
                ControlSpec.currentMode(0.5, 0, 0.3)}) {
            OperatingPointSolver solver = new OperatingPointSolver(ExampleStages.offlineAdapter(), control);
            InfeasibleOperatingPointException e =
                    assertThrows(InfeasibleOperatingPointException.class, () -> solver.solve(120, 2));
            String m = e.getMessage();
            assertTrue(m.contains("vin=120 V"), m);
            assertTrue(m.contains("iout=2 A"), m);
            assertTrue(m.contains("D=0.38"), m);
            assertTrue(m.contains("control.duty_max=0.3"), m);
            assertFalse(m.contains("\n"), "one line");
            // The same stage at high line needs far less duty.
            assertTrue(solver.solve(375, 2).duty() < 0.3);
        }
    }

    /**
     * With switch resistance the CCM output has a maximum over D. The reference maximum comes from
     * a numerical search (Brent's optimizer) over Iout(D) = N·(1 − D)·Im(D) with
     * Im(D) = (Vin − (1 − D)·Vr/D)/Rds from the volt-second balance, not from the solver's
     * discriminant formula.
     */
    @Test
    void unreachableLoadIsRefusedAndTheStatedLimitIsRight() {
        StageSpec stage = new StageSpec(ValueRange.between(36, 72), 5, ValueRange.between(0.5, 4), 200e3,
                60e-6, 4, 940e-6, 0.005, 0.35, 2.0);
        double vin = 36;
        double n = stage.turns();
        double vr = n * (stage.vout() + stage.rectifierDrop());
        UnivariateFunction load = d -> n * (1 - d) * (vin - (1 - d) * vr / d) / stage.switchResistance();
        double maxLoad = new BrentOptimizer(1e-12, 1e-14).optimize(new MaxEval(1000),
                new UnivariateObjectiveFunction(load), GoalType.MAXIMIZE, new SearchInterval(0.05, 0.99))
                .getValue();

        OperatingPointSolver solver = new OperatingPointSolver(stage, ExampleStages.voltageMode(0.95));
        OperatingPoint justInside = solver.solve(vin, maxLoad * 0.999);
        assertEquals(ConductionMode.CCM, justInside.mode());
        InfeasibleOperatingPointException e =
                assertThrows(InfeasibleOperatingPointException.class, () -> solver.solve(vin, maxLoad * 1.001));
        String m = e.getMessage();
        assertTrue(m.contains("stage.switch_resistance=2 Ω"), m);
        assertTrue(m.contains("limits the load to " + OperatingPointSolver.fmt(maxLoad) + " A"), m + " vs " + maxLoad);
        assertFalse(m.contains("\n"), "one line");
    }

    @Test
    void nonsenseInputsAreProgrammingErrors() {
        OperatingPointSolver solver = new OperatingPointSolver(ExampleStages.ideal(), ExampleStages.voltageMode());
        assertThrows(IllegalArgumentException.class, () -> solver.solve(-1, 1));
        assertThrows(IllegalArgumentException.class, () -> solver.solve(24, 0));
        assertThrows(IllegalArgumentException.class, () -> solver.solve(Double.NaN, 1));
    }

    @Test
    void numbersAreWrittenPlainly() {
        assertEquals("90", OperatingPointSolver.fmt(90));
        assertEquals("0.8123", OperatingPointSolver.fmt(0.812345));
        assertEquals("1235", OperatingPointSolver.fmt(1234.6));
        assertEquals("0.0005", OperatingPointSolver.fmt(0.0005));
    }
}
