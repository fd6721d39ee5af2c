package org.flyloop.linear;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.apache.commons.math3.complex.Complex;

/**
 * A rational transfer function kept in factored form,
 * <pre>
 *   H(s) = K · s^(−n) · Π (1 − s/zᵢ) / Π (1 − s/pᵢ)
 * </pre>
 * where K is the low-frequency gain of everything but the {@code n} integrators (n &lt; 0 means
 * differentiators), and zᵢ, pᵢ are non-zero {@link Root}s (real roots or conjugate pairs).
 *
 * <p>Keeping the factors rather than polynomial coefficients lets a response with features from
 * 1 Hz to 1 MHz evaluate without the round-off that polynomial coefficients spanning 60 orders of
 * magnitude would bring. The phase is the sum of the factors' arguments, each continuous in ω, so
 * it comes out unwrapped by construction; a negative K contributes −180°.
 *
 * <p>Polynomial coefficients, where used ({@link #fromPolynomials}, {@link #numeratorPolynomial()}),
 * are in ascending powers of s, as everywhere in this package (see {@link Polynomial}).
 *
 * <p>Instances are immutable.
 */
public final class TransferFunction implements ContinuousPhaseResponse {

    /** Default relative tolerance under which a pole and a zero cancel in products. */
    public static final double DEFAULT_CANCELLATION_TOLERANCE = 1e-9;

    private final double gain;
    private final int integrators;
    private final List<Root> zeros;
    private final List<Root> poles;
    // Hot-loop coefficients: each factor at s = jω is (1 − a2·ω²) + j·a1·ω, i.e. a1 = −1/r,
    // a2 = 0 for a real root and a1 = −2·Re r/|r|², a2 = 1/|r|² for a pair.
    private final double[] zA1, zA2, pA1, pA2;

    private TransferFunction(double gain, int integrators, List<Root> zeros, List<Root> poles) {
        if (!Double.isFinite(gain)) {
            throw new IllegalArgumentException("gain must be finite: " + gain);
        }
        this.gain = gain;
        this.integrators = integrators;
        this.zeros = Collections.unmodifiableList(new ArrayList<>(zeros));
        this.poles = Collections.unmodifiableList(new ArrayList<>(poles));
        zA1 = firstOrderCoefficients(zeros);
        zA2 = secondOrderCoefficients(zeros);
        pA1 = firstOrderCoefficients(poles);
        pA2 = secondOrderCoefficients(poles);
    }

    private static double[] firstOrderCoefficients(List<Root> roots) {
        double[] a = new double[roots.size()];
        for (int i = 0; i < a.length; i++) {
            Root r = roots.get(i);
            a[i] = r.isPair() ? -2 * r.re() / (r.re() * r.re() + r.im() * r.im()) : -1 / r.re();
        }
        return a;
    }

    private static double[] secondOrderCoefficients(List<Root> roots) {
        double[] a = new double[roots.size()];
        for (int i = 0; i < a.length; i++) {
            Root r = roots.get(i);
            a[i] = r.isPair() ? 1 / (r.re() * r.re() + r.im() * r.im()) : 0.0;
        }
        return a;
    }

    /**
     * Builds H(s) = gain · s^(−integrators) · Π(1 − s/z)/Π(1 − s/p). No cancellation is done here.
     */
    public static TransferFunction of(double gain, int integrators, List<Root> zeros, List<Root> poles) {
        return new TransferFunction(gain, integrators, zeros, poles);
    }

    /**
     * N(s)/D(s) from polynomial coefficients. Roots come from balanced companion-matrix eigenvalues
     * after frequency scaling, polished by Newton's method on the given coefficients (see
     * {@link PolynomialRoots}); exactly-zero low-order coefficients become integrators or
     * differentiators; near-conjugates are paired; common roots cancel at
     * {@link #DEFAULT_CANCELLATION_TOLERANCE}. The gain is the exact ratio of the lowest non-zero
     * coefficients. An m-fold root is recovered as m equal roots when its computed cluster averages
     * to a root no worse than its members; otherwise its accuracy is the usual ε^(1/m).
     *
     * @throws ArithmeticException if the denominator is the zero polynomial
     */
    public static TransferFunction fromPolynomials(Polynomial numerator, Polynomial denominator) {
        if (denominator.isZero()) {
            throw new ArithmeticException("zero denominator");
        }
        if (numerator.isZero()) {
            return constant(0);
        }
        PolynomialRoots.Factorization n = PolynomialRoots.factor(numerator);
        PolynomialRoots.Factorization d = PolynomialRoots.factor(denominator);
        return cancel(n.lowestCoefficient() / d.lowestCoefficient(), d.rootsAtOrigin() - n.rootsAtOrigin(),
                n.roots(), d.roots(), DEFAULT_CANCELLATION_TOLERANCE);
    }

