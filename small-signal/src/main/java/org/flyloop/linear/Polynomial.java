package org.flyloop.linear;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.complex.Complex;

/**
 * A real polynomial in s, stored by its coefficients in <b>ascending</b> powers of s:
 * {@code coefficientsAscending()[k]} multiplies s^k. Every method of this package that takes or
 * returns polynomial coefficients uses this order.
 *
 * <p>Trailing zero coefficients (of the highest powers) are dropped, so {@link #degree()} is the
 * true degree; the zero polynomial has the single coefficient 0 and degree 0.
 *
 * <p>Instances are immutable.
 */
public final class Polynomial {

    private static final Polynomial ZERO = new Polynomial(new double[] {0.0});
    private static final Polynomial ONE = new Polynomial(new double[] {1.0});

    private final double[] c;

    private Polynomial(double[] trimmed) {
        this.c = trimmed;
    }

    /**
     * The polynomial c[0] + c[1]·s + … + c[n]·s^n (ascending powers). Coefficients must be finite.
     */
    public static Polynomial ofAscending(double... coefficientsAscending) {
        for (double v : coefficientsAscending) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("coefficients must be finite: "
                        + Arrays.toString(coefficientsAscending));
            }
        }
        int n = coefficientsAscending.length;
        while (n > 1 && coefficientsAscending[n - 1] == 0) {
            n--;
        }
        if (n == 0) {
            return ZERO;
        }
        return new Polynomial(Arrays.copyOf(coefficientsAscending, n));
    }

    /** The constant polynomial {@code value}. */
    public static Polynomial constant(double value) {
        return ofAscending(value);
    }

    /** s^n. */
    public static Polynomial monomial(int power) {
        if (power < 0) {
            throw new IllegalArgumentException("power must be >= 0: " + power);
        }
        double[] c = new double[power + 1];
        c[power] = 1;
        return new Polynomial(c);
    }

    /**
     * The product Π(1 − s/r) over the given roots, a pair contributing
     * 1 + s/(ω0·Q) + s²/ω0² (its value at s = 0 is 1, matching {@link TransferFunction}).
     */
    public static Polynomial ofNormalizedFactors(List<Root> roots) {
        Polynomial p = ONE;
        for (Root r : roots) {
            p = p.times(factorOf(r));
        }
        return p;
    }

    /** The factor of one root with unit value at s = 0: (1 − s/r) or (1 − s/r)(1 − s/r̄). */
    static Polynomial factorOf(Root r) {
        if (!r.isPair()) {
            return new Polynomial(new double[] {1.0, -1.0 / r.re()});
        }
        double m2 = r.re() * r.re() + r.im() * r.im();
        return new Polynomial(new double[] {1.0, -2.0 * r.re() / m2, 1.0 / m2});
    }

    /** A copy of the coefficients, ascending powers of s. */
    public double[] coefficientsAscending() {
        return c.clone();
    }

    /** Coefficient of s^power (0 beyond the degree). */
    public double coefficient(int power) {
        return power < c.length ? c[power] : 0.0;
    }

    /** Highest power with a non-zero coefficient (0 for constants, including zero). */
    public int degree() {
        return c.length - 1;
    }

    public boolean isZero() {
        return c.length == 1 && c[0] == 0;
    }

    /** Number of exactly-zero low-order coefficients, i.e. the multiplicity of the root s = 0. */
    public int rootsAtOrigin() {
        if (isZero()) {
            throw new ArithmeticException("the zero polynomial has no defined root count");
        }
        int k = 0;
        while (c[k] == 0) {
            k++;
        }
        return k;
    }

    /** Coefficient-wise sum. */
    public Polynomial plus(Polynomial other) {
        double[] r = new double[Math.max(c.length, other.c.length)];
        for (int i = 0; i < r.length; i++) {
            r[i] = coefficient(i) + other.coefficient(i);
        }
        return ofAscending(r);
    }

    /** Coefficient-wise difference. */
    public Polynomial minus(Polynomial other) {
        return plus(other.times(-1.0));
    }

    /** Every coefficient multiplied by k. */
    public Polynomial times(double k) {
        double[] r = new double[c.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = c[i] * k;
        }
        return ofAscending(r);
    }

    /** Product by convolution of the coefficient sequences: c_k = Σ a_i·b_(k−i). */
    public Polynomial times(Polynomial other) {
        double[] r = new double[c.length + other.c.length - 1];
        for (int i = 0; i < c.length; i++) {
            for (int j = 0; j < other.c.length; j++) {
                r[i + j] += c[i] * other.c[j];
            }
        }
        return ofAscending(r);
    }

    /** The derivative dp/ds. */
    public Polynomial derivative() {
        if (c.length == 1) {
            return ZERO;
        }
        double[] r = new double[c.length - 1];
        for (int i = 1; i < c.length; i++) {
            r[i - 1] = i * c[i];
        }
        return ofAscending(r);
    }

    /**
     * q(x) = p(ω·x): coefficient k multiplied by ω^k. Used for frequency scaling; with ω a power
     * of two the scaling is exact in floating point.
     */
    public Polynomial withScaledArgument(double omega) {
        double[] r = new double[c.length];
        double w = 1;
        for (int i = 0; i < c.length; i++) {
            r[i] = c[i] * w;
            w *= omega;
        }
        return ofAscending(r);
    }

    /** p(x) at a real x by Horner's rule. */
    public double evaluate(double x) {
        double v = 0;
        for (int i = c.length - 1; i >= 0; i--) {
            v = v * x + c[i];
        }
        return v;
    }

    /** p(s) at a complex s by Horner's rule. */
    public Complex evaluate(Complex s) {
        double[] vd = new double[4];
        valueAndDerivative(s.getReal(), s.getImaginary(), vd);
        return new Complex(vd[0], vd[1]);
    }

    /**
     * p(s) and p'(s) at s = re + j·im by Horner's rule, into {@code out} = {Re p, Im p, Re p', Im p'}.
     */
    void valueAndDerivative(double re, double im, double[] out) {
        double pr = 0, pi = 0, dr = 0, di = 0;
        for (int i = c.length - 1; i >= 0; i--) {
            // d = d·s + p ; p = p·s + c
            double ndr = dr * re - di * im + pr;
            double ndi = dr * im + di * re + pi;
            dr = ndr;
            di = ndi;
            double npr = pr * re - pi * im + c[i];
            double npi = pr * im + pi * re;
            pr = npr;
            pi = npi;
        }
        out[0] = pr;
        out[1] = pi;
        out[2] = dr;
        out[3] = di;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Polynomial p && Arrays.equals(c, p.c);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(c);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < c.length; i++) {
            if (i > 0) {
                sb.append(" + ");
            }
            sb.append(String.format("%.6g", c[i]));
            if (i > 0) {
                sb.append("·s^").append(i);
            }
        }
        return sb.toString();
    }
}
