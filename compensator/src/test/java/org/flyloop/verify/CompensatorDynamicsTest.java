package org.flyloop.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.junit.jupiter.api.Test;

/**
 * The compensator's state equations, integrated in time with Commons Math's Dormand–Prince, against
 * closed forms: a partial-fraction step response and the sinusoidal steady state of the factored
 * transfer function.
 */
class CompensatorDynamicsTest {

    /** y(t) of {@code dynamics} driven by {@code input}, from zero state. */
    private static double outputAt(CompensatorDynamics dynamics, DoubleUnaryOperator input, double timeS) {
        int n = dynamics.stateCount();
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return n;
            }

            @Override
            public void computeDerivatives(double t, double[] x, double[] dx) {
                dynamics.derivatives(x, 0, input.applyAsDouble(t), dx);
            }
        };
        double[] x = new double[n];
        new DormandPrince853Integrator(1e-15, timeS / 50, 1e-14, 1e-12).integrate(ode, 0, x, timeS, x);
        return dynamics.output(x, 0, input.applyAsDouble(timeS));
    }

    @Test
    void typeTwoStepResponseMatchesPartialFractions() {
        // Gc = K·(1 + s/ωz)/(s·(1 + s/ωp)). For a unit step, Y = K/s²·(1 + s/ωz)/(1 + s/ωp)
        // = K/s² + K·(1/ωz − 1/ωp)/(s·(1 + s/ωp)), so
        // y(t) = K·t + K·(1/ωz − 1/ωp)·(1 − exp(−ωp·t)).
        double k = 3.7e3;
        double wz = 2 * Math.PI * 800;
        double wp = 2 * Math.PI * 30e3;
        TransferFunction gc = TransferFunction.of(k, 1, List.of(Root.real(-wz)), List.of(Root.real(-wp)));
        CompensatorDynamics dyn = CompensatorDynamics.of(gc);
        assertEquals(2, dyn.stateCount());
        assertEquals(0, dyn.feedthrough(), "strictly proper: no feedthrough");
        for (double t : new double[] {2e-6, 2e-5, 2e-4, 2e-3}) {
            double expected = k * t + k * (1 / wz - 1 / wp) * (1 - Math.exp(-wp * t));
            assertEquals(expected, outputAt(dyn, u -> 1, t), 1e-9 * Math.abs(expected), "t = " + t);
        }
    }

    @Test
    void feedthroughOfAnIntegratorWithAZeroIsGainOverZero() {
        // K·(1 + s/ωz)/s → K/ωz as s → ∞.
        double k = 5e3;
        double wz = 2 * Math.PI * 300;
        CompensatorDynamics dyn = CompensatorDynamics.of(
                TransferFunction.of(k, 1, List.of(Root.real(-wz)), List.of()));
        assertEquals(k / wz, dyn.feedthrough(), 1e-12 * k / wz);
        // Step: y(t) = K·t + K/ωz.
        assertEquals(k * 1e-3 + k / wz, outputAt(dyn, u -> 1, 1e-3), 1e-9 * (k * 1e-3 + k / wz));
    }

    @Test
    void typeThreeWithAResonantPairFollowsItsFrequencyResponse() {
        // Integrator, two zeros, one real pole and a Q = 2 pole pair: driven by cos(ωt) from rest,
        // y(t) → Re(Gc(jω)·e^{jωt}) once the poles' transients have died (the integrator of a
        // cosine starting at zero carries no offset). Slowest decay: the pair, Q/(π·f0) = 32 µs.
        TransferFunction gc = TransferFunction.of(2e4, 1, List.of(Root.realAtHz(1e3), Root.realAtHz(1.5e3)),
                List.of(Root.realAtHz(40e3), Root.pairAtHz(20e3, 2)));
        CompensatorDynamics dyn = CompensatorDynamics.of(gc);
        assertEquals(4, dyn.stateCount());
        double f = 3e3;
        double w = 2 * Math.PI * f;
        Complex g = gc.evaluate(f);
        for (double t : new double[] {1.0e-3, 1.0e-3 + 0.25 / f, 1.0e-3 + 0.6 / f}) {
            double expected = g.getReal() * Math.cos(w * t) - g.getImaginary() * Math.sin(w * t);
            assertEquals(expected, outputAt(dyn, u -> Math.cos(w * u), t), 1e-6 * g.abs(), "t = " + t);
        }
    }

    @Test
    void typicalMagnitudesArePositive() {
        TransferFunction gc = TransferFunction.of(2e4, 1, List.of(Root.realAtHz(1e3)), List.of(Root.realAtHz(40e3)));
        for (double m : CompensatorDynamics.of(gc).typicalMagnitudes(0.05, 5e3)) {
            assertTrue(m > 0 && Double.isFinite(m));
        }
    }
}
