package org.flyloop.loop;

import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;

/**
 * Counts the closed-loop right-half-plane poles of T/(1 + T) from the open loop T by the Nyquist
 * criterion (argument principle): Z = P − Δ/(2π), where P is the number of open-loop
 * right-half-plane poles and Δ the net change of arg(1 + T(s)) as s runs clockwise once around the
 * right half-plane (H. Nyquist, "Regeneration theory", Bell System Technical Journal 11(1), 1932).
 *
 * <p>The contour goes up the jω axis, detours to the right around the n integrators at the origin
 * on a small half-circle (where 1 + T ≈ K/sⁿ turns by −n·π), and closes on a large half-circle
 * (no change for a proper T). By conjugate symmetry the change along the negative axis equals that
 * along the positive axis, so Δ = 2·[arg F(j∞) − arg F(j0⁺)] − n·π with F = 1 + T. The phase of F
 * is tracked continuously along ω with bisection wherever it moves by more than 20° between two
 * samples. Poles on the jω axis other than the origin are not supported (flyback loops have none).
 */
public final class NyquistCriterion {

    private static final double MAX_STEP_RAD = Math.toRadians(20);
    private static final int MAX_DEPTH = 40;

    private NyquistCriterion() {
    }

    /** The result: the count Z and how far Δ/(2π) was from an integer (a measure of trust). */
    public record Count(int closedLoopRhpPoles, double residual) {
    }

    /** Counts the closed-loop right-half-plane poles of the unity negative feedback around {@code loop}. */
    public static Count closedLoopRhpPoles(TransferFunction loop) {
        int p = loop.rightHalfPlanePoleCount();
        int n = Math.max(loop.integrators(), 0);
        double lo = Double.POSITIVE_INFINITY, hi = 0;
        for (Root r : loop.poles()) {
            lo = Math.min(lo, r.omega0());
            hi = Math.max(hi, r.omega0());
        }
        for (Root r : loop.zeros()) {
            lo = Math.min(lo, r.omega0());
            hi = Math.max(hi, r.omega0());
        }
        if (hi == 0) {
            lo = 1;
            hi = 1;
        }
        // Start far below every feature and above |T| = 1 when integrators are present; stop far above.
        double wLo = lo * 1e-4;
        while (n > 0 && loop.magnitude(wLo / (2 * Math.PI)) < 1e6 && wLo > 1e-300) {
            wLo /= 100;
        }
        double wHi = hi * 1e4;
        while (loop.relativeDegree() > 0 && loop.magnitude(wHi / (2 * Math.PI)) > 1e-6 && wHi < 1e300) {
            wHi *= 100;
        }
        int steps = (int) Math.ceil(Math.log10(wHi / wLo) * 200);
        double total = 0;
        double wPrev = wLo;
        double argPrev = arg(loop, wLo);
        for (int k = 1; k <= steps; k++) {
            double w = wLo * Math.pow(wHi / wLo, (double) k / steps);
            double a = arg(loop, w);
            total += change(loop, wPrev, argPrev, w, a, 0);
            wPrev = w;
            argPrev = a;
        }
        double delta = 2 * total - n * Math.PI;
        double z = p - delta / (2 * Math.PI);
        long rounded = Math.round(z);
        return new Count((int) rounded, Math.abs(z - rounded));
    }

    private static double arg(TransferFunction loop, double w) {
        double[] v = new double[2];
        loop.evaluateInto(w / (2 * Math.PI), v);
        return Math.atan2(v[1], 1 + v[0]);
    }

    /** Continuous change of arg F from w1 to w2, bisecting while a step looks larger than 20°. */
    private static double change(TransferFunction loop, double w1, double a1, double w2, double a2, int depth) {
        double d = wrap(a2 - a1);
        if (Math.abs(d) <= MAX_STEP_RAD || depth >= MAX_DEPTH) {
            return d;
        }
        double wm = Math.sqrt(w1 * w2);
        double am = arg(loop, wm);
        return change(loop, w1, a1, wm, am, depth + 1) + change(loop, wm, am, w2, a2, depth + 1);
    }

    private static double wrap(double a) {
        return a - 2 * Math.PI * Math.floor((a + Math.PI) / (2 * Math.PI));
    }
}