    /** {@link #fromPolynomials(Polynomial, Polynomial)} from coefficients in ascending powers of s. */
    public static TransferFunction fromPolynomials(double[] numeratorAscending, double[] denominatorAscending) {
        return fromPolynomials(Polynomial.ofAscending(numeratorAscending),
                Polynomial.ofAscending(denominatorAscending));
    }

    /** A constant gain. */
    public static TransferFunction constant(double gain) {
        return new TransferFunction(gain, 0, List.of(), List.of());
    }

    /** gain / s^n (n integrators; negative n gives differentiators). */
    public static TransferFunction integrators(double gain, int n) {
        return new TransferFunction(gain, n, List.of(), List.of());
    }

    public double gain() {
        return gain;
    }

    public int integrators() {
        return integrators;
    }

    public List<Root> zeros() {
        return zeros;
    }

    public List<Root> poles() {
        return poles;
    }

    /** Number of poles (integrators and pairs counted fully) minus number of zeros. */
    public int relativeDegree() {
        return order(poles) + Math.max(integrators, 0) - order(zeros) - Math.max(-integrators, 0);
    }

    /** Total number of poles, integrators included. */
    public int poleCount() {
        return order(poles) + Math.max(integrators, 0);
    }

    /** Total number of zeros, differentiators included. */
    public int zeroCount() {
        return order(zeros) + Math.max(-integrators, 0);
    }

    /** True when the number of poles is at least the number of zeros (finite gain at infinity). */
    public boolean isProper() {
        return relativeDegree() >= 0;
    }

    /** True when H has a finite value at s = 0, i.e. no net integrators. */
    public boolean hasFiniteDcGain() {
        return integrators <= 0;
    }

    /**
     * H(0): the gain K without integrators, 0 with differentiators.
     *
     * @throws ArithmeticException when H has integrators (infinite DC gain)
     */
    public double dcGain() {
        if (integrators > 0) {
            throw new ArithmeticException("infinite DC gain: " + integrators + " integrator(s)");
        }
        return integrators < 0 ? 0.0 : gain;
    }

    /**
     * Numerator N(s) = K · s^max(−n, 0) · Π(1 − s/z), coefficients in ascending powers of s, so that
     * H = N/D with {@link #denominatorPolynomial()}. Expanding loses the factored form's accuracy
     * for roots spread over many decades; use for export or cross-checks, not for evaluation.
     */
    public Polynomial numeratorPolynomial() {
        return Polynomial.ofNormalizedFactors(zeros).times(Polynomial.monomial(Math.max(-integrators, 0)))
                .times(gain);
    }

    /** Denominator D(s) = s^max(n, 0) · Π(1 − s/p), ascending powers; D has constant term 1 without integrators. */
    public Polynomial denominatorPolynomial() {
        return Polynomial.ofNormalizedFactors(poles).times(Polynomial.monomial(Math.max(integrators, 0)));
    }

    /** Count of poles strictly in the open right half-plane (pairs count two). */
    public int rightHalfPlanePoleCount() {
        int n = 0;
        for (Root p : poles) {
            if (p.isRightHalfPlane()) {
                n += p.order();
            }
        }
        return n;
    }

    private static int order(List<Root> roots) {
        int n = 0;
        for (Root r : roots) {
            n += r.order();
        }
        return n;
    }

    /**
     * Evaluates H(jω) at ω = 2π·f into {@code out[0]} (real) and {@code out[1]} (imaginary),
     * without allocating. This is the hot path of loop-gain sweeps.
     */
    @Override
    public void evaluateInto(double frequencyHz, double[] out) {
        double w = 2 * Math.PI * frequencyHz;
        double w2 = w * w;
        // numerator and denominator products, one complex division at the end
        double nr = gain, ni = 0;
        for (int i = 0; i < zA1.length; i++) {
            double fr = 1 - zA2[i] * w2;
            double fi = zA1[i] * w;
            double t = nr * fr - ni * fi;
            ni = nr * fi + ni * fr;
            nr = t;
        }
        double dr = 1, di = 0;
        for (int i = 0; i < pA1.length; i++) {
            double fr = 1 - pA2[i] * w2;
            double fi = pA1[i] * w;
            double t = dr * fr - di * fi;
            di = dr * fi + di * fr;
            dr = t;
        }
        double d = dr * dr + di * di;
        double re = (nr * dr + ni * di) / d;
        double im = (ni * dr - nr * di) / d;
        if (!Double.isFinite(re) || !Double.isFinite(im) || !(d > 0) || !Double.isFinite(d)) {
            // products over- or underflowed (dozens of roots far apart): divide factor by factor
            evaluateStepwise(w, out);
            return;
        }
        out[0] = re;
        out[1] = im;
        applyIntegrators(w, out);
    }

