package org.flyloop.network;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.linear.Root;

/**
 * A real polynomial in s with coefficients in ascending powers, just enough to form the exact
 * finite-gain-bandwidth response of the op-amp networks (products, sums, roots).
 */
final class Polynomial {
    // Below this |Im|/|r| a root found numerically is taken as real.
    private static final double REAL_ROOT_TOLERANCE = 1e-12;

    private final double[] c;

    private Polynomial(double[] ascending) {
        int n = ascending.length;
        while (n > 1 && ascending[n - 1] == 0) {
            n--;
        }
        this.c = Arrays.copyOf(ascending, Math.max(n, 1));
    }

    /** c0 + c1·s + c2·s² + … */
    static Polynomial of(double... ascending) {
        return new Polynomial(ascending);
    }

    int degree() {
        return c.length - 1;
    }

    double coefficient(int power) {
        return power < c.length ? c[power] : 0;
    }

    Polynomial plus(Polynomial o) {
        double[] r = new double[Math.max(c.length, o.c.length)];
        for (int i = 0; i < r.length; i++) {
            r[i] = coefficient(i) + o.coefficient(i);
        }
        return new Polynomial(r);
    }

    Polynomial times(Polynomial o) {
        double[] r = new double[c.length + o.c.length - 1];
        for (int i = 0; i < c.length; i++) {
            for (int j = 0; j < o.c.length; j++) {
                r[i + j] += c[i] * o.c[j];
            }
        }
        return new Polynomial(r);
    }

    Polynomial times(double k) {
        double[] r = c.clone();
        for (int i = 0; i < r.length; i++) {
            r[i] *= k;
        }
        return new Polynomial(r);
    }

    /** Multiplies by s. */
    Polynomial timesS() {
        double[] r = new double[c.length + 1];
        System.arraycopy(c, 0, r, 1, c.length);
        return new Polynomial(r);
    }

    /** Number of exact zero coefficients at the low end: the multiplicity of the root at s = 0. */
    int rootsAtOrigin() {
        int n = 0;
        while (n < c.length - 1 && c[n] == 0) {
            n++;
        }
        return n;
    }

    /** This polynomial divided by s^n, for n ≤ {@link #rootsAtOrigin()}. */
    Polynomial dividedByS(int n) {
        return new Polynomial(Arrays.copyOfRange(c, n, c.length));
    }

    /**
     * The roots, each real root once and each complex pair once by its upper member. Requires a
     * non-zero constant term. Laguerre's method on a copy scaled so that the roots are of order 1,
     * then Newton polishing on the same scaled polynomial.
     */
    List<Root> roots() {
        if (c[0] == 0) {
            throw new IllegalStateException("divide out the roots at the origin first");
        }
        int n = degree();
        List<Root> out = new ArrayList<>();
        if (n == 0) {
            return out;
        }
        if (n == 1) {
            out.add(Root.real(-c[0] / c[1]));
            return out;
        }
        double sigma = Math.pow(Math.abs(c[0] / c[n]), 1.0 / n);
        double[] b = new double[n + 1];
        double big = 0;
        for (int k = 0; k <= n; k++) {
            b[k] = c[k] * Math.pow(sigma, k);
            big = Math.max(big, Math.abs(b[k]));
        }
        for (int k = 0; k <= n; k++) {
            b[k] /= big;
        }
        Complex[] found = new LaguerreSolver(1e-15, 1e-15, 1e-300).solveAllComplex(b, 0.0, 100_000);
        int counted = 0;
        for (Complex x0 : found) {
            Complex x = polish(b, x0);
            double re = x.getReal() * sigma;
            double im = x.getImaginary() * sigma;
            if (Math.abs(im) <= REAL_ROOT_TOLERANCE * Math.hypot(re, im)) {
                out.add(Root.real(re));
                counted++;
            } else if (im > 0) {
                out.add(new Root(re, im));
                counted += 2;
            }
        }
        if (counted != n) {
            throw new ArithmeticException("root finding did not return conjugate pairs for " + this);
        }
        return out;
    }

    private static Complex polish(double[] b, Complex x) {
        for (int iter = 0; iter < 8; iter++) {
            Complex p = new Complex(b[b.length - 1]);
            Complex dp = Complex.ZERO;
            for (int k = b.length - 2; k >= 0; k--) {
                dp = dp.multiply(x).add(p);
                p = p.multiply(x).add(b[k]);
            }
            if (dp.abs() == 0) {
                break;
            }
            Complex step = p.divide(dp);
            x = x.subtract(step);
            if (step.abs() <= 1e-16 * x.abs()) {
                break;
            }
        }
        return x;
    }

    @Override
    public String toString() {
        return "Polynomial" + Arrays.toString(c);
    }
}
