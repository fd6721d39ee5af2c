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
 * <p>Instances are immutable.
 */
public final class TransferFunction {

    /** Default relative tolerance under which a pole and a zero cancel in products. */
    public static final double DEFAULT_CANCELLATION_TOLERANCE = 1e-9;

    private final double gain;
    private final int integrators;
    private final List<Root> zeros;
    private final List<Root> poles;
    // Flattened copies for the hot evaluation loop.
    private final double[] zRe, zIm, pRe, pIm;

    private TransferFunction(double gain, int integrators, List<Root> zeros, List<Root> poles) {
        if (!Double.isFinite(gain)) {
            throw new IllegalArgumentException("gain must be finite: " + gain);
        }
        this.gain = gain;
        this.integrators = integrators;
        this.zeros = Collections.unmodifiableList(new ArrayList<>(zeros));
        this.poles = Collections.unmodifiableList(new ArrayList<>(poles));
        zRe = new double[zeros.size()];
        zIm = new double[zeros.size()];
        for (int i = 0; i < zeros.size(); i++) {
            zRe[i] = zeros.get(i).re();
            zIm[i] = zeros.get(i).im();
        }
        pRe = new double[poles.size()];
        pIm = new double[poles.size()];
        for (int i = 0; i < poles.size(); i++) {
            pRe[i] = poles.get(i).re();
            pIm[i] = poles.get(i).im();
        }
    }

    /**
     * Builds H(s) = gain · s^(−integrators) · Π(1 − s/z)/Π(1 − s/p). No cancellation is done here.
     */
    public static TransferFunction of(double gain, int integrators, List<Root> zeros, List<Root> poles) {
        return new TransferFunction(gain, integrators, zeros, poles);
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
    public void evaluateInto(double frequencyHz, double[] out) {
        double w = 2 * Math.PI * frequencyHz;
        double re = gain, im = 0;
        for (int i = 0; i < zRe.length; i++) {
            double fr, fi;
            if (zIm[i] == 0) {
                fr = 1;
                fi = -w / zRe[i];
            } else {
                double m2 = zRe[i] * zRe[i] + zIm[i] * zIm[i];
                fr = 1 - w * w / m2;
                fi = -2 * zRe[i] * w / m2;
            }
            double t = re * fr - im * fi;
            im = re * fi + im * fr;
            re = t;
        }
        for (int i = 0; i < pRe.length; i++) {
            double fr, fi;
            if (pIm[i] == 0) {
                fr = 1;
                fi = -w / pRe[i];
            } else {
                double m2 = pRe[i] * pRe[i] + pIm[i] * pIm[i];
                fr = 1 - w * w / m2;
                fi = -2 * pRe[i] * w / m2;
            }
            // divide (re + j im) by (fr + j fi)
            double d = fr * fr + fi * fi;
            double t = (re * fr + im * fi) / d;
            im = (im * fr - re * fi) / d;
            re = t;
        }
        int n = integrators;
        // multiply by (jω)^(−n)
        if (n != 0) {
            double mag = Math.pow(w, -n);
            re *= mag;
            im *= mag;
            int k = Math.floorMod(-n, 4); // j^k
            for (int i = 0; i < k; i++) {
                double t = -im;
                im = re;
                re = t;
            }
        }
        out[0] = re;
        out[1] = im;
    }

    /** H(j·2π·f) as a complex number. */
    public Complex evaluate(double frequencyHz) {
        double[] out = new double[2];
        evaluateInto(frequencyHz, out);
        return new Complex(out[0], out[1]);
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
        return new TransferFunction(gain, integrators, z, p);
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
