package org.flyloop.linear;

/**
 * Continuous phase of a sampled complex response that carries no phase of its own.
 *
 * <p>Between two frequencies the phase is advanced by the principal value of the change, after
 * subdividing (bisection in log f) any step longer than {@value #MAX_STEP_DECADES} decade or whose
 * principal change exceeds {@value #MAX_STEP_DEG}°, so fast phase swings near lightly damped roots
 * are followed rather than aliased. A jump that stays a half-turn however finely it is split is a
 * root on the jω axis; it is taken as −180° (the lossless limit of a left-half-plane pole pair).
 *
 * <p>Branch of the first point: the phase is made continuous from the low-frequency asymptote. The
 * response is evaluated {@value #DESCENT_DECADES} decades below the first frequency, the number of
 * net integrators n is read from the magnitude slope there (−20·n dB/decade, rounded), and the
 * phase there is placed in (−90°·n − 270°, −90°·n + 90°]: −90°·n for a positive gain, −90°·n − 180°
 * for a negative one (so a negative constant is −180°, 1/s³ is −270°, s is +90°). This equals the
 * convention of {@link TransferFunction#phaseDeg(double)} whenever all roots lie above that depth.
 */
final class PhaseUnwrapper {

    static final double MAX_STEP_DEG = 45;
    static final double MAX_STEP_DECADES = 0.05;
    static final int DESCENT_DECADES = 8;
    private static final int MAX_DEPTH = 60;

    private PhaseUnwrapper() {
    }

    /** Principal argument in degrees, (−180°, 180°]. */
    static double principalDeg(double re, double im) {
        return Math.toDegrees(Math.atan2(im, re));
    }

    /** x reduced into (−180°, 180°]. */
    static double wrapDeg(double x) {
        return x - 360 * Math.ceil((x - 180) / 360);
    }

    /** Continuous phase at {@code frequencyHz} by the low-frequency asymptote rule (class doc). */
    static double initialPhaseDeg(ComplexResponse h, double frequencyHz) {
        double[] v = new double[2];
        double fp = frequencyHz * Math.pow(10, -DESCENT_DECADES);
        while (fp < frequencyHz) {
            h.evaluateInto(fp, v);
            double m = Math.hypot(v[0], v[1]);
            if (Double.isFinite(m) && m > 0) {
                break;
            }
            fp *= 10;
        }
        fp = Math.min(fp, frequencyHz);
        h.evaluateInto(fp, v);
        double lnMag0 = Math.log(Math.hypot(v[0], v[1]));
        double principal = principalDeg(v[0], v[1]);
        double step = 1.01;
        double[] w = new double[2];
        h.evaluateInto(fp * step, w);
        double slope = (Math.log(Math.hypot(w[0], w[1])) - lnMag0) / Math.log(step);
        long n = -Math.round(slope);
        double reference = -90.0 * n;
        // phase in (reference − 270°, reference + 90°]
        double phase = reference + 90 - 360 + wrapMod360(principal - (reference + 90 - 360));
        return advance(h, fp, phase, frequencyHz);
    }

    /** x mod 360 in (0, 360]. */
    private static double wrapMod360(double x) {
        double r = x - 360 * Math.floor(x / 360);
        return r == 0 ? 360 : r;
    }

    /**
     * Continuous phase at {@code toHz} given the continuous phase {@code fromPhaseDeg} at
     * {@code fromHz}; NaN if h is singular (not finite) exactly at {@code toHz}.
     */
    static double advance(ComplexResponse h, double fromHz, double fromPhaseDeg, double toHz) {
        return advance(h, fromHz, fromPhaseDeg, toHz, new double[2], 0);
    }

    private static double advance(ComplexResponse h, double fa, double phaseA, double fb, double[] buf, int depth) {
        if (fa == fb) {
            return phaseA;
        }
        h.evaluateInto(fb, buf);
        double delta = wrapDeg(principalDeg(buf[0], buf[1]) - phaseA);
        if (!Double.isFinite(delta) || !Double.isFinite(buf[0]) || !Double.isFinite(buf[1])) {
            return Double.NaN; // fb sits on a singularity: no phase there
        }
        boolean longStep = Math.abs(Math.log10(fb / fa)) > MAX_STEP_DECADES;
        if (!longStep && Math.abs(delta) <= MAX_STEP_DEG) {
            return phaseA + delta;
        }
        double fm = finiteMidpoint(h, fa, fb, buf);
        if (depth >= MAX_DEPTH || !(fm > fa && fm < fb || fm < fa && fm > fb)) {
            // a jump that survives splitting down to the last bit is a jω-axis root: take it downwards
            return phaseA + (Math.abs(delta) > MAX_STEP_DEG && delta > 0 ? delta - 360 : delta);
        }
        double phaseM = advance(h, fa, phaseA, fm, buf, depth + 1);
        return advance(h, fm, phaseM, fb, buf, depth + 1);
    }

    /**
     * The log-midpoint of (fa, fb), nudged off a point where h is singular; NaN if the interval
     * has no interior double left or no finite point is found.
     */
    private static double finiteMidpoint(ComplexResponse h, double fa, double fb, double[] buf) {
        for (double t : new double[] {0.5, 0.49, 0.51, 0.3, 0.7}) {
            double fm = fa * Math.pow(fb / fa, t);
            if (fm == fa || fm == fb) {
                return Double.NaN;
            }
            h.evaluateInto(fm, buf);
            if (Double.isFinite(buf[0]) && Double.isFinite(buf[1])) {
                return fm;
            }
        }
        return Double.NaN;
    }
}
