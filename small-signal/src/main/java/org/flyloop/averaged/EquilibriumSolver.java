package org.flyloop.averaged;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

/**
 * Finds x with f(x, u) = 0 for an averaged circuit by Newton's method with a central-difference
 * Jacobian and a backtracking line search on the scaled residual Σ(f_i/scale_i)² (every term in
 * 1/s², so currents and voltages weigh alike). When Newton stalls from the circuit's guess, the
 * circuit is integrated for a settling window first (pseudo-transient continuation) and Newton is
 * retried from there.
 */
final class EquilibriumSolver {

    private static final int MAX_ITERATIONS = 200;
    /** Converged when every Newton step is below this fraction of the state's scale. */
    private static final double STEP_TOLERANCE = 1e-13;

    private final AveragedCircuit circuit;
    private final double settleWindowS;
    private final double eventCheckIntervalS;

    /**
     * @param settleWindowS how long to integrate before retrying Newton when it fails, s
     */
    EquilibriumSolver(AveragedCircuit circuit, double settleWindowS, double eventCheckIntervalS) {
        this.circuit = circuit;
        this.settleWindowS = settleWindowS;
        this.eventCheckIntervalS = eventCheckIntervalS;
    }

    /**
     * The equilibrium state: Newton from {@code guess} (may be null), then from the circuit's own
     * guess, then from settled simulations.
     */
    double[] solve(AveragedInputs u, double[] guess) {
        double[] start = circuit.steadyStateGuess(u);
        double[] x = guess != null ? newton(u, guess) : null;
        if (x == null) {
            x = newton(u, start);
        }
        if (x != null) {
            return x;
        }
        double[] settled = start;
        for (int attempt = 0; attempt < 4 && x == null; attempt++) {
            TransientSimulator sim = new TransientSimulator(circuit, 1, eventCheckIntervalS);
            settled = sim.run("settle", settled, InputProfile.constant(u), settleWindowS, 1).finalState();
            x = newton(u, settled);
        }
        if (x == null) {
            throw new IllegalStateException("no equilibrium found for inputs " + u);
        }
        return x;
    }

    private double[] newton(AveragedInputs u, double[] start) {
        int n = start.length;
        double[] x = start.clone();
        double[] f = new double[n];
        circuit.derivatives(x, u, f);
        double merit = merit(x, f);
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            DMatrixRMaj jac = Jacobians.stateJacobian(circuit, x, u, Jacobians.DEFAULT_RELATIVE_STEP);
            DMatrixRMaj rhs = new DMatrixRMaj(n, 1);
            for (int i = 0; i < n; i++) {
                rhs.set(i, 0, -f[i]);
            }
            DMatrixRMaj dx = new DMatrixRMaj(n, 1);
            if (!CommonOps_DDRM.solve(jac, rhs, dx) || !allFinite(dx.data)) {
                return null;
            }
            double alpha = 1;
            double[] trial = new double[n];
            double[] ft = new double[n];
            double trialMerit;
            while (true) {
                for (int i = 0; i < n; i++) {
                    trial[i] = x[i] + alpha * dx.get(i, 0);
                }
                circuit.derivatives(trial, u, ft);
                trialMerit = merit(trial, ft);
                if (trialMerit <= (1 - 1e-4 * alpha) * merit || alpha < 1e-8) {
                    break;
                }
                alpha /= 2;
            }
            boolean small = true;
            for (int i = 0; i < n; i++) {
                if (Math.abs(alpha * dx.get(i, 0)) > STEP_TOLERANCE * circuit.layout().scaleOf(i, x[i])) {
                    small = false;
                }
            }
            if (!Double.isFinite(trialMerit)) {
                return null;
            }
            x = trial.clone();
            f = ft.clone();
            merit = trialMerit;
            if (small || merit == 0) {
                return residualIsSmall(x, f) ? x : null;
            }
            if (alpha < 1e-8) {
                return null;
            }
        }
        return residualIsSmall(x, f) ? x : null;
    }

    private static boolean allFinite(double[] v) {
        for (double e : v) {
            if (!Double.isFinite(e)) {
                return false;
            }
        }
        return true;
    }

    private double merit(double[] x, double[] f) {
        double m = 0;
        for (int i = 0; i < f.length; i++) {
            double r = f[i] / circuit.layout().scaleOf(i, x[i]);
            m += r * r;
        }
        return m;
    }

    /**
     * Scaled residual below 1e-3 per second: a drift of 0.1 % per second, i.e. about 1 ppm of
     * the state over the millisecond time constants of a power stage. Guards against a "converged"
     * step sequence stuck on a kink.
     */
    private boolean residualIsSmall(double[] x, double[] f) {
        return Math.sqrt(merit(x, f)) < 1e-3;
    }
}