    /** Same value as {@link #evaluateInto}, dividing by each pole factor in turn (no overflow). */
    private void evaluateStepwise(double w, double[] out) {
        double w2 = w * w;
        double re = gain, im = 0;
        for (int i = 0; i < zA1.length; i++) {
            double fr = 1 - zA2[i] * w2;
            double fi = zA1[i] * w;
            double t = re * fr - im * fi;
            im = re * fi + im * fr;
            re = t;
        }
        for (int i = 0; i < pA1.length; i++) {
            double fr = 1 - pA2[i] * w2;
            double fi = pA1[i] * w;
            double d = fr * fr + fi * fi;
            double t = (re * fr + im * fi) / d;
            im = (im * fr - re * fi) / d;
            re = t;
        }
        out[0] = re;
        out[1] = im;
        applyIntegrators(w, out);
    }

    /** Multiplies out[] by (jω)^(−n). */
    private void applyIntegrators(double w, double[] out) {
        int n = integrators;
        if (n == 0) {
            return;
        }
        double wn = 1;
        for (int i = 0; i < Math.abs(n); i++) {
            wn *= w;
        }
        double mag = n > 0 ? 1 / wn : wn;
        double re = out[0] * mag;
        double im = out[1] * mag;
        int k = Math.floorMod(-n, 4); // j^k
        for (int i = 0; i < k; i++) {
            double t = -im;
            im = re;
            re = t;
        }
        out[0] = re;
        out[1] = im;
    }

    /** H(j·2π·f) as a complex number. */
    @Override
    public Complex evaluate(double frequencyHz) {
        double[] out = new double[2];
        evaluateInto(frequencyHz, out);
        return new Complex(out[0], out[1]);
    }

    /** H(s) at an arbitrary complex s (rad/s); same as {@link #evaluateAt(Complex)}. */
    public Complex evaluate(Complex s) {
        return evaluateAt(s);
    }

    /** H(s) at an arbitrary complex s (rad/s), straight from the factors. */
    public Complex evaluateAt(Complex s) {
        Complex h = new Complex(gain);
        for (Root z : zeros) {
            h = h.multiply(factor(z, s));
        }
        for (Root p : poles) {
            h = h.divide(factor(p, s));
        }
        if (integrators != 0) {
            h = h.multiply(s.pow(-integrators));
        }
        return h;
    }

    private static Complex factor(Root r, Complex s) {
        Complex root = new Complex(r.re(), r.im());
        Complex f = Complex.ONE.subtract(s.divide(root));
        if (r.isPair()) {
            f = f.multiply(Complex.ONE.subtract(s.divide(root.conjugate())));
        }
        return f;
    }

    /** |H(j·2π·f)|. */
    public double magnitude(double frequencyHz) {
        double[] out = new double[2];
        evaluateInto(frequencyHz, out);
        return Math.hypot(out[0], out[1]);
    }

    /** 20·log10 |H(j·2π·f)|. */
    public double magnitudeDb(double frequencyHz) {
        return 20 * Math.log10(magnitude(frequencyHz));
    }

    /**
     * Continuous (unwrapped) phase in degrees at f, as the sum of the factors' arguments:
     * −180° for a negative gain, −90° per integrator, each real factor within (−90°, 90°), each
     * pair within (−180°, 180°). Continuous in f except where a root lies on the jω axis.
     */
    @Override
    public double phaseDeg(double frequencyHz) {
        double w = 2 * Math.PI * frequencyHz;
        double ph = gain < 0 ? -Math.PI : 0;
        ph -= integrators * Math.PI / 2;
        for (Root z : zeros) {
            ph += factorArg(z, w);
        }
        for (Root p : poles) {
            ph -= factorArg(p, w);
        }
        return Math.toDegrees(ph);
    }

    private static double factorArg(Root r, double w) {
        if (!r.isPair()) {
            return Math.atan2(-w / r.re(), 1);
        }
        double m2 = r.re() * r.re() + r.im() * r.im();
        double fr = 1 - w * w / m2;
        double fi = -2 * r.re() * w / m2;
        if (fi == 0 && fr < 0) {
            return r.re() > 0 ? -Math.PI : Math.PI;
        }
        return Math.atan2(fi, fr);
    }

