package org.flyloop.linear;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.DMatrixRMaj;

/**
 * Realises a proper factored transfer function as a series (cascade) of real first- and
 * second-order sections.
 *
 * <p>Why a cascade and not a companion (controllable canonical) form: a companion matrix holds the
 * denominator's polynomial coefficients, which for poles from 1 Hz to 1 MHz span dozens of decades
 * and determine the roots only ill-conditionedly, so both (sI − A)⁻¹ and eig(A) lose many digits.
 * In the cascade every pole is written into A directly — a real pole p as the 1×1 block [p], a pair
 * σ ± jω as the normal 2×2 block [σ ω; −ω σ] — and A is block lower-triangular, so its
 * eigenvalues are exactly the stored poles and each block is as well conditioned as its root.
 *
 * <p>Zeros are distributed to the sections nearest in frequency (pairs first, so every section
 * stays proper), the gain is spread evenly over the sections, and each section's input and
 * output vectors are scaled to equal magnitude so no state is much larger than the others.
 */
final class CascadeRealization {

    private CascadeRealization() {
    }

    /** One section: up to two poles and at most as many zeros; roots at the origin counted apart. */
    private static final class Section {
        final List<Root> poles = new ArrayList<>();
        int polesAtOrigin;
        final List<Root> zeros = new ArrayList<>();
        int zerosAtOrigin;

        int poleOrder() {
            return order(poles) + polesAtOrigin;
        }

        int capacity() {
            return poleOrder() - order(zeros) - zerosAtOrigin;
        }

        /** log of the geometric mean pole magnitude; origin poles count as extremely low. */
        double logFrequency() {
            double sum = 0;
            for (Root p : poles) {
                sum += Math.log(p.omega0()) * p.order();
            }
            sum += polesAtOrigin * Math.log(Double.MIN_NORMAL);
            return sum / poleOrder();
        }
    }

    /** The cascade realisation of a proper h; a static gain for h without poles. */
    static StateSpace realize(TransferFunction h) {
        if (!h.isProper()) {
            throw new IllegalArgumentException("an improper transfer function has no state-space model: " + h);
        }
        List<Section> sections = new ArrayList<>();
        for (Root p : h.poles()) {
            Section s = new Section();
            s.poles.add(p);
            sections.add(s);
        }
        for (int i = 0; i < h.integrators(); i++) {
            Section s = new Section();
            s.polesAtOrigin = 1;
            sections.add(s);
        }
        if (sections.isEmpty()) {
            return StateSpace.of(new double[0][0], new double[0][0], new double[0][0],
                    new double[][] {{h.gain()}});
        }
        for (Root z : h.zeros()) {
            if (z.isPair()) {
                placePair(z, sections);
            }
        }
        for (Root z : h.zeros()) {
            if (!z.isPair()) {
                nearestWithCapacity(Math.log(z.omega0()), 1, -1, sections).zeros.add(z);
            }
        }
        for (int i = 0; i < -h.integrators(); i++) {
            nearestWithCapacity(Math.log(Double.MIN_NORMAL), 1, -1, sections).zerosAtOrigin++;
        }
        sections.sort(Comparator.comparingDouble(Section::logFrequency));
        double share = Math.pow(Math.abs(h.gain()), 1.0 / sections.size());
        StateSpace result = null;
        for (int i = 0; i < sections.size(); i++) {
            double k = i == 0 ? Math.copySign(share, h.gain()) : share;
            StateSpace s = realizeSection(sections.get(i), k);
            result = result == null ? s : result.series(s);
        }
        return result;
    }

    /** A pair of zeros goes to a free second-order section, or two first-order sections merge. */
    private static void placePair(Root z, List<Section> sections) {
        double lf = Math.log(z.omega0());
        Section target = nearestWithCapacity(lf, 2, 2, sections);
        if (target == null) {
            Section first = nearestWithCapacity(lf, 1, 1, sections);
            sections.remove(first);
            Section second = nearestWithCapacity(lf, 1, 1, sections);
            sections.remove(second);
            target = new Section();
            target.poles.addAll(first.poles);
            target.poles.addAll(second.poles);
            target.polesAtOrigin = first.polesAtOrigin + second.polesAtOrigin;
            sections.add(target);
        }
        target.zeros.add(z);
    }

