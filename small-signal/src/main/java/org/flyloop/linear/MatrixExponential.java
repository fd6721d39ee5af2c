package org.flyloop.linear;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.NormOps_DDRM;

/**
 * exp(M) by scaling and squaring with the diagonal [6/6] Padé approximant: scale M by 2^−j so that
 * ‖M/2^j‖∞ ≤ 1/2, evaluate N/D with N = Σ cₖ·Xᵏ, D = Σ (−1)ᵏ·cₖ·Xᵏ,
 * c₀ = 1, cₖ = cₖ₋₁·(q − k + 1)/((2q − k + 1)·k), then square j times.
 *
 * <p>Source: G. H. Golub and C. F. Van Loan, "Matrix Computations", 4th ed., Johns Hopkins
 * University Press, 2013, section 9.3.1 (scaling and squaring with Padé approximation), whose error
 * bound for q = 6 is 2^(3−2q)·(q!)²/((2q)!·(2q+1)!) ≈ 3.4e−16 relative to ‖M‖ in exact
 * arithmetic; see also C. Moler and C. Van Loan, "Nineteen dubious ways to compute the exponential
 * of a matrix, twenty-five years later", SIAM Review 45(1), 2003.
 */
final class MatrixExponential {

    private static final int PADE_DEGREE = 6;

    private MatrixExponential() {
    }

    /** exp(m) for a square matrix (m is not modified). */
    static DMatrixRMaj of(DMatrixRMaj m) {
        int n = m.numRows;
        double norm = NormOps_DDRM.inducedPInf(m);
        int j = norm > 0.5 ? Math.max(0, 1 + (int) Math.floor(Math.log(norm) / Math.log(2)) + 1) : 0;
        DMatrixRMaj x0 = m.copy();
        CommonOps_DDRM.scale(Math.scalb(1.0, -j), x0);
        DMatrixRMaj x = CommonOps_DDRM.identity(n);
        DMatrixRMaj num = CommonOps_DDRM.identity(n);
        DMatrixRMaj den = CommonOps_DDRM.identity(n);
        DMatrixRMaj tmp = new DMatrixRMaj(n, n);
        double coef = 1;
        int q = PADE_DEGREE;
        for (int k = 1; k <= q; k++) {
            coef = coef * (q - k + 1) / ((2.0 * q - k + 1) * k);
            CommonOps_DDRM.mult(x0, x, tmp);
            x.setTo(tmp);
            CommonOps_DDRM.addEquals(num, coef, x);
            CommonOps_DDRM.addEquals(den, (k % 2 == 0 ? 1 : -1) * coef, x);
        }
        DMatrixRMaj f = new DMatrixRMaj(n, n);
        if (!CommonOps_DDRM.solve(den, num, f)) {
            throw new ArithmeticException("Padé denominator is singular");
        }
        for (int k = 0; k < j; k++) {
            CommonOps_DDRM.mult(f, f, tmp);
            f.setTo(tmp);
        }
        return f;
    }
}
