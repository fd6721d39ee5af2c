package org.flyloop.linear;

import java.util.Arrays;
import org.apache.commons.math3.complex.Complex;

/**
 * Anything that yields a complex frequency response H(j·2π·f): a {@link TransferFunction}, a
 * {@link StateSpace} model, or a pointwise product of such pieces. This is the type that
 * {@link FrequencyResponse} and {@link Crossings} accept.
 */
@FunctionalInterface
public interface ComplexResponse {

    /**
     * Writes H(j·2π·f) into {@code out[0]} (real part) and {@code out[1]} (imaginary part).
     *
     * @param frequencyHz frequency in hertz, &gt; 0
     * @param out         array of length ≥ 2
     */
    void evaluateInto(double frequencyHz, double[] out);

    /** H(j·2π·f) as a complex number. */
    default Complex evaluate(double frequencyHz) {
        double[] out = new double[2];
        evaluateInto(frequencyHz, out);
        return new Complex(out[0], out[1]);
    }

    /**
     * The pointwise product of several responses, e.g. plant × compensator × sensor when they are
     * kept as separate models. When every factor reports a continuous phase, so does the product
     * (the sum of the phases); otherwise phase has to be unwrapped by the consumer.
     */
    static ComplexResponse product(ComplexResponse... factors) {
        ComplexResponse[] fs = factors.clone();
        if (fs.length == 0) {
            throw new IllegalArgumentException("need at least one factor");
        }
        boolean allPhased = Arrays.stream(fs).allMatch(f -> f instanceof ContinuousPhaseResponse);
        ComplexResponse product = (frequencyHz, out) -> {
            double re = 1, im = 0;
            double[] part = new double[2];
            for (ComplexResponse f : fs) {
                f.evaluateInto(frequencyHz, part);
                double t = re * part[0] - im * part[1];
                im = re * part[1] + im * part[0];
                re = t;
            }
            out[0] = re;
            out[1] = im;
        };
        if (!allPhased) {
            return product;
        }
        return new ContinuousPhaseResponse() {
            @Override
            public void evaluateInto(double frequencyHz, double[] out) {
                product.evaluateInto(frequencyHz, out);
            }

            @Override
            public double phaseDeg(double frequencyHz) {
                double sum = 0;
                for (ComplexResponse f : fs) {
                    sum += ((ContinuousPhaseResponse) f).phaseDeg(frequencyHz);
                }
                return sum;
            }
        };
    }
}
