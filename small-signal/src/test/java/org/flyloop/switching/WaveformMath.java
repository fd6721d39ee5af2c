package org.flyloop.switching;

/**
 * Trapezoid-rule averages over sampled waveforms, written for the tests so that RMS and average
 * values can be taken from the samples independently of the integrals the simulator carries.
 * Samples sharing a time (switching edges) contribute nothing between them, as they should.
 */
final class WaveformMath {

    private WaveformMath() {
    }

    /** Time average of x over the sampled span. */
    static double mean(double[] t, double[] x) {
        double sum = 0;
        for (int i = 1; i < t.length; i++) {
            sum += (t[i] - t[i - 1]) * (x[i] + x[i - 1]) / 2;
        }
        return sum / (t[t.length - 1] - t[0]);
    }

    /**
     * RMS of x over the sampled span. Between samples x is taken as straight, so x² is integrated
     * exactly for the straight segment: (a² + a·b + b²)/3 times the width.
     */
    static double rms(double[] t, double[] x) {
        double sum = 0;
        for (int i = 1; i < t.length; i++) {
            double a = x[i - 1];
            double b = x[i];
            sum += (t[i] - t[i - 1]) * (a * a + a * b + b * b) / 3;
        }
        return Math.sqrt(sum / (t[t.length - 1] - t[0]));
    }
}