    /** Product H·G, cancelling pole-zero pairs closer than the default relative tolerance. */
    public TransferFunction times(TransferFunction other) {
        return times(other, DEFAULT_CANCELLATION_TOLERANCE);
    }

    /**
     * Product H·G; a pole and a zero (of equal order) whose relative distance is below
     * {@code relativeTolerance} cancel.
     */
    public TransferFunction times(TransferFunction other, double relativeTolerance) {
        List<Root> z = new ArrayList<>(zeros);
        z.addAll(other.zeros);
        List<Root> p = new ArrayList<>(poles);
        p.addAll(other.poles);
        return cancel(gain * other.gain, integrators + other.integrators, z, p, relativeTolerance);
    }

    /** H·k. */
    public TransferFunction times(double k) {
        return new TransferFunction(gain * k, integrators, zeros, poles);
    }

    /** 1/H: zeros and poles swap, integrators change sign. */
    public TransferFunction inverse() {
        if (gain == 0) {
            throw new ArithmeticException("cannot invert a zero transfer function");
        }
        return new TransferFunction(1 / gain, -integrators, poles, zeros);
    }

    /** H/G with cancellation at the default tolerance. */
    public TransferFunction dividedBy(TransferFunction other) {
        return times(other.inverse());
    }

    /**
     * H + G over the least common denominator (poles shared within the default tolerance appear
     * once). Only the new numerator is computed: its roots come from the expanded numerator in a
     * frequency-scaled variable (s = ω·x, ω a power of two near the geometric mean of all root
     * magnitudes) and are polished against the factored terms, so features from 1 Hz to 1 MHz keep
     * their relative accuracy.
     */
    public TransferFunction plus(TransferFunction other) {
        return RationalAlgebra.sum(this, other, DEFAULT_CANCELLATION_TOLERANCE);
    }

    /** H − G; see {@link #plus(TransferFunction)}. */
    public TransferFunction minus(TransferFunction other) {
        return plus(other.times(-1.0));
    }

    /**
     * The unity negative-feedback closed loop L/(1 + L) of this loop gain L. Zeros of L are kept as
     * they are; the closed-loop poles are the roots of D + N (with L = N/D), found as in
     * {@link #plus(TransferFunction)}.
     *
     * @throws ArithmeticException if 1 + L vanishes identically
     */
    public TransferFunction feedback() {
        return RationalAlgebra.feedback(this, constant(1), DEFAULT_CANCELLATION_TOLERANCE);
    }

    /**
     * G/(1 + G·H) with this as the forward path G and {@code h} in the (negative) feedback path.
     * Closed-loop zeros are the zeros of G and the poles of H; poles are the roots of Dg·Dh + Ng·Nh.
     *
     * @throws ArithmeticException if 1 + G·H vanishes identically
     */
    public TransferFunction feedback(TransferFunction h) {
        return RationalAlgebra.feedback(this, h, DEFAULT_CANCELLATION_TOLERANCE);
    }

    /**
     * This function with every pole-zero pair (of the same kind, real or pair) closer than
     * {@code relativeTolerance} (|z − p| / max(|z|, |p|)) removed; the gain is unchanged because
     * both factors are normalised to 1 at s = 0.
     */
    public TransferFunction withCancellations(double relativeTolerance) {
        return cancel(gain, integrators, zeros, poles, relativeTolerance);
    }

    /** Builds a transfer function with pole-zero pairs within {@code tol} removed; see {@link RationalAlgebra}. */
    static TransferFunction cancel(double gain, int integrators, List<Root> zeros, List<Root> poles,
                                   double tol) {
        return RationalAlgebra.cancel(gain, integrators, zeros, poles, tol);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format("%.6g", gain));
        if (integrators != 0) {
            sb.append("·s^").append(-integrators);
        }
        for (Root z : zeros) {
            sb.append(describe(" ·z", z));
        }
        for (Root p : poles) {
            sb.append(describe(" /p", p));
        }
        return sb.toString();
    }

    private static String describe(String tag, Root r) {
        if (r.isPair()) {
            return String.format("%s(%.4g Hz, Q=%.3g)", tag, r.frequencyHz(), r.q());
        }
        return String.format("%s(%s%.4g Hz)", tag, r.isRightHalfPlane() ? "RHP " : "", r.frequencyHz());
    }
}
