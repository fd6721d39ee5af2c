package org.flyloop.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.RombergIntegrator;
import org.flyloop.spec.StageSpec;
import org.junit.jupiter.api.Test;

/**
 * The closed-form trapezoid RMS, √(d·(Ia² + Ia·Ib + Ib²)/3) (Erickson &amp; Maksimović,
 * Fundamentals of Power Electronics, 2nd ed. 2001, Appendix A), against Romberg quadrature of the
 * squared waveform rebuilt from the operating point's duty cycles and currents. The simulator
 * check of the same quantities is in org.flyloop.switching.
 */
class TrapezoidRmsTest {

    @Test
    void switchAndRectifierRmsMatchQuadrature() {
        for (StageSpec stage : ExampleStages.all()) {
            OperatingPointSolver solver = new OperatingPointSolver(stage, ExampleStages.voltageMode(0.95));
            for (OperatingPoint op : solver.corners()) {
                double ts = stage.periodS();
                double ton = op.duty() * ts;
                double toff = op.duty2() * ts;
                double n = stage.turns();
                UnivariateFunction sw = t -> {
                    double i = op.ivalley() + (op.ipk() - op.ivalley()) * t / ton;
                    return i * i;
                };
                UnivariateFunction rect = t -> {
                    double i = n * (op.ipk() - (op.ipk() - op.ivalley()) * t / toff);
                    return i * i;
                };
                double swRms = Math.sqrt(integrate(sw, ton) / ts);
                double rectRms = Math.sqrt(integrate(rect, toff) / ts);
                assertEquals(swRms, op.iswRms(), swRms * 1e-9, "switch " + op);
                assertEquals(rectRms, op.irectRms(), rectRms * 1e-9, "rectifier " + op);
            }
        }
    }

    @Test
    void triangleAndFlatTopLimits() {
        // A triangle from zero: I·√(d/3); a flat top: I·√d.
        assertEquals(2 * Math.sqrt(0.4 / 3), OperatingPointSolver.trapezoidRms(0.4, 0, 2), 1e-15);
        assertEquals(2 * Math.sqrt(0.4), OperatingPointSolver.trapezoidRms(0.4, 2, 2), 1e-15);
    }

    private static double integrate(UnivariateFunction f, double upper) {
        // Scale time to [0, 1] so the integrator's absolute accuracy is meaningful.
        UnivariateFunction scaled = x -> f.value(x * upper) * upper;
        return new RombergIntegrator(1e-13, 1e-15, 3, 32).integrate(1_000_000, scaled, 0, 1);
    }
}
