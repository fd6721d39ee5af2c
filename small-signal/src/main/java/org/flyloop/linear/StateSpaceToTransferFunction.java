package org.flyloop.linear;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.NormOps_DDRM;

/**
 * Factored transfer function of a single-input single-output state-space model (A, b, c, d).
 *
 * <ul>
 *   <li>Poles: eigenvalues of A, block by block where A is reducible ({@link Eigenvalues}).</li>
 *   <li>Zeros: the invariant zeros, i.e. the λ where det [A − λI, b; c, d] = 0. While d = 0, an
 *       orthogonal (Householder) change of state coordinates makes c = [0 … 0 γ]; expanding the
 *       determinant along that row leaves the system matrix of a model with one state fewer
 *       and the same zeros, (A₁₁, b₁, a₂₁, b₂). Once the feed-through d is non-zero the zeros are
 *       the eigenvalues of A − b·c/d (the state matrix of the inverse system). This is the
 *       single-input single-output case of A. Emami-Naeini and P. Van Dooren, "Computation of
 *       zeros of linear multivariable systems", Automatica 18(4), 1982, 415–430; every step but
 *       the last is orthogonal, unlike methods built on powers of A. A deflated feed-through below
 *       1e−12·‖b‖ is round-off and counts as zero.</li>
 *   <li>Gain: the factored shape with unit gain is matched to the exact response at a test point
 *       s = j·ω chosen as far as possible (relatively) from every pole and zero.</li>
 * </ul>
 * All of this works on A/ω with ω a power of two near the geometric mean of the eigenvalue
 * magnitudes (exact scaling). Eigenvalues with modulus below
 * 1e−12 of the largest are taken as exact roots at the origin (integrators or differentiators).
 */
final class StateSpaceToTransferFunction {

    /** Relative tolerance for pole-zero cancellation of uncontrollable/unobservable modes. */
    static final double CANCELLATION_TOLERANCE = 1e-8;
    private static final double ORIGIN_TOLERANCE = 1e-12;
    /** |b₂| / ‖b‖ below which a deflated feed-through is round-off, i.e. zero. */
    private static final double FEEDTHROUGH_TOLERANCE = 1e-12;

    private StateSpaceToTransferFunction() {
    }

