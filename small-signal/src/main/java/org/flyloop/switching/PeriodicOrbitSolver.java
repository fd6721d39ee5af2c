package org.flyloop.switching;

/**
 * Finds the periodic orbit x* = P(x*) of the one-period map P on the period-start state
 * x = (im, vc) by Newton's method (shooting), with a forward-difference Jacobian and step halving
 * when a full step would not reduce the residual.
 *
 * <p>For fixed duty in CCM the map is affine (fixed switching instants, linear sub-circuits), so
 * one step lands on the orbit; with the rectifier turn-off or the comparator event the map is
 * smooth but not affine and a few steps are needed. Unlike cycling the circuit until it settles,
 * shooting also finds orbits that are slow to settle or unstable (current mode above D = 0.5
 * without enough slope compensation).
 */
final class PeriodicOrbitSolver {

    private static final int MAX_NEWTON_STEPS = 40;
    private static final int MAX_HALVINGS = 12;
    /** Residual |P(x) − x| relative to the state scales at which the orbit counts as found. */
    private static final double RESIDUAL_TOLERANCE = 1e-10;
    /** Forward-difference step relative to the state scales. */
    private static final double DIFFERENCE_STEP = 1e-6;

    private final CycleRunner runner;
    private final double currentScaleA;
    private final double voltageScaleV;

    /**
     * A located orbit.
     *
     * @param start     period-start state on the orbit
     * @param jacobian  ∂P/∂x at {@code start}, rows and columns ordered (im, vc)
     * @param cycles    periods simulated
     * @param converged false when Newton stalled before the residual tolerance
     */
    record Orbit(CircuitState start, double[][] jacobian, int cycles, boolean converged) {
    }

    PeriodicOrbitSolver(CycleRunner runner, double currentScaleA, double voltageScaleV) {
        this.runner = runner;
        this.currentScaleA = currentScaleA;
        this.voltageScaleV = voltageScaleV;
    }

    Orbit find(CircuitState guess, Modulator modulator) {
        CircuitState x = guess;
        CycleResult result = runner.run(x, modulator);
        int cycles = 1;
        double norm = residual(result);
        double[][] jac;
        for (int step = 0; step < MAX_NEWTON_STEPS; step++) {
            jac = jacobian(x, result, modulator);
            cycles += 2;
            if (norm <= RESIDUAL_TOLERANCE) {
                return new Orbit(x, jac, cycles, true);
            }
            double fi = result.end().imA() - x.imA();
            double fv = result.end().vcV() - x.vcV();
            double a = jac[0][0] - 1;
            double b = jac[0][1];
            double c = jac[1][0];
            double d = jac[1][1] - 1;
            double det = a * d - b * c;
            if (det == 0 || !Double.isFinite(det)) {
                break;
            }
            double di = (-fi * d + b * fv) / det;
            double dv = (-a * fv + c * fi) / det;
            boolean accepted = false;
            double lambda = 1;
            for (int k = 0; k < MAX_HALVINGS && !accepted; k++, lambda /= 2) {
                CircuitState trial = new CircuitState(Math.max(0, x.imA() + lambda * di),
                        Math.max(0, x.vcV() + lambda * dv));
                CycleResult trialResult = runner.run(trial, modulator);
                cycles++;
                double trialNorm = residual(trialResult);
                if (trialNorm < norm) {
                    x = trial;
                    result = trialResult;
                    norm = trialNorm;
                    accepted = true;
                }
            }
            if (!accepted) {
                break;
            }
        }
        jac = jacobian(x, result, modulator);
        cycles += 2;
        return new Orbit(x, jac, cycles, norm <= RESIDUAL_TOLERANCE);
    }

    /** ∂P/∂x at {@code x} by forward differences; {@code atX} is P(x). */
    double[][] jacobian(CircuitState x, CycleResult atX, Modulator modulator) {
        double hi = DIFFERENCE_STEP * currentScaleA;
        double hv = DIFFERENCE_STEP * voltageScaleV;
        CycleResult di = runner.run(new CircuitState(x.imA() + hi, x.vcV()), modulator);
        CycleResult dv = runner.run(new CircuitState(x.imA(), x.vcV() + hv), modulator);
        return new double[][] {
            {(di.end().imA() - atX.end().imA()) / hi, (dv.end().imA() - atX.end().imA()) / hv},
            {(di.end().vcV() - atX.end().vcV()) / hi, (dv.end().vcV() - atX.end().vcV()) / hv},
        };
    }

    private double residual(CycleResult r) {
        double fi = Math.abs(r.end().imA() - r.start().imA()) / currentScaleA;
        double fv = Math.abs(r.end().vcV() - r.start().vcV()) / voltageScaleV;
        return Math.max(fi, fv);
    }
}
