package org.flyloop.linear;

import java.util.ArrayList;
import java.util.List;

/**
 * Sums and feedback connections of factored transfer functions. Known factors are carried over
 * untouched (common poles of a sum, the zeros of G and the poles of H in G/(1+G·H)); only the
 * genuinely new roots — the numerator of a sum, the closed-loop characteristic polynomial — are
 * computed, by {@link FactoredSum} with frequency scaling and polishing against the factored form.
 */
final class RationalAlgebra {

    private RationalAlgebra() {
    }

    /**
     * H1 + H2 over the least common denominator: poles shared within {@code tolerance} (relative)
     * appear once, so H + H has the poles of H, not their squares.
     */
    static TransferFunction sum(TransferFunction h1, TransferFunction h2, double tolerance) {
        if (h1.gain() == 0) {
            return h2;
        }
        if (h2.gain() == 0) {
            return h1;
        }
        List<Root> only1 = new ArrayList<>(h1.poles());
        List<Root> only2 = new ArrayList<>();
        List<Root> common = new ArrayList<>();
        for (Root p : h2.poles()) {
            int match = nearest(only1, p, tolerance);
            if (match >= 0) {
                common.add(only1.remove(match));
            } else {
                only2.add(p);
            }
        }
        int m = Math.max(h1.integrators(), h2.integrators());
        List<Root> roots1 = new ArrayList<>(h1.zeros());
        roots1.addAll(only2);
        List<Root> roots2 = new ArrayList<>(h2.zeros());
        roots2.addAll(only1);
        FactoredSum numerator = new FactoredSum(List.of(
                new FactoredSum.Term(h1.gain(), m - h1.integrators(), roots1),
                new FactoredSum.Term(h2.gain(), m - h2.integrators(), roots2)));
        PolynomialRoots.Factorization f = numerator.factor();
        if (f == null) {
            return TransferFunction.constant(0);
        }
        List<Root> poles = new ArrayList<>(common);
        poles.addAll(only1);
        poles.addAll(only2);
        return TransferFunction.cancel(f.lowestCoefficient(), m - f.rootsAtOrigin(), f.roots(), poles,
                tolerance);
    }

    /**
     * G/(1 + G·H) (negative feedback through H). With G = Ng/Dg and H = Nh/Dh this is
     * Ng·Dh / (Dg·Dh + Ng·Nh): the zeros of G and the poles of H are the closed-loop zeros, the
     * roots of Dg·Dh + Ng·Nh the closed-loop poles.
     *
     * @throws ArithmeticException when 1 + G·H vanishes identically (an algebraic loop)
     */
    static TransferFunction feedback(TransferFunction g, TransferFunction h, double tolerance) {
        if (g.gain() == 0) {
            return g;
        }
        int gNumPower = Math.max(-g.integrators(), 0);
        int gDenPower = Math.max(g.integrators(), 0);
        int hNumPower = Math.max(-h.integrators(), 0);
        int hDenPower = Math.max(h.integrators(), 0);
        List<Root> openPoles = new ArrayList<>(g.poles());
        openPoles.addAll(h.poles());
        List<Root> openZeros = new ArrayList<>(g.zeros());
        openZeros.addAll(h.zeros());
        FactoredSum characteristic = new FactoredSum(List.of(
                new FactoredSum.Term(1.0, gDenPower + hDenPower, openPoles),
                new FactoredSum.Term(g.gain() * h.gain(), gNumPower + hNumPower, openZeros)));
        PolynomialRoots.Factorization f = characteristic.factor();
        if (f == null) {
            throw new ArithmeticException("1 + G·H vanishes identically: the loop is ill-posed");
        }
        List<Root> zeros = new ArrayList<>(g.zeros());
        zeros.addAll(h.poles());
        int integrators = f.rootsAtOrigin() - gNumPower - hDenPower;
        return TransferFunction.cancel(g.gain() / f.lowestCoefficient(), integrators, zeros, f.roots(),
                tolerance);
    }

    /**
     * Removes every zero whose relative distance to a pole of the same kind (real or pair) is at
     * most {@code tol}, together with that pole; both factors equal 1 at s = 0, so the gain stays.
     */
    static TransferFunction cancel(double gain, int integrators, List<Root> zeros, List<Root> poles,
                                   double tol) {
        List<Root> z = new ArrayList<>(zeros);
        List<Root> p = new ArrayList<>(poles);
        for (int i = z.size() - 1; i >= 0; i--) {
            Root zi = z.get(i);
            int best = -1;
            double bestD = tol;
            for (int j = 0; j < p.size(); j++) {
                Root pj = p.get(j);
                if (pj.isPair() != zi.isPair()) {
                    continue;
                }
                double d = zi.relativeDistance(pj);
                if (d <= bestD) {
                    bestD = d;
                    best = j;
                }
            }
            if (best >= 0) {
                z.remove(i);
                p.remove(best);
            }
        }
        return TransferFunction.of(gain, integrators, z, p);
    }

    private static int nearest(List<Root> candidates, Root r, double tolerance) {
        int best = -1;
        double bestD = tolerance;
        for (int i = 0; i < candidates.size(); i++) {
            Root c = candidates.get(i);
            if (c.isPair() == r.isPair()) {
                double d = c.relativeDistance(r);
                if (d <= bestD) {
                    bestD = d;
                    best = i;
                }
            }
        }
        return best;
    }
}