    /**
     * The section closest in log-frequency with at least {@code need} free zero slots and, when
     * {@code order} &gt; 0, of that pole order; {@code null} if none (never for a proper h).
     */
    private static Section nearestWithCapacity(double logFreq, int need, int order, List<Section> sections) {
        Section best = null;
        double bestD = Double.POSITIVE_INFINITY;
        for (Section s : sections) {
            if (s.capacity() >= need && (order < 0 || s.poleOrder() == order)) {
                double d = Math.abs(s.logFrequency() - logFreq);
                if (best == null || d < bestD) {
                    best = s;
                    bestD = d;
                }
            }
        }
        if (best == null && order < 0) {
            throw new IllegalStateException("no section left for a zero; transfer function not proper");
        }
        return best;
    }

    private static int order(List<Root> roots) {
        int n = 0;
        for (Root r : roots) {
            n += r.order();
        }
        return n;
    }

    /** State-space model of k·N(s)/D(s) for one section, D made monic. */
    private static StateSpace realizeSection(Section s, double k) {
        Polynomial num = Polynomial.ofNormalizedFactors(s.zeros).times(Polynomial.monomial(s.zerosAtOrigin)).times(k);
        Polynomial den = Polynomial.ofNormalizedFactors(s.poles).times(Polynomial.monomial(s.polesAtOrigin));
        double lead = den.coefficient(den.degree());
        num = num.times(1 / lead);
        double direct = num.coefficient(den.degree());
        if (den.degree() == 1) {
            double p = s.polesAtOrigin == 1 ? 0.0 : s.poles.get(0).re();
            // k·N/D = n1 + N(p)/(s − p)
            double residue = num.evaluate(p);
            double g = residue == 0 ? 1.0 : Math.sqrt(Math.abs(residue));
            return StateSpace.of(new double[][] {{p}}, new double[][] {{g}}, new double[][] {{residue / g}},
                    new double[][] {{direct}});
        }
        if (s.poles.size() == 1 && s.poles.get(0).isPair()) {
            Root r = s.poles.get(0);
            double sigma = r.re();
            double omega = r.im();
            // y = direct + b·(c1·ω + c2·(s − σ))/D, and at s = σ + jω: N(λ) = b·ω·(c1 + j·c2)
            Complex nAtPole = num.evaluate(new Complex(sigma, omega));
            double mag = nAtPole.abs();
            double bGain = mag == 0 ? 1.0 : Math.sqrt(mag / omega);
            double c1 = nAtPole.getReal() / (bGain * omega);
            double c2 = nAtPole.getImaginary() / (bGain * omega);
            return StateSpace.of(new double[][] {{sigma, omega}, {-omega, sigma}},
                    new double[][] {{0}, {bGain}}, new double[][] {{c1, c2}}, new double[][] {{direct}});
        }
        // two real poles p1, p2 (either may be 0): x1' = p1·x1 + g1·u, x2' = p2·x2 + g2·x1
        double[] p = new double[2];
        int idx = 0;
        for (Root r : s.poles) {
            p[idx++] = r.re();
        }
        double p1 = p[0];
        double p2 = p[1];
        // R = N − direct·D = r1·s + r0 with c1·g1 = r1 and c2·g1·g2 = R(p2) = N(p2)
        double r1 = num.coefficient(1) + direct * (p1 + p2);
        double atP2 = num.evaluate(p2);
        double g2 = sectionScale(s);
        double size = Math.abs(r1) + Math.abs(atP2) / g2;
        double g1 = size == 0 ? 1.0 : Math.sqrt(size);
        DMatrixRMaj a = new DMatrixRMaj(new double[][] {{p1, 0}, {g2, p2}});
        return StateSpace.of(a, new DMatrixRMaj(new double[][] {{g1}, {0}}),
                new DMatrixRMaj(new double[][] {{r1 / g1, atP2 / (g1 * g2)}}),
                new DMatrixRMaj(new double[][] {{direct}}));
    }

    /** Geometric mean of the section's non-zero root magnitudes, 1 if it has none. */
    private static double sectionScale(Section s) {
        double sum = 0;
        int n = 0;
        for (List<Root> roots : List.of(s.poles, s.zeros)) {
            for (Root r : roots) {
                sum += Math.log(r.omega0()) * r.order();
                n += r.order();
            }
        }
        return n == 0 ? 1.0 : Math.exp(sum / n);
    }
}
