package org.flyloop.linear;

import java.util.ArrayList;
import java.util.List;

/**
 * A polynomial given as a sum of factored products,
 * <pre>
 *   P(s) = Σₜ cₜ · s^eₜ · Π (1 − s/r)   (pairs as 1 + s/(ω0·Q) + s²/ω0²)
 * </pre>
 * which is how the numerator of a sum and the characteristic polynomial of a feedback loop arise
 * from factored transfer functions. Root finding starts from the expanded coefficients and then
 * polishes against this representation, whose evaluation keeps the full relative accuracy of each
 * factor: only the cancellation between terms that is inherent to the problem remains.
 */
final class FactoredSum {

    /** One product term cₜ · s^eₜ · Π(1 − s/r). */
    record Term(double coefficient, int power, List<Root> roots) {
        Term {
            if (power < 0) {
                throw new IllegalArgumentException("power must be >= 0");
            }
            roots = List.copyOf(roots);
        }
    }

    private final List<Term> terms;

    FactoredSum(List<Term> terms) {
        this.terms = List.copyOf(terms);
    }

    /**
     * Factors P as lowestCoefficient · s^k · Π(1 − s/r). A coefficient whose magnitude is below
     * the round-off of its own computation (64·ε·(n+1) times the sum of the terms' magnitudes at
     * that power) is taken as zero at the low end (a root at the origin) and at the high end
     * (degree drop), so exact algebraic cancellation is recognised.
     *
     * @return the factorization, or {@code null} when P vanishes identically
     */
    PolynomialRoots.Factorization factor() {
        double omega = scale();
        List<Term> scaled = scaledTerms(omega);
        int n = 0;
        List<Polynomial> parts = new ArrayList<>();
        for (Term t : scaled) {
            Polynomial p = Polynomial.ofNormalizedFactors(t.roots()).times(Polynomial.monomial(t.power()))
                    .times(t.coefficient());
            parts.add(p);
            n = Math.max(n, p.degree());
        }
        double[] sum = new double[n + 1];
        double[] size = new double[n + 1];
        for (Polynomial p : parts) {
            for (int k = 0; k <= p.degree(); k++) {
                sum[k] += p.coefficient(k);
                size[k] += Math.abs(p.coefficient(k));
            }
        }
        double eps = 64 * Math.ulp(1.0) * (n + 1);
        int lo = 0;
        while (lo <= n && Math.abs(sum[lo]) <= eps * size[lo]) {
            lo++;
        }
        if (lo > n) {
            return null;
        }
        int hi = n;
        while (Math.abs(sum[hi]) <= eps * size[hi]) {
            hi--;
        }
        double[] reduced = new double[hi - lo + 1];
        System.arraycopy(sum, lo, reduced, 0, reduced.length);
        AnalyticFunction f = evaluator(scaled);
        List<Root> rx = reduced.length > 1 ? PolynomialRoots.nonZeroRoots(reduced, f) : List.of();
        return new PolynomialRoots.Factorization(sum[lo] / Math.pow(omega, lo), lo,
                PolynomialRoots.scale(rx, omega));
    }

    /** Power of two near the geometric mean of all root magnitudes (1 without roots). */
    private double scale() {
        double logSum = 0;
        int count = 0;
        for (Term t : terms) {
            for (Root r : t.roots()) {
                logSum += Math.log(r.omega0()) * r.order();
                count += r.order();
            }
        }
        return count == 0 ? 1.0 : PolynomialRoots.powerOfTwoScale(Math.exp(logSum / count));
    }

    /** The same sum in x = s/ω: roots divided by ω, coefficients times ω^eₜ. */
    private List<Term> scaledTerms(double omega) {
        List<Term> out = new ArrayList<>();
        for (Term t : terms) {
            List<Root> rs = new ArrayList<>();
            for (Root r : t.roots()) {
                rs.add(new Root(r.re() / omega, r.im() / omega));
            }
            out.add(new Term(t.coefficient() * Math.pow(omega, t.power()), t.power(), rs));
        }
        return out;
    }

    /** Value and derivative by the product rule, factor by factor, without expanding. */
    private static AnalyticFunction evaluator(List<Term> terms) {
        return (sr, si, out) -> {
            double vr = 0, vi = 0, dr = 0, di = 0;
            for (Term t : terms) {
                // running product (pr + j·pi) and its derivative (qr + j·qi)
                double pr = t.coefficient(), pi = 0, qr = 0, qi = 0;
                for (int e = 0; e < t.power(); e++) {
                    double nq = qr * sr - qi * si + pr;
                    qi = qr * si + qi * sr + pi;
                    qr = nq;
                    double np = pr * sr - pi * si;
                    pi = pr * si + pi * sr;
                    pr = np;
                }
                for (Root r : t.roots()) {
                    double fr, fi, gr, gi;
                    if (r.isPair()) {
                        double m2 = r.re() * r.re() + r.im() * r.im();
                        double a1 = -2 * r.re() / m2;
                        double a2 = 1 / m2;
                        fr = 1 + a1 * sr + a2 * (sr * sr - si * si);
                        fi = a1 * si + a2 * 2 * sr * si;
                        gr = a1 + 2 * a2 * sr;
                        gi = 2 * a2 * si;
                    } else {
                        fr = 1 - sr / r.re();
                        fi = -si / r.re();
                        gr = -1 / r.re();
                        gi = 0;
                    }
                    // (p, q) := (p·f, q·f + p·g)
                    double nq = qr * fr - qi * fi + pr * gr - pi * gi;
                    qi = qr * fi + qi * fr + pr * gi + pi * gr;
                    qr = nq;
                    double np = pr * fr - pi * fi;
                    pi = pr * fi + pi * fr;
                    pr = np;
                }
                vr += pr;
                vi += pi;
                dr += qr;
                di += qi;
            }
            out[0] = vr;
            out[1] = vi;
            out[2] = dr;
            out[3] = di;
        };
    }
}
