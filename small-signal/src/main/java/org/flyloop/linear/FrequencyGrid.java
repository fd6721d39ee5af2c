package org.flyloop.linear;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;

/**
 * A sorted, de-duplicated set of analysis frequencies in hertz: a logarithmic grid, optionally
 * densified around lightly damped poles and zeros so that no resonance peak or notch falls between
 * two points.
 *
 * <p>Refinement, for every root pair with |Q| &gt; {@value #REFINE_ABOVE_Q} and natural frequency
 * f0 inside the range: the exact f0 (when Q is finite), the frequency of the pair's own extremum
 * f0·√(1 − 1/(2Q²)), and points f0·(1 ± k/(4Q)) for k = 1…8 (spacing f0/(4Q), a quarter of the
 * half-power bandwidth f0/Q, across ±2 bandwidths) continued by doubling offsets until they reach
 * the logarithmic spacing. A root on the jω axis (Q = ∞) is treated as Q = 10⁶ and its exact
 * frequency is left out, since the response is singular there.
 *
 * <p>Instances are immutable.
 */
public final class FrequencyGrid {

    /** Default density of the logarithmic grid. */
    public static final int DEFAULT_POINTS_PER_DECADE = 50;
    /** Pairs with |Q| above this get extra points. */
    public static final double REFINE_ABOVE_Q = 2.0;
    private static final double Q_CAP = 1e6;
    private static final double DUPLICATE_TOLERANCE = 1e-12;

    private final double[] frequenciesHz;

    private FrequencyGrid(double[] sortedUnique) {
        this.frequenciesHz = sortedUnique;
    }

    /** Log grid with {@link #DEFAULT_POINTS_PER_DECADE}. */
    public static FrequencyGrid logarithmic(double lowHz, double highHz) {
        return logarithmic(lowHz, highHz, DEFAULT_POINTS_PER_DECADE);
    }

    /**
     * Log grid from lowHz to highHz inclusive, uniformly spaced in log f with at least
     * {@code pointsPerDecade} points per decade.
     */
    public static FrequencyGrid logarithmic(double lowHz, double highHz, int pointsPerDecade) {
        checkRange(lowHz, highHz, pointsPerDecade);
        if (lowHz == highHz) {
            return new FrequencyGrid(new double[] {lowHz});
        }
        double decades = Math.log10(highHz / lowHz);
        int steps = (int) Math.ceil(decades * pointsPerDecade - 1e-9);
        double[] f = new double[steps + 1];
        for (int i = 0; i <= steps; i++) {
            f[i] = lowHz * Math.pow(highHz / lowHz, (double) i / steps);
        }
        f[0] = lowHz;
        f[steps] = highHz;
        return new FrequencyGrid(f);
    }

    /** A log grid refined around the lightly damped poles and zeros of the given transfer functions. */
    public static FrequencyGrid refinedFor(double lowHz, double highHz, int pointsPerDecade,
                                          TransferFunction... transferFunctions) {
        List<Root> roots = new ArrayList<>();
        for (TransferFunction h : transferFunctions) {
            roots.addAll(h.poles());
            roots.addAll(h.zeros());
        }
        return refinedAround(lowHz, highHz, pointsPerDecade, roots);
    }

    /** A log grid refined around the given roots (real roots need no refinement and are ignored). */
    public static FrequencyGrid refinedAround(double lowHz, double highHz, int pointsPerDecade,
                                              Collection<Root> roots) {
        FrequencyGrid base = logarithmic(lowHz, highHz, pointsPerDecade);
        double logStep = Math.pow(10, 1.0 / pointsPerDecade) - 1;
        List<Double> extra = new ArrayList<>();
        for (Root r : roots) {
            double qAbs = Math.abs(r.q());
            if (!r.isPair() || !(qAbs > REFINE_ABOVE_Q)) {
                continue;
            }
            double f0 = r.frequencyHz();
            boolean onAxis = Double.isInfinite(qAbs) || qAbs > Q_CAP;
            double q = Math.min(qAbs, Q_CAP);
            if (!onAxis) {
                extra.add(f0);
                extra.add(f0 * Math.sqrt(1 - 1 / (2 * q * q)));
            }
            double unit = 1 / (4 * q);
            for (int k = 1; k <= 8; k++) {
                extra.add(f0 * (1 + k * unit));
                extra.add(f0 * (1 - k * unit));
            }
            for (double d = 16 * unit; d < Math.min(2 * logStep, 0.5); d *= 2) {
                extra.add(f0 * (1 + d));
                extra.add(f0 * (1 - d));
            }
        }
        return base.withPoints(extra.stream().mapToDouble(Double::doubleValue).toArray());
    }

    /** This grid plus the given frequencies that fall inside its range, sorted and de-duplicated. */
    public FrequencyGrid withPoints(double... extraHz) {
        double lo = frequenciesHz[0];
        double hi = frequenciesHz[frequenciesHz.length - 1];
        double[] all = Arrays.copyOf(frequenciesHz, frequenciesHz.length + extraHz.length);
        int n = frequenciesHz.length;
        for (double f : extraHz) {
            if (f >= lo && f <= hi) {
                all[n++] = f;
            }
        }
        double[] sorted = Arrays.copyOf(all, n);
        Arrays.sort(sorted);
        double[] unique = new double[n];
        int m = 0;
        for (double f : sorted) {
            if (m == 0 || f - unique[m - 1] > DUPLICATE_TOLERANCE * f) {
                unique[m++] = f;
            }
        }
        return new FrequencyGrid(Arrays.copyOf(unique, m));
    }

    private static void checkRange(double lowHz, double highHz, int pointsPerDecade) {
        if (!(lowHz > 0) || !(highHz >= lowHz) || !Double.isFinite(highHz)) {
            throw new IllegalArgumentException("need 0 < lowHz <= highHz < inf: " + lowHz + ", " + highHz);
        }
        if (pointsPerDecade < 1) {
            throw new IllegalArgumentException("pointsPerDecade must be >= 1: " + pointsPerDecade);
        }
    }

    /** Copy of the frequencies in hertz, ascending. */
    public double[] frequenciesHz() {
        return frequenciesHz.clone();
    }

    public int size() {
        return frequenciesHz.length;
    }

    public double frequencyHz(int index) {
        return frequenciesHz[index];
    }

    public double lowHz() {
        return frequenciesHz[0];
    }

    public double highHz() {
        return frequenciesHz[frequenciesHz.length - 1];
    }

    @Override
    public String toString() {
        return String.format("FrequencyGrid[%d points, %.4g Hz .. %.4g Hz]", size(), lowHz(), highHz());
    }
}
