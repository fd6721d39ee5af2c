package org.flyloop.linear;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.Complex_F64;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * Eigenvalues of a real square matrix, exploiting reducibility: the states are split into the
 * strongly connected components of the graph with an edge j → i wherever a_ij ≠ 0. Ordered
 * topologically these components make A block triangular, and the eigenvalues of a block
 * triangular matrix are those of its diagonal blocks. Each block is then balanced
 * ({@link MatrixBalancing}) and handed to EJML's Hessenberg QR; 1×1 blocks need no computation.
 *
 * <p>This is the permutation step of LAPACK's balancing (E. Anderson et al., "LAPACK Users'
 * Guide", 3rd ed., SIAM, 1999, section 4.8.1.2, routine xGEBAL) carried to all components: a
 * cascade of sections keeps each section's poles exact instead of bounding their error by the
 * norm of the whole matrix.
 */
final class Eigenvalues {

    private Eigenvalues() {
    }

    /** Writes the n eigenvalues of {@code a} into re/im (conjugate pairs adjacent per block). */
    static void of(DMatrixRMaj a, double[] re, double[] im) {
        int n = a.numRows;
        if (n != a.numCols) {
            throw new IllegalArgumentException("matrix must be square");
        }
        int k = 0;
        for (List<Integer> component : stronglyConnectedComponents(a)) {
            int m = component.size();
            if (m == 1) {
                int i = component.get(0);
                re[k] = a.get(i, i);
                im[k] = 0;
                k++;
                continue;
            }
            DMatrixRMaj block = new DMatrixRMaj(m, m);
            for (int r = 0; r < m; r++) {
                for (int c = 0; c < m; c++) {
                    block.set(r, c, a.get(component.get(r), component.get(c)));
                }
            }
            MatrixBalancing.balanceInPlace(block);
            EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(m, false, false);
            if (!eig.decompose(block)) {
                throw new ArithmeticException("eigenvalue iteration did not converge");
            }
            for (int i = 0; i < m; i++) {
                Complex_F64 v = eig.getEigenvalue(i);
                re[k] = v.real;
                im[k] = v.imaginary;
                k++;
            }
        }
    }

    /** Tarjan's algorithm (R. Tarjan, SIAM J. Computing 1(2), 1972) on the non-zero pattern. */
    private static List<List<Integer>> stronglyConnectedComponents(DMatrixRMaj a) {
        int n = a.numRows;
        int[] index = new int[n];
        int[] low = new int[n];
        boolean[] onStack = new boolean[n];
        java.util.Arrays.fill(index, -1);
        int[] stack = new int[n];
        int[] top = {0};
        int[] counter = {0};
        List<List<Integer>> out = new ArrayList<>();
        for (int v = 0; v < n; v++) {
            if (index[v] < 0) {
                visit(a, v, index, low, onStack, stack, top, counter, out);
            }
        }
        return out;
    }

    private static void visit(DMatrixRMaj a, int v, int[] index, int[] low, boolean[] onStack, int[] stack,
                              int[] top, int[] counter, List<List<Integer>> out) {
        index[v] = counter[0];
        low[v] = counter[0];
        counter[0]++;
        stack[top[0]++] = v;
        onStack[v] = true;
        for (int w = 0; w < a.numRows; w++) {
            if (w == v || a.get(w, v) == 0) {
                continue;
            }
            if (index[w] < 0) {
                visit(a, w, index, low, onStack, stack, top, counter, out);
                low[v] = Math.min(low[v], low[w]);
            } else if (onStack[w]) {
                low[v] = Math.min(low[v], index[w]);
            }
        }
        if (low[v] == index[v]) {
            List<Integer> component = new ArrayList<>();
            int w;
            do {
                w = stack[--top[0]];
                onStack[w] = false;
                component.add(w);
            } while (w != v);
            out.add(component);
        }
    }
}
