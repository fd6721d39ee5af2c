package org.flyloop.envelope;

/**
 * Margins of a loop gain T = k·G·Gc from a stage response G and a compensator response Gc sampled
 * on the same {@link SweepGrid}: the loop is never built as an object, its samples are products
 * formed on the fly, and only the few intervals where something crosses are evaluated again.
 *
 * <ul>
 *   <li>A gain crossover lies between two samples where |T|² − 1 changes sign; it is refined on
 *       ln|T| over ln f with the Illinois variant of regula falsi (M. Dowell and P. Jarratt, "A
 *       modified regula falsi method for computing the root of an equation", BIT 11, 1971), and
 *       its phase margin is 180° + ∠T wrapped into (−180°, 180°].</li>
 *   <li>A phase crossover (∠T = −180° mod 360°) lies where Im T changes sign with Re T &lt; 0; it
 *       is refined on sin∠T = Im T/|T| the same way, and its gain margin is −20·log10|T|.</li>
 * </ul>
 * The figures follow {@link org.flyloop.loop.LoopMargins}: the highest gain crossover, the
 * smallest phase margin, the gain margin of smallest magnitude. No Nyquist count is made: a loop
 * whose phase margin is positive at every crossover and whose gain margins are positive is the
 * ordinary stable flyback loop, and any other outcome already misses the targets.
 *
 * <p>One scanner holds scratch state: use one per thread.
 */
final class GridMarginScanner {

    private static final double X_TOLERANCE = 1e-10;
    private static final int MAX_ITERATIONS = 100;
    private static final int MAGNITUDE = 0;
    private static final int SINE_OF_PHASE = 1;

    private final SweepGrid grid;
    private final double[] a = new double[2];
    private final double[] b = new double[2];
    // T at the last exact evaluation
    private double tRe;
    private double tIm;
    // the loop being scanned
    private ResponseBuffer stage;
    private ResponseBuffer network;
    private double gain;

    GridMarginScanner(SweepGrid grid) {
        this.grid = grid;
    }

    /**
     * The figures of T = gain·stage·network over grid points 0…{@code lastIndex}.
     *
     * @param stage     the stage response (its function is used for refinement)
     * @param network   the compensator response
     * @param gain      a positive constant factor (the feedback-pin gain k_fb)
     * @param lastIndex the highest grid index analysed (fsw/2 of this stage)
     */
    LoopFigures scan(ResponseBuffer stage, ResponseBuffer network, double gain, int lastIndex) {
        this.stage = stage;
        this.network = network;
        this.gain = gain;
        double[] sr = stage.re;
        double[] si = stage.im;
        double[] nr = network.re;
        double[] ni = network.im;
        double fc = Double.NaN;
        double pm = Double.NaN;
        double gm = Double.POSITIVE_INFINITY;
        double prevRe = 0;
        double prevIm = 0;
        double prevM2 = 0;
        for (int i = 0; i <= lastIndex; i++) {
            double re = gain * (sr[i] * nr[i] - si[i] * ni[i]);
            double im = gain * (sr[i] * ni[i] + si[i] * nr[i]);
            double m2 = re * re + im * im;
            if (i > 0) {
                if ((prevM2 > 1) != (m2 > 1)) {
                    double x = refine(MAGNITUDE, Math.log(grid.frequencyHz(i - 1)), 0.5 * Math.log(prevM2),
                            Math.log(grid.frequencyHz(i)), 0.5 * Math.log(m2));
                    double f = Math.exp(x);
                    exact(f);
                    double margin = wrapDeg(180 + Math.toDegrees(Math.atan2(tIm, tRe)));
                    fc = Double.isNaN(fc) ? f : Math.max(fc, f);
                    pm = Double.isNaN(pm) ? margin : Math.min(pm, margin);
                }
                if ((prevIm < 0) != (im < 0) && (prevRe < 0 || re < 0)) {
                    double x = refine(SINE_OF_PHASE, Math.log(grid.frequencyHz(i - 1)), prevIm / Math.sqrt(prevM2),
                            Math.log(grid.frequencyHz(i)), im / Math.sqrt(m2));
                    exact(Math.exp(x));
                    if (tRe < 0) {
                        double margin = -10 * Math.log10(tRe * tRe + tIm * tIm);
                        if (Math.abs(margin) < Math.abs(gm)) {
                            gm = margin;
                        }
                    }
                }
            }
            prevRe = re;
            prevIm = im;
            prevM2 = m2;
        }
        this.stage = null;
        this.network = null;
        return new LoopFigures(fc, pm, gm);
    }

    /** T at {@code frequencyHz} from the exact functions, into tRe, tIm. */
    private void exact(double frequencyHz) {
        stage.function().evaluateInto(frequencyHz, a);
        network.function().evaluateInto(frequencyHz, b);
        tRe = gain * (a[0] * b[0] - a[1] * b[1]);
        tIm = gain * (a[0] * b[1] + a[1] * b[0]);
    }

    private double value(int kind, double x) {
        exact(Math.exp(x));
        double m2 = tRe * tRe + tIm * tIm;
        return kind == MAGNITUDE ? 0.5 * Math.log(m2) : tIm / Math.sqrt(m2);
    }

    /**
     * The root in [s, t] of a function with values fs, ft of opposite signs, by the Illinois
     * method (regula falsi that halves the retained end's value when the same end is kept twice).
     */
    private double refine(int kind, double s, double fs, double t, double ft) {
        if (fs == 0) {
            return s;
        }
        if (ft == 0) {
            return t;
        }
        int side = 0;
        double r = Double.NaN;
        for (int n = 0; n < MAX_ITERATIONS; n++) {
            double next = (fs * t - ft * s) / (fs - ft);
            if (!(next > Math.min(s, t) && next < Math.max(s, t))) {
                next = 0.5 * (s + t);
            }
            // successive estimates agreeing, or a bracket narrower than the tolerance, ends the search
            boolean done = Math.abs(next - r) < X_TOLERANCE || Math.abs(t - s) < X_TOLERANCE;
            r = next;
            if (done) {
                break;
            }
            double fr = value(kind, r);
            if (fr == 0 || Double.isNaN(fr)) {
                break;
            }
            if ((fr > 0) == (ft > 0)) {
                t = r;
                ft = fr;
                if (side == -1) {
                    fs *= 0.5;
                }
                side = -1;
            } else {
                s = r;
                fs = fr;
                if (side == 1) {
                    ft *= 0.5;
                }
                side = 1;
            }
        }
        return r;
    }

    /** Wraps an angle into (−180°, 180°]. */
    static double wrapDeg(double deg) {
        double w = deg - 360 * Math.floor((deg + 180) / 360);
        return w == -180 ? 180 : w;
    }
}
