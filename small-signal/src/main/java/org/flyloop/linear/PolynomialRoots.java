package org.flyloop.linear;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixRMaj;

/**
 * Roots of real polynomials: eigenvalues of the balanced companion matrix (EJML), then
 * <ul>
 *   <li>clusters that stand for a multiple root are replaced by their mean when the mean is at
 *       least as good a root as the members (the mean of a perturbed m-fold root is accurate to
 *       round-off, its members only to the m-th root of it);</li>
 *   <li>every other root is polished by Newton's method against a caller-supplied, more accurate
 *       evaluation of the same function, accepting a step only while |f| decreases and the root
 *       stays well inside its neighbourhood, so polishing can never jump to another root;</li>
 *   <li>near-conjugates are paired and stored as one {@link Root}; a root whose imaginary part is
 *       below 1e-10 of its modulus is taken as real.</li>
 * </ul>
 * The companion-matrix approach and its backward stability are discussed in A. Edelman and
 * H. Murakami, "Polynomial roots from companion matrix eigenvalues", Mathematics of Computation
 * 64 (1995) 763–776.
 */
final class PolynomialRoots {

    /** Relative imaginary part below which a root is real. */
    static final double REAL_TOLERANCE = 1e-10;
    /** Relative radius within which roots are candidates for one multiple root. */
    private static final double CLUSTER_RADIUS = 1e-3;

    private PolynomialRoots() {
    }

    /**
     * p(s) = lowestCoefficient · s^rootsAtOrigin · Π(1 − s/r) over {@code roots}.
     */
    record Factorization(double lowestCoefficient, int rootsAtOrigin, List<Root> roots) {
    }

    /**
     * Factors a polynomial given in ascending coefficients. Exactly-zero low-order coefficients
     * count as roots at the origin; the rest are found after scaling s = ω·x with ω a power of two
     * near the geometric mean of the root magnitudes, (|c_k / c_n|)^(1/(n−k)), and polished against
     * Horner evaluation of the scaled polynomial.
     */
    static Factorization factor(Polynomial p) {
        if (p.isZero()) {
            throw new ArithmeticException("the zero polynomial has no factorization");
        }
        int k = p.rootsAtOrigin();
        double[] c = p.coefficientsAscending();
        double[] reduced = new double[c.length - k];
        System.arraycopy(c, k, reduced, 0, reduced.length);
        Polynomial q = Polynomial.ofAscending(reduced);
        if (q.degree() == 0) {
            return new Factorization(reduced[0], k, List.of());
        }
        double omega = powerOfTwoScale(Math.pow(Math.abs(reduced[0] / reduced[reduced.length - 1]),
                1.0 / q.degree()));
        Polynomial scaled = q.withScaledArgument(omega);
        List<Root> rx = nonZeroRoots(scaled.coefficientsAscending(), scaled::valueAndDerivative);
        return new Factorization(reduced[0], k, scale(rx, omega));
    }

