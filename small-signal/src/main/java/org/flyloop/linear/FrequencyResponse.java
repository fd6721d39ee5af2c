package org.flyloop.linear;

/**
 * A sampled frequency response: frequencies in hertz with the complex value, magnitude in dB and
 * continuous phase in degrees at each.
 *
 * <p>Phase is never wrapped into ±180°. From a {@link ContinuousPhaseResponse} (such as a factored
 * {@link TransferFunction}) it is that response's own continuous phase. From any other
 * {@link ComplexResponse} (a {@link StateSpace} model, a pointwise product) it is unwrapped from
 * the lowest frequency upwards by {@link PhaseUnwrapper}: the first point continues the
 * low-frequency asymptote (−90° per net integrator, a further −180° for a negative gain, so a
 * negative real response is −180° and 1/s³ is −270°), and each further point follows the previous
 * one, subdividing between samples where the phase moves fast. A sample exactly on a singularity
 * (a jω-axis pole hit to the last bit) has NaN phase and magnitude.
 *
 * <p>Instances are immutable; array accessors return copies. Writing files is left to callers.
 */
public final class FrequencyResponse {

    private final double[] frequenciesHz;
    private final double[] real;
    private final double[] imaginary;
    private final double[] magnitudeDb;
    private final double[] phaseDeg;

    private FrequencyResponse(double[] frequenciesHz, double[] real, double[] imaginary, double[] phaseDeg) {
        this.frequenciesHz = frequenciesHz;
        this.real = real;
        this.imaginary = imaginary;
        this.phaseDeg = phaseDeg;
        this.magnitudeDb = new double[frequenciesHz.length];
        for (int i = 0; i < frequenciesHz.length; i++) {
            magnitudeDb[i] = 20 * Math.log10(Math.hypot(real[i], imaginary[i]));
        }
    }

    /** Samples {@code h} on the grid. */
    public static FrequencyResponse of(ComplexResponse h, FrequencyGrid grid) {
        return of(h, grid.frequenciesHz());
    }

    /**
     * Samples {@code h} at the given frequencies (hertz, strictly increasing, positive).
     */
    public static FrequencyResponse of(ComplexResponse h, double[] frequenciesHz) {
        double[] f = frequenciesHz.clone();
        for (int i = 0; i < f.length; i++) {
            if (!(f[i] > 0) || !Double.isFinite(f[i]) || (i > 0 && !(f[i] > f[i - 1]))) {
                throw new IllegalArgumentException("frequencies must be positive, finite and increasing");
            }
        }
        int n = f.length;
        double[] re = new double[n];
        double[] im = new double[n];
        double[] ph = new double[n];
        double[] v = new double[2];
        for (int i = 0; i < n; i++) {
            h.evaluateInto(f[i], v);
            re[i] = v[0];
            im[i] = v[1];
        }
        if (h instanceof ContinuousPhaseResponse phased) {
            for (int i = 0; i < n; i++) {
                ph[i] = phased.phaseDeg(f[i]);
            }
        } else {
            // a sample exactly on a singularity gets NaN; the next one continues from the last finite one
            int last = -1;
            for (int i = 0; i < n; i++) {
                ph[i] = last < 0 ? PhaseUnwrapper.initialPhaseDeg(h, f[i])
                        : PhaseUnwrapper.advance(h, f[last], ph[last], f[i]);
                if (Double.isFinite(ph[i])) {
                    last = i;
                }
            }
        }
        return new FrequencyResponse(f, re, im, ph);
    }

    public int size() {
        return frequenciesHz.length;
    }

    public double frequencyHz(int index) {
        return frequenciesHz[index];
    }

    /** |H| (linear) at sample {@code index}. */
    public double magnitude(int index) {
        return Math.hypot(real[index], imaginary[index]);
    }

    public double magnitudeDb(int index) {
        return magnitudeDb[index];
    }

    public double phaseDeg(int index) {
        return phaseDeg[index];
    }

    public double real(int index) {
        return real[index];
    }

    public double imaginary(int index) {
        return imaginary[index];
    }

    /** Copy of the frequencies in hertz. */
    public double[] frequenciesHz() {
        return frequenciesHz.clone();
    }

    /** Copy of the magnitudes, 20·log10|H|. */
    public double[] magnitudeDb() {
        return magnitudeDb.clone();
    }

    /** Copy of the continuous phases in degrees. */
    public double[] phaseDeg() {
        return phaseDeg.clone();
    }

    /** Copy of the real parts. */
    public double[] real() {
        return real.clone();
    }

    /** Copy of the imaginary parts. */
    public double[] imaginary() {
        return imaginary.clone();
    }

    /** Index of the largest magnitude (first one on ties). */
    public int indexOfPeakMagnitude() {
        int best = 0;
        for (int i = 1; i < magnitudeDb.length; i++) {
            if (magnitudeDb[i] > magnitudeDb[best]) {
                best = i;
            }
        }
        return best;
    }
}
