package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.junit.jupiter.api.Test;

class EigenvaluesTest {

    @Test
    void permutedBlockTriangularMatrixGivesItsBlocksEigenvaluesExactly() {
        // T is block lower triangular: [−1], [−2 5; −5 −2] (eigenvalues −2 ± 5j), [−1e6], with large
        // couplings below the diagonal. The eigenvalues of a block triangular matrix are those of its
        // diagonal blocks; a symmetric permutation P·T·Pᵀ does not change them.
        double[][] t = {
            {-1, 0, 0, 0},
            {3e5, -2, 5, 0},
            {-7e5, -5, -2, 0},
            {2e6, 4e6, -1e6, -1e6}};
        int[] perm = {2, 0, 3, 1};
        DMatrixRMaj a = new DMatrixRMaj(4, 4);
        for (int i = 0; i < 4; i++) {
            for (int j = 0; j < 4; j++) {
                a.set(i, j, t[perm[i]][perm[j]]);
            }
        }
        double[] re = new double[4];
        double[] im = new double[4];
        Eigenvalues.of(a, re, im);
        List<Root> got = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            if (im[i] == 0) {
                got.add(Root.real(re[i]));
            } else if (im[i] > 0) {
                got.add(new Root(re[i], im[i]));
            }
        }
        List<Root> expected = List.of(Root.real(-1), new Root(-2, 5), Root.real(-1e6));
        assertEquals(0, TestSystems.worstRootError(expected, got), 1e-15);
    }
}
