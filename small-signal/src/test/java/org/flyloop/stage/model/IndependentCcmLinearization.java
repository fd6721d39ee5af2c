package org.flyloop.stage.model;

import org.apache.commons.math3.complex.Complex;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.OperatingPoint;

/**
 * Reference for the CCM voltage-mode model: the averaged CCM flyback equations written out again
 * here in primary-referred form (independently of {@link AveragedEquations}), linearized by central
 * finite differences, and evaluated as C·(sI − A)⁻¹·B + D with an EJML complex solve.
 * <pre>
 *   Lm·dim/dt = d·(vin − Rds·im) − (1 − d)·N·(vo + Vf)
 *   C·dvC/dt  = N·(1 − d)·im − vo/R − iz,   vo = vC + Rc·C·dvC/dt
 * </pre>
 */
final class IndependentCcmLinearization {
    private final StageSpec s;
    private final double r;
    private final double[] x0;
    private final double[] u0;
    private final double[][] a = new double[2][2];
    private final double[][] b = new double[2][3];
    private final double[] c = new double[2];
    private final double[] dd = new double[3];

    IndependentCcmLinearization(StageSpec s, OperatingPoint op) {
        this.s = s;
        this.r = op.loadResistance();
        x0 = new double[] {op.imAvg(), op.vout()};
        u0 = new double[] {op.duty(), op.vin(), 0};
        for (int j = 0; j < 2; j++) {
            double h = 1e-6 * Math.max(Math.abs(x0[j]), 1);
            double[] xp = x0.clone(), xm = x0.clone();
            xp[j] += h;
            xm[j] -= h;
            double[] fp = f(xp, u0), fm = f(xm, u0);
            for (int i = 0; i < 2; i++) {
                a[i][j] = (fp[i] - fm[i]) / (2 * h);
            }
            c[j] = (vo(xp, u0) - vo(xm, u0)) / (2 * h);
        }
        for (int j = 0; j < 3; j++) {
            double h = 1e-6 * Math.max(Math.abs(u0[j]), 1e-2);
            double[] up = u0.clone(), um = u0.clone();
            up[j] += h;
            um[j] -= h;
            double[] fp = f(x0, up), fm = f(x0, um);
            for (int i = 0; i < 2; i++) {
                b[i][j] = (fp[i] - fm[i]) / (2 * h);
            }
            dd[j] = (vo(x0, up) - vo(x0, um)) / (2 * h);
        }
    }

    private double vo(double[] x, double[] u) {
        // vo = vC + Rc·(N·(1 − d)·im − vo/R − iz)  →  solved for vo
        double rc = s.esr();
        double irect = s.turns() * (1 - u[0]) * x[0];
        return (x[1] + rc * (irect - u[2])) / (1 + rc / r);
    }

    private double[] f(double[] x, double[] u) {
        double v = vo(x, u);
        double dim = (u[0] * (u[1] - s.switchResistance() * x[0])
                - (1 - u[0]) * s.turns() * (v + s.rectifierDrop())) / s.lm();
        double dvc = (s.turns() * (1 - u[0]) * x[0] - v / r - u[2]) / s.cout();
        return new double[] {dim, dvc};
    }

    private Complex response(double fHz, int input) {
        double w = 2 * Math.PI * fHz;
        ZMatrixRMaj m = new ZMatrixRMaj(2, 2);
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                m.set(i, j, -a[i][j], i == j ? w : 0);
            }
        }
        ZMatrixRMaj rhs = new ZMatrixRMaj(2, 1);
        rhs.set(0, 0, b[0][input], 0);
        rhs.set(1, 0, b[1][input], 0);
        ZMatrixRMaj x = new ZMatrixRMaj(2, 1);
        if (!CommonOps_ZDRM.solve(m, rhs, x)) {
            throw new IllegalStateException("singular");
        }
        double re = c[0] * x.getReal(0, 0) + c[1] * x.getReal(1, 0) + dd[input];
        double im = c[0] * x.getImag(0, 0) + c[1] * x.getImag(1, 0);
        return new Complex(re, im);
    }

    Complex dutyToOutput(double fHz) {
        return response(fHz, 0);
    }

    Complex outputImpedance(double fHz) {
        return response(fHz, 2).negate();
    }
}