    /** The power of two nearest (in log) to a positive value; 1 for zero or non-finite input. */
    static double powerOfTwoScale(double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            return 1.0;
        }
        return Math.scalb(1.0, (int) Math.round(Math.log(value) / Math.log(2)));
    }

    /** Roots multiplied by ω (exact for a power of two). */
    static List<Root> scale(List<Root> roots, double omega) {
        List<Root> out = new ArrayList<>(roots.size());
        for (Root r : roots) {
            out.add(new Root(r.re() * omega, r.im() * omega));
        }
        return out;
    }

    /**
     * All roots of c[0] + … + c[n]·x^n (ascending, c[0] ≠ 0, c[n] ≠ 0), polished against
     * {@code polish}, which must vanish at the same roots.
     */
    static List<Root> nonZeroRoots(double[] c, AnalyticFunction polish) {
        int n = c.length - 1;
        if (c[0] == 0 || c[n] == 0) {
            throw new IllegalArgumentException("need non-zero constant and leading coefficients");
        }
        if (n == 0) {
            return List.of();
        }
        double[] re = new double[n];
        double[] im = new double[n];
        if (n == 1) {
            re[0] = -c[0] / c[1];
        } else {
            companionEigenvalues(c, re, im);
        }
        boolean[] fixed = averageMultipleRoots(re, im, polish);
        return pairAndPolish(re, im, fixed, polish);
    }

    private static void companionEigenvalues(double[] c, double[] re, double[] im) {
        int n = c.length - 1;
        DMatrixRMaj m = new DMatrixRMaj(n, n);
        for (int j = 0; j < n; j++) {
            m.set(0, j, -c[n - 1 - j] / c[n]);
        }
        for (int i = 1; i < n; i++) {
            m.set(i, i - 1, 1.0);
        }
        eigenvalues(m, re, im);
    }

    /** Eigenvalues of a real square matrix, into re/im; see {@link Eigenvalues}. */
    static void eigenvalues(DMatrixRMaj matrix, double[] re, double[] im) {
        Eigenvalues.of(matrix, re, im);
    }

    /**
     * Finds clusters (single linkage, relative radius {@link #CLUSTER_RADIUS}) and replaces each by
     * its mean if |f(mean)| ≤ 10·max|f(member)|. Returns which entries were replaced.
     */
    private static boolean[] averageMultipleRoots(double[] re, double[] im, AnalyticFunction f) {
        int n = re.length;
        int[] group = new int[n];
        for (int i = 0; i < n; i++) {
            group[i] = i;
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double d = Math.hypot(re[i] - re[j], im[i] - im[j]);
                double m = Math.max(Math.hypot(re[i], im[i]), Math.hypot(re[j], im[j]));
                if (d <= CLUSTER_RADIUS * m) {
                    int gi = find(group, i);
                    int gj = find(group, j);
                    group[Math.max(gi, gj)] = Math.min(gi, gj);
                }
            }
        }
        boolean[] fixed = new boolean[n];
        double[] out = new double[4];
        for (int g = 0; g < n; g++) {
            double sr = 0, si = 0, worst = 0;
            int count = 0;
            for (int i = 0; i < n; i++) {
                if (find(group, i) == g) {
                    sr += re[i];
                    si += im[i];
                    f.valueAndDerivative(re[i], im[i], out);
                    worst = Math.max(worst, Math.hypot(out[0], out[1]));
                    count++;
                }
            }
            if (count < 2) {
                continue;
            }
            double mr = sr / count;
            double mi = si / count;
            f.valueAndDerivative(mr, mi, out);
            if (Math.hypot(out[0], out[1]) <= 10 * worst) {
                for (int i = 0; i < n; i++) {
                    if (find(group, i) == g) {
                        re[i] = mr;
                        im[i] = mi;
                        fixed[i] = true;
                    }
                }
            }
        }
        return fixed;
    }

    private static int find(int[] group, int i) {
        while (group[i] != i) {
            i = group[i];
        }
        return i;
    }

    private static List<Root> pairAndPolish(double[] re, double[] im, boolean[] fixed, AnalyticFunction f) {
        int n = re.length;
        boolean[] used = new boolean[n];
        List<Root> roots = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (used[i]) {
                continue;
            }
            double mod = Math.hypot(re[i], im[i]);
            if (Math.abs(im[i]) <= REAL_TOLERANCE * mod) {
                used[i] = true;
                double r = fixed[i] ? re[i] : polish(re[i], 0, true, re, im, i, -1, f)[0];
                roots.add(Root.real(r));
                continue;
            }
            // pair with the unused entry nearest to the conjugate
            int partner = -1;
            double best = Double.POSITIVE_INFINITY;
            for (int j = 0; j < n; j++) {
                if (j == i || used[j] || Math.signum(im[j]) != -Math.signum(im[i])
                        || Math.abs(im[j]) <= REAL_TOLERANCE * Math.hypot(re[j], im[j])) {
                    continue;
                }
                double d = Math.hypot(re[j] - re[i], im[j] + im[i]);
                if (d < best) {
                    best = d;
                    partner = j;
                }
            }
            used[i] = true;
            if (partner < 0) {
                // a lone complex value cannot belong to a real polynomial: keep its real part
                roots.add(Root.real(fixed[i] ? re[i] : polish(re[i], 0, true, re, im, i, -1, f)[0]));
                continue;
            }
            used[partner] = true;
            double pr = 0.5 * (re[i] + re[partner]);
            double pi = 0.5 * (Math.abs(im[i]) + Math.abs(im[partner]));
            if (!(fixed[i] && fixed[partner])) {
                double[] z = polish(pr, pi, false, re, im, i, partner, f);
                pr = z[0];
                pi = z[1];
            }
            roots.add(new Root(pr, pi));
        }
        return roots;
    }

    /**
     * Newton iteration from (zr, zi) on f; steps are accepted only while |f| decreases and the
     * total move stays below 0.3 × the distance to the nearest other root estimate.
     */
    private static double[] polish(double zr, double zi, boolean real, double[] re, double[] im,
                                   int self, int partner, AnalyticFunction f) {
        double nearest = real ? Double.POSITIVE_INFINITY : 2 * zi;
        for (int j = 0; j < re.length; j++) {
            if (j != self && j != partner) {
                nearest = Math.min(nearest, Math.hypot(re[j] - zr, im[j] - zi));
            }
        }
        double maxMove = 0.3 * nearest;
        double[] out = new double[4];
        f.valueAndDerivative(zr, zi, out);
        double fAbs = Math.hypot(out[0], out[1]);
        double r0 = zr, i0 = zi;
        for (int it = 0; it < 12 && fAbs > 0; it++) {
            double den = out[2] * out[2] + out[3] * out[3];
            if (den == 0) {
                break;
            }
            double sr = (out[0] * out[2] + out[1] * out[3]) / den;
            double si = (out[1] * out[2] - out[0] * out[3]) / den;
            double nr = zr - sr;
            double ni = real ? 0 : zi - si;
            if (!Double.isFinite(nr) || !Double.isFinite(ni) || (!real && ni <= 0)
                    || Math.hypot(nr - r0, ni - i0) > maxMove) {
                break;
            }
            f.valueAndDerivative(nr, ni, out);
            double nAbs = Math.hypot(out[0], out[1]);
            if (!(nAbs < fAbs)) {
                break;
            }
            zr = nr;
            zi = ni;
            fAbs = nAbs;
            if (Math.hypot(sr, real ? 0 : si) <= 4 * Math.ulp(Math.hypot(zr, zi))) {
                break;
            }
        }
        return new double[] {zr, zi};
    }
}
