package org.flyloop.averaged;

import org.ejml.data.DMatrixRMaj;

/**
 * Central-difference Jacobians of an averaged circuit. Step for variable v:
 * h = ε·max(|v|, typical(v)), so a state that is zero at the operating point still gets a step of
 * sensible size; with ε = 1e-6 the truncation error (∝ h²) and the round-off (∝ 1e-16/h) of a
 * central difference are both below ~1e-9 relative.
 */
final class Jacobians {

    /** Default relative step ε. */
    static final double DEFAULT_RELATIVE_STEP = 1e-6;

    private Jacobians() {
    }

    /** Per-input typical magnitudes used as step floors: control, vin, i_step. */
    static double[] inputScales(double typicalControl, double typicalVinV, double typicalCurrentA) {
        return new double[] {typicalControl, typicalVinV, typicalCurrentA};
    }

    /** ∂f/∂x (n×n). */
    static DMatrixRMaj stateJacobian(AveragedCircuit circuit, double[] x, AveragedInputs u, double eps) {
        int n = x.length;
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        double[] fp = new double[n];
        double[] fm = new double[n];
        for (int j = 0; j < n; j++) {
            double h = eps * circuit.layout().scaleOf(j, x[j]);
            double[] xp = x.clone();
            double[] xm = x.clone();
            xp[j] += h;
            xm[j] -= h;
            circuit.derivatives(xp, u, fp);
            circuit.derivatives(xm, u, fm);
            for (int i = 0; i < n; i++) {
                a.set(i, j, (fp[i] - fm[i]) / (xp[j] - xm[j]));
            }
        }
        return a;
    }

    /** ∂f/∂u (n×3) in {@link AveragedInputs#NAMES} order. */
    static DMatrixRMaj inputJacobian(AveragedCircuit circuit, double[] x, AveragedInputs u, double[] inputScales,
                                     double eps) {
        int n = x.length;
        DMatrixRMaj b = new DMatrixRMaj(n, AveragedInputs.NAMES.size());
        double[] fp = new double[n];
        double[] fm = new double[n];
        for (int j = 0; j < AveragedInputs.NAMES.size(); j++) {
            double v = u.get(j);
            double h = eps * Math.max(Math.abs(v), inputScales[j]);
            circuit.derivatives(x, u.with(j, v + h), fp);
            circuit.derivatives(x, u.with(j, v - h), fm);
            for (int i = 0; i < n; i++) {
                b.set(i, j, (fp[i] - fm[i]) / (2 * h));
            }
        }
        return b;
    }

    /** ∂y/∂x (outputs × n). */
    static DMatrixRMaj outputStateJacobian(AveragedCircuit circuit, double[] x, AveragedInputs u, double eps) {
        int n = x.length;
        int m = circuit.outputNames().size();
        DMatrixRMaj c = new DMatrixRMaj(m, n);
        for (int j = 0; j < n; j++) {
            double h = eps * circuit.layout().scaleOf(j, x[j]);
            double[] xp = x.clone();
            double[] xm = x.clone();
            xp[j] += h;
            xm[j] -= h;
            double[] yp = circuit.outputs(xp, u);
            double[] ym = circuit.outputs(xm, u);
            for (int i = 0; i < m; i++) {
                c.set(i, j, (yp[i] - ym[i]) / (xp[j] - xm[j]));
            }
        }
        return c;
    }

    /** ∂y/∂u (outputs × 3). */
    static DMatrixRMaj outputInputJacobian(AveragedCircuit circuit, double[] x, AveragedInputs u,
                                           double[] inputScales, double eps) {
        int m = circuit.outputNames().size();
        DMatrixRMaj d = new DMatrixRMaj(m, AveragedInputs.NAMES.size());
        for (int j = 0; j < AveragedInputs.NAMES.size(); j++) {
            double v = u.get(j);
            double h = eps * Math.max(Math.abs(v), inputScales[j]);
            double[] yp = circuit.outputs(x, u.with(j, v + h));
            double[] ym = circuit.outputs(x, u.with(j, v - h));
            for (int i = 0; i < m; i++) {
                d.set(i, j, (yp[i] - ym[i]) / (2 * h));
            }
        }
        return d;
    }
}
