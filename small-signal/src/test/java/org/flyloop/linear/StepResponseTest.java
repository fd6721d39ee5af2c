package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.ejml.data.DMatrixRMaj;
import org.junit.jupiter.api.Test;

/** Step responses against a closed form and against numerical ODE integration. */
class StepResponseTest {

    @Test
    void underdampedSecondOrderMatchesClosedForm() {
        // H = ω0²/(s² + 2ζω0·s + ω0²), unit step. Partial fractions of H(s)/s give
        // y(t) = 1 − e^(−ζω0t)·(cos ωd·t + ζ/√(1−ζ²)·sin ωd·t), ωd = ω0·√(1−ζ²).
        double zeta = 0.3;
        double w0 = 1.0;
        TransferFunction h = TransferFunction.of(1, 0, List.of(), List.of(Root.pair(w0, 1 / (2 * zeta))));
        double[] t = new double[201];
        for (int i = 0; i < t.length; i++) {
            t[i] = 0.1 * i;
        }
        double[] y = StateSpace.fromTransferFunction(h).stepResponse(t);
        double wd = w0 * Math.sqrt(1 - zeta * zeta);
        for (int i = 0; i < t.length; i++) {
            double exact = 1 - Math.exp(-zeta * w0 * t[i])
                    * (Math.cos(wd * t[i]) + zeta / Math.sqrt(1 - zeta * zeta) * Math.sin(wd * t[i]));
            assertEquals(exact, y[i], 1e-6, "t = " + t[i]);
        }
    }

    @Test
    void fourthOrderWithFeedThroughMatchesOdeIntegration() {
        // Independent reference: Commons Math Dormand–Prince 8(5,3) integration of x' = A·x + b,
        // y = c·x + d, from x(0) = 0 with u = 1, at tight tolerances.
        TransferFunction h = TransferFunction.of(2, 0, List.of(Root.real(-3), Root.real(5), Root.real(-40), Root.real(-60)),
                List.of(Root.pair(10, 4), Root.real(-2), Root.real(-30)));
        StateSpace ss = StateSpace.fromTransferFunction(h);
        double[] times = {0, 0.01, 0.05, 0.1, 0.3, 0.7, 1.5, 3.0};
        double[] y = ss.stepResponse(times);
        DMatrixRMaj a = ss.a();
        DMatrixRMaj b = ss.b();
        DMatrixRMaj c = ss.c();
        double d = ss.d().get(0, 0);
        int n = ss.stateCount();
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return n;
            }

            @Override
            public void computeDerivatives(double t, double[] x, double[] dx) {
                for (int i = 0; i < n; i++) {
                    double v = b.get(i, 0);
                    for (int j = 0; j < n; j++) {
                        v += a.get(i, j) * x[j];
                    }
                    dx[i] = v;
                }
            }
        };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 0.01, 1e-13, 1e-13);
        double[] x = new double[n];
        double t0 = 0;
        for (int k = 0; k < times.length; k++) {
            if (times[k] > t0) {
                integrator.integrate(ode, t0, x.clone(), times[k], x);
                t0 = times[k];
            }
            double ref = d;
            for (int j = 0; j < n; j++) {
                ref += c.get(0, j) * x[j];
            }
            assertEquals(ref, y[k], 1e-8 * Math.max(1, Math.abs(ref)), "t = " + times[k]);
        }
        // t = 0: only the feed-through, the ratio of the s⁴ coefficients of numerator and denominator:
        // 2·(1/3)(−1/5)(1/40)(1/60) / ((1/100)(1/2)(1/30)) = −1/3
        assertEquals(-1.0 / 3, y[0], 1e-13);
    }

    @Test
    void integratorRampsLinearly() {
        // 5/s: step response 5·t exactly.
        double[] y = StateSpace.fromTransferFunction(TransferFunction.integrators(5, 1)).stepResponse(new double[] {0, 1, 2.5, 40});
        assertEquals(0, y[0], 0);
        assertEquals(5, y[1], 1e-13);
        assertEquals(12.5, y[2], 1e-13);
        assertEquals(200, y[3], 1e-11);
    }
}
