package org.flyloop.linear;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Every frequency where a response's magnitude or continuous phase crosses a level, e.g. all 0 dB
 * crossings (for phase margins) and all −180° + k·360° crossings (for gain margins); the caller
 * picks the one that matters.
 *
 * <p>Method: sign changes of g(f) = ln|H(f)| − ln(level), or g(f) = φ(f) − level, between
 * consecutive points of a sampled {@link FrequencyResponse} bracket each crossing; Brent's method
 * (Commons Math {@link BrentSolver}) refines it in x = ln(f/f_left) down to the resolution of a
 * double, so |H(f)|/level − 1 and (φ(f) − level)/180° come out near 1e−15, comfortably inside
 * 1e−9, wherever the function is not steeper than about 10⁶ per unit ln f. A bracket whose refined
 * point still misses the level by more than 1e−3 (relative, or degrees) straddles a jump — a pole
 * or zero on the jω axis — and is not a crossing; it is dropped. A sample lying exactly on the
 * level is a crossing only if the sign differs on both sides of it (touching is not crossing);
 * a stretch of samples exactly on the level counts once, at its first sample.
 *
 * <p>The phase between samples is that of the {@link ContinuousPhaseResponse} when available,
 * otherwise it is unwrapped from the left sample by {@link PhaseUnwrapper}.
 */
public final class Crossings {

    /** 0 dB. */
    public static final double UNITY_MAGNITUDE = 1.0;
    /** The phase level of gain margins, taken modulo 360°. */
    public static final double MINUS_180_DEG = -180.0;
    private static final double JUMP_RESIDUAL = 1e-3;
    private static final int MAX_EVALUATIONS = 400;

    private Crossings() {
    }

    /** All 0 dB crossings of h on the grid. */
    public static List<Crossing> magnitudeCrossings(ComplexResponse h, FrequencyGrid grid) {
        return magnitudeCrossings(h, FrequencyResponse.of(h, grid), UNITY_MAGNITUDE);
    }

    /** All crossings of |h| = level (linear, &gt; 0) on the grid. */
    public static List<Crossing> magnitudeCrossings(ComplexResponse h, FrequencyGrid grid, double level) {
        return magnitudeCrossings(h, FrequencyResponse.of(h, grid), level);
    }

