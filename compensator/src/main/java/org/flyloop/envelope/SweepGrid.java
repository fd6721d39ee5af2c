package org.flyloop.envelope;

import java.util.Arrays;

/**
 * A fixed logarithmic frequency grid shared by every loop of an envelope analysis, so that a
 * stage response sampled once can be multiplied with many compensator responses point by point.
 *
 * <p>With n points over D decades the step ratio is 10^(D/(n − 1)); a resonance is resolved
 * (at least three points across its half-power bandwidth f0/Q) while Q ≤ 1/(3·(ratio − 1)), about
 * 8 for 400 points over 6.7 decades. Crossings found on the grid are refined on the exact
 * transfer functions, so the grid sets what can be missed, not the accuracy of what is found.
 */
public final class SweepGrid {

    private final double[] frequenciesHz;

    private SweepGrid(double[] frequenciesHz) {
        this.frequenciesHz = frequenciesHz;
    }

    /**
     * {@code points} frequencies from {@code lowHz} to {@code highHz} inclusive, equally spaced in
     * log f.
     */
    public static SweepGrid logarithmic(double lowHz, double highHz, int points) {
        if (!(lowHz > 0 && highHz > lowHz && Double.isFinite(highHz)) || points < 2) {
            throw new IllegalArgumentException("a sweep needs 0 < low < high and at least two points, got "
                    + lowHz + " Hz, " + highHz + " Hz, " + points + " points");
        }
        double[] f = new double[points];
        double ratio = Math.log(highHz / lowHz);
        for (int i = 0; i < points; i++) {
            f[i] = lowHz * Math.exp(ratio * i / (points - 1));
        }
        f[0] = lowHz;
        f[points - 1] = highHz;
        return new SweepGrid(f);
    }

    public int size() {
        return frequenciesHz.length;
    }

    public double frequencyHz(int index) {
        return frequenciesHz[index];
    }

    public double lowestHz() {
        return frequenciesHz[0];
    }

    public double highestHz() {
        return frequenciesHz[frequenciesHz.length - 1];
    }

    /** The index of the last grid frequency at or below {@code highHz} (−1 when none is). */
    public int lastIndexAtOrBelow(double highHz) {
        int i = Arrays.binarySearch(frequenciesHz, highHz);
        return i >= 0 ? i : -i - 2;
    }

    /** A copy of the frequencies, Hz. */
    public double[] frequenciesHz() {
        return frequenciesHz.clone();
    }
}
