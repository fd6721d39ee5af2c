package org.flyloop.envelope;

import java.util.Arrays;

/**
 * Order statistics of one sampled figure.
 *
 * <p>Percentiles are estimated by linear interpolation between order statistics, R. J. Hyndman
 * and Y. Fan, "Sample quantiles in statistical packages", The American Statistician 50(4), 1996,
 * definition 7 (the default of R and NumPy): with n sorted values x₁…xₙ and h = (n − 1)·p,
 * Q(p) = x⌊h⌋+1 + (h − ⌊h⌋)·(x⌊h⌋+2 − x⌊h⌋+1). Infinite values (a sample without crossover has
 * phase margin −∞, one without phase crossover a gain margin of +∞) sort to the ends and are
 * returned as such instead of being interpolated with. NaN values (a sample where the stage could
 * not run) are left out of every figure, {@code count} included.
 *
 * @param p01   1st percentile
 * @param p50   median
 * @param p99   99th percentile
 * @param min   smallest value
 * @param max   largest value
 * @param count number of values that entered (NaN left out)
 */
public record Distribution(double p01, double p50, double p99, double min, double max, int count) {

    /** The distribution of {@code values} (not modified). */
    public static Distribution of(double[] values) {
        double[] sorted = Arrays.stream(values).filter(v -> !Double.isNaN(v)).sorted().toArray();
        if (sorted.length == 0) {
            return new Distribution(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, 0);
        }
        return new Distribution(percentile(sorted, 0.01), percentile(sorted, 0.50), percentile(sorted, 0.99),
                sorted[0], sorted[sorted.length - 1], sorted.length);
    }

    /** The p-quantile of ascending {@code sorted} (no NaN) by Hyndman and Fan's definition 7. */
    public static double percentile(double[] sorted, double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("p must lie in [0, 1], got " + p);
        }
        int n = sorted.length;
        double h = (n - 1) * p;
        int lo = (int) Math.floor(h);
        double frac = h - lo;
        if (lo >= n - 1 || frac == 0) {
            return sorted[Math.min(lo, n - 1)];
        }
        double a = sorted[lo];
        double b = sorted[lo + 1];
        if (a == b || Double.isInfinite(a) || Double.isInfinite(b)) {
            // an infinite neighbour: the quantile lies at (or beyond) the infinite end it borders
            return Double.isInfinite(a) && a < 0 ? a : Double.isInfinite(b) && b > 0 ? b : a;
        }
        return a + frac * (b - a);
    }
}
