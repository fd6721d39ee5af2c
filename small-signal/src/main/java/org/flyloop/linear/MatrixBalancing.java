package org.flyloop.linear;

import org.ejml.data.DMatrixRMaj;

/**
 * Diagonal similarity scaling of a square matrix so that each row and its column have comparable
 * norms, which makes eigenvalues of badly scaled matrices (companion matrices of polynomials whose
 * roots span decades, state matrices mixing 1 Hz and 1 MHz dynamics) far more accurate.
 *
 * <p>Method: B. N. Parlett and C. Reinsch, "Balancing a matrix for calculation of eigenvalues and
 * eigenvectors", Numerische Mathematik 13 (1969) 293–304, with radix-2 scale factors so the
 * similarity D⁻¹·A·D introduces no rounding. The eigenvalues are unchanged.
 */
final class MatrixBalancing {

    private MatrixBalancing() {
    }

    /** Balances {@code a} in place (a := D⁻¹·A·D with D diagonal, powers of two). */
    static void balanceInPlace(DMatrixRMaj a) {
        int n = a.numRows;
        if (n != a.numCols) {
            throw new IllegalArgumentException("matrix must be square");
        }
        boolean done = false;
        int sweeps = 0;
        while (!done && sweeps++ < 100) {
            done = true;
            for (int i = 0; i < n; i++) {
                double colNorm = 0;
                double rowNorm = 0;
                for (int j = 0; j < n; j++) {
                    if (j != i) {
                        colNorm += Math.abs(a.get(j, i));
                        rowNorm += Math.abs(a.get(i, j));
                    }
                }
                if (colNorm == 0 || rowNorm == 0) {
                    continue;
                }
                double total = colNorm + rowNorm;
                double f = 1;
                double c = colNorm;
                while (c < rowNorm / 2) {
                    f *= 2;
                    c *= 4;
                }
                while (c > rowNorm * 2) {
                    f /= 2;
                    c /= 4;
                }
                // Only rescale when it reduces the combined norm noticeably, which guarantees termination.
                if ((c + rowNorm) / f < 0.95 * total) {
                    done = false;
                    for (int j = 0; j < n; j++) {
                        a.set(i, j, a.get(i, j) / f);
                        a.set(j, i, a.get(j, i) * f);
                    }
                }
            }
        }
    }
}