    /** All crossings of |h| = level using samples already taken from the same h. */
    public static List<Crossing> magnitudeCrossings(ComplexResponse h, FrequencyResponse sampled, double level) {
        if (!(level > 0) || !Double.isFinite(level)) {
            throw new IllegalArgumentException("magnitude level must be positive: " + level);
        }
        double lnLevel = Math.log(level);
        int n = sampled.size();
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            g[i] = Math.log(sampled.magnitude(i)) - lnLevel;
        }
        double[] v = new double[2];
        List<Crossing> out = new ArrayList<>();
        for (int[] bracket : brackets(g)) {
            int i = bracket[0];
            int j = bracket[1];
            Crossing.Direction dir = bracket[2] > 0 ? Crossing.Direction.RISING : Crossing.Direction.FALLING;
            if (i == j) {
                out.add(new Crossing(sampled.frequencyHz(i), level, dir));
                continue;
            }
            double f = refine(sampled.frequencyHz(i), sampled.frequencyHz(j), freq -> {
                h.evaluateInto(freq, v);
                return Math.log(Math.hypot(v[0], v[1])) - lnLevel;
            });
            h.evaluateInto(f, v);
            if (Math.abs(Math.hypot(v[0], v[1]) / level - 1) <= JUMP_RESIDUAL) {
                out.add(new Crossing(f, level, dir));
            }
        }
        return out;
    }

    /** All crossings of the continuous phase through −180° + k·360° (every k) on the grid. */
    public static List<Crossing> phaseCrossings(ComplexResponse h, FrequencyGrid grid) {
        return phaseCrossings(h, FrequencyResponse.of(h, grid), MINUS_180_DEG);
    }

    /** All crossings of the continuous phase through levelDeg + k·360° (every k) on the grid. */
    public static List<Crossing> phaseCrossings(ComplexResponse h, FrequencyGrid grid, double levelDeg) {
        return phaseCrossings(h, FrequencyResponse.of(h, grid), levelDeg);
    }

    /**
     * All crossings of the continuous phase through levelDeg + k·360° (every k), using samples
     * already taken from the same h. Each crossing reports the branch it crossed, e.g. −540°.
     */
    public static List<Crossing> phaseCrossings(ComplexResponse h, FrequencyResponse sampled, double levelDeg) {
        int n = sampled.size();
        List<Crossing> out = new ArrayList<>();
        if (n == 0) {
            return out;
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            lo = Math.min(lo, sampled.phaseDeg(i));
            hi = Math.max(hi, sampled.phaseDeg(i));
        }
        long kLo = (long) Math.floor((lo - levelDeg) / 360);
        long kHi = (long) Math.ceil((hi - levelDeg) / 360);
        for (long k = kLo; k <= kHi; k++) {
            double level = levelDeg + 360.0 * k;
            double[] g = new double[n];
            for (int i = 0; i < n; i++) {
                g[i] = sampled.phaseDeg(i) - level;
            }
            for (int[] bracket : brackets(g)) {
                int i = bracket[0];
                int j = bracket[1];
                Crossing.Direction dir = bracket[2] > 0 ? Crossing.Direction.RISING : Crossing.Direction.FALLING;
                if (i == j) {
                    out.add(new Crossing(sampled.frequencyHz(i), level, dir));
                    continue;
                }
                double fi = sampled.frequencyHz(i);
                double phi = sampled.phaseDeg(i);
                DoubleUnaryOperator phase = h instanceof ContinuousPhaseResponse c
                        ? c::phaseDeg
                        : freq -> PhaseUnwrapper.advance(h, fi, phi, freq);
                double f = refine(fi, sampled.frequencyHz(j), freq -> phase.applyAsDouble(freq) - level);
                if (Math.abs(phase.applyAsDouble(f) - level) <= JUMP_RESIDUAL) {
                    out.add(new Crossing(f, level, dir));
                }
            }
        }
        out.sort((a, b) -> Double.compare(a.frequencyHz(), b.frequencyHz()));
        return out;
    }

    /**
     * Index brackets {i, j, sign} where g changes sign: j = i + 1 for a strict change, i = j for a
     * sample exactly on the level with opposite signs around it. NaN samples break the chain.
     */
    private static List<int[]> brackets(double[] g) {
        List<int[]> out = new ArrayList<>();
        int lastSigned = -1;
        for (int i = 0; i < g.length; i++) {
            if (Double.isNaN(g[i])) {
                lastSigned = -1;
                continue;
            }
            if (g[i] == 0) {
                continue;
            }
            if (lastSigned >= 0 && Math.signum(g[i]) != Math.signum(g[lastSigned])) {
                int rising = g[i] > 0 ? 1 : -1;
                if (lastSigned == i - 1) {
                    out.add(new int[] {i - 1, i, rising});
                } else {
                    out.add(new int[] {lastSigned + 1, lastSigned + 1, rising});
                }
            }
            lastSigned = i;
        }
        return out;
    }

    /** Root of g between fa and fb (opposite signs) by Brent's method on x = ln(f/fa). */
    private static double refine(double fa, double fb, DoubleUnaryOperator g) {
        double ga = g.applyAsDouble(fa);
        double gb = g.applyAsDouble(fb);
        if (ga == 0) {
            return fa;
        }
        if (gb == 0) {
            return fb;
        }
        if (!(Math.signum(ga) != Math.signum(gb)) || !Double.isFinite(ga) || !Double.isFinite(gb)) {
            // endpoint values not finite (an exact singularity on the grid): bisect on sign only
            return bisect(fa, fb, g);
        }
        BrentSolver solver = new BrentSolver(1e-15, 1e-18, 0);
        double x = solver.solve(MAX_EVALUATIONS, x1 -> g.applyAsDouble(fa * Math.exp(x1)), 0, Math.log(fb / fa));
        return fa * Math.exp(x);
    }

    private static double bisect(double fa, double fb, DoubleUnaryOperator g) {
        double sa = Math.signum(g.applyAsDouble(fa));
        for (int it = 0; it < 200; it++) {
            double fm = Math.sqrt(fa * fb);
            if (fm <= fa || fm >= fb) {
                break;
            }
            double sm = Math.signum(g.applyAsDouble(fm));
            if (sm == 0) {
                return fm;
            }
            if (sm == sa) {
                fa = fm;
            } else {
                fb = fm;
            }
        }
        return Math.sqrt(fa * fb);
    }
}