    /** Factored form of a single-input single-output model (see the class description). */
    static TransferFunction convert(StateSpace siso) {
        int n = siso.stateCount();
        double d = siso.d().get(0, 0);
        if (n == 0) {
            return TransferFunction.constant(d);
        }
        DMatrixRMaj a = siso.a();
        DMatrixRMaj b = siso.b();
        DMatrixRMaj c = siso.c();
        double[] re = new double[n];
        double[] im = new double[n];
        Eigenvalues.of(a, re, im);
        double omega = PolynomialRoots.powerOfTwoScale(geometricMeanModulus(re, im));
        CommonOps_DDRM.scale(1 / omega, a);

        // zeros of (A/ω, b, c, d·ω) are the zeros of (A, b, c, d) divided by ω
        List<double[]> zerosScaled = invariantZeros(a, b, c, d * omega);
        if (zerosScaled == null) {
            return TransferFunction.constant(0);
        }
        List<double[]> polesScaled = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            polesScaled.add(new double[] {re[i] / omega, im[i] / omega});
        }
        double largest = 0;
        for (List<double[]> l : List.of(polesScaled, zerosScaled)) {
            for (double[] z : l) {
                largest = Math.max(largest, Math.hypot(z[0], z[1]));
            }
        }
        double originLimit = ORIGIN_TOLERANCE * largest;
        List<Root> poles = new ArrayList<>();
        int polesAtOrigin = toRoots(polesScaled, omega, originLimit, poles);
        List<Root> zeros = new ArrayList<>();
        int zerosAtOrigin = toRoots(zerosScaled, omega, originLimit, zeros);
        TransferFunction shape = TransferFunction.of(1.0, polesAtOrigin - zerosAtOrigin, zeros, poles);
        Complex s = testPoint(shape, omega);
        Complex ratio = siso.evaluateAt(s).divide(shape.evaluateAt(s));
        return shape.times(ratio.getReal()).withCancellations(CANCELLATION_TOLERANCE);
    }

    private static double geometricMeanModulus(double[] re, double[] im) {
        double sum = 0;
        int count = 0;
        for (int i = 0; i < re.length; i++) {
            double m = Math.hypot(re[i], im[i]);
            if (m > 0) {
                sum += Math.log(m);
                count++;
            }
        }
        return count == 0 ? 1.0 : Math.exp(sum / count);
    }

    private static List<double[]> eigenvalues(DMatrixRMaj m) {
        int n = m.numRows;
        double[] re = new double[n];
        double[] im = new double[n];
        if (n > 0) {
            Eigenvalues.of(m, re, im);
        }
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            out.add(new double[] {re[i], im[i]});
        }
        return out;
    }

    /**
     * Invariant zeros of (a, b, c, d), d possibly 0, by orthogonal deflation; {@code null} when the
     * transfer function vanishes identically.
     */
    private static List<double[]> invariantZeros(DMatrixRMaj a, DMatrixRMaj b, DMatrixRMaj c, double d) {
        DMatrixRMaj aa = a.copy();
        DMatrixRMaj bb = b.copy();
        DMatrixRMaj cc = c.copy();
        double dd = d;
        while (dd == 0) {
            int n = aa.numRows;
            double cNorm = NormOps_DDRM.normF(cc);
            if (n == 0 || cNorm == 0) {
                return null;
            }
            // Householder reflector T (symmetric, orthogonal) with c·T = γ·e_nᵀ
            double[] v = cc.data.clone();
            double gamma = -Math.copySign(cNorm, v[n - 1]);
            v[n - 1] -= gamma;
            double vv = 0;
            for (double x : v) {
                vv += x * x;
            }
            DMatrixRMaj t = CommonOps_DDRM.identity(n);
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    t.set(i, j, t.get(i, j) - 2 * v[i] * v[j] / vv);
                }
            }
            DMatrixRMaj tmp = new DMatrixRMaj(n, n);
            DMatrixRMaj at = new DMatrixRMaj(n, n);
            CommonOps_DDRM.mult(aa, t, tmp);
            CommonOps_DDRM.mult(t, tmp, at);
            DMatrixRMaj bt = new DMatrixRMaj(n, 1);
            CommonOps_DDRM.mult(t, bb, bt);
            // expanding det [A − λI, b; c, 0] along the row c = [0 … 0 γ] leaves the system
            // matrix of (A₁₁, b₁, a₂₁, b₂): one state fewer, the same zeros
            double bNorm = NormOps_DDRM.normF(bt);
            aa = block(at, 0, n - 1, 0, n - 1);
            cc = block(at, n - 1, n, 0, n - 1);
            bb = block(bt, 0, n - 1, 0, 1);
            dd = bt.get(n - 1, 0);
            if (Math.abs(dd) <= FEEDTHROUGH_TOLERANCE * bNorm) {
                dd = 0;
            }
        }
        DMatrixRMaj az = aa.copy();
        if (az.numRows > 0) {
            CommonOps_DDRM.multAdd(-1 / dd, bb, cc, az);
        }
        return eigenvalues(az);
    }

    /** Sub-matrix rows [r0, r1) × columns [c0, c1), possibly empty. */
    private static DMatrixRMaj block(DMatrixRMaj m, int r0, int r1, int c0, int c1) {
        DMatrixRMaj out = new DMatrixRMaj(r1 - r0, c1 - c0);
        for (int i = r0; i < r1; i++) {
            for (int j = c0; j < c1; j++) {
                out.set(i - r0, j - c0, m.get(i, j));
            }
        }
        return out;
    }

    /**
     * Converts scaled eigenvalues to roots in rad/s, pairing conjugates; returns how many were at
     * the origin.
     */
    private static int toRoots(List<double[]> scaled, double omega, double originLimit, List<Root> out) {
        int atOrigin = 0;
        List<double[]> rest = new ArrayList<>();
        for (double[] z : scaled) {
            if (Math.hypot(z[0], z[1]) <= originLimit) {
                atOrigin++;
            } else {
                rest.add(z);
            }
        }
        boolean[] used = new boolean[rest.size()];
        for (int i = 0; i < rest.size(); i++) {
            if (used[i]) {
                continue;
            }
            used[i] = true;
            double[] z = rest.get(i);
            double mod = Math.hypot(z[0], z[1]);
            if (Math.abs(z[1]) <= PolynomialRoots.REAL_TOLERANCE * mod) {
                out.add(Root.real(z[0] * omega));
                continue;
            }
            int partner = -1;
            double best = Double.POSITIVE_INFINITY;
            for (int j = 0; j < rest.size(); j++) {
                double[] w = rest.get(j);
                if (!used[j] && Math.signum(w[1]) == -Math.signum(z[1])) {
                    double dist = Math.hypot(w[0] - z[0], w[1] + z[1]);
                    if (dist < best) {
                        best = dist;
                        partner = j;
                    }
                }
            }
            if (partner < 0) {
                out.add(Root.real(z[0] * omega));
                continue;
            }
            used[partner] = true;
            double[] w = rest.get(partner);
            out.add(new Root(0.5 * (z[0] + w[0]) * omega, 0.5 * (Math.abs(z[1]) + Math.abs(w[1])) * omega));
        }
        return atOrigin;
    }

    /** s = j·ω·k for the k among a few candidates that keeps the largest relative root distance. */
    private static Complex testPoint(TransferFunction shape, double omega) {
        double[] factors = {1.0, 0.618, 1.618, 0.3, 3.3, 0.1, 10.0, 0.031, 31.0};
        Complex best = new Complex(0, omega);
        double bestD = -1;
        for (double k : factors) {
            Complex s = new Complex(0, omega * k);
            double dmin = Double.POSITIVE_INFINITY;
            for (List<Root> roots : List.of(shape.poles(), shape.zeros())) {
                for (Root r : roots) {
                    double dd = Math.min(s.subtract(new Complex(r.re(), r.im())).abs(),
                            s.subtract(new Complex(r.re(), -r.im())).abs()) / Math.max(s.abs(), r.omega0());
                    dmin = Math.min(dmin, dd);
                }
            }
            if (dmin > bestD) {
                bestD = dmin;
                best = s;
            }
        }
        return best;
    }
}
