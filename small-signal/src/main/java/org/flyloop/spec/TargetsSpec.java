package org.flyloop.spec;

/**
 * Loop targets.
 *
 * @param crossoverHz      requested crossover, Hz; NaN for automatic choice
 * @param phaseMarginDeg   minimum phase margin at every corner, degrees
 * @param gainMarginDb     minimum gain margin at every corner, dB
 * @param rhpZeroFraction  crossover limit as a fraction of the lowest CCM RHP zero (1/3 to 1/5 are
 *                         in use; common practice, no source)
 */
public record TargetsSpec(double crossoverHz, double phaseMarginDeg, double gainMarginDb,
                          double rhpZeroFraction) {

    /** Defaults: automatic crossover, 45° phase margin, 10 dB gain margin, fc ≤ f_RHPZ/4. */
    public static TargetsSpec defaults() {
        return new TargetsSpec(Double.NaN, 45, 10, 0.25);
    }

    public TargetsSpec {
        if (!(rhpZeroFraction > 0 && rhpZeroFraction <= 1)) {
            throw new IllegalArgumentException("targets.rhp_zero_fraction must lie in (0, 1]");
        }
    }

    public boolean autoCrossover() {
        return Double.isNaN(crossoverHz);
    }
}
