package org.flyloop.linear;

/**
 * A {@link ComplexResponse} that also knows its phase as a continuous function of frequency
 * (never wrapped into ±180°), such as a factored {@link TransferFunction} whose phase is the sum of
 * its factors' arguments. Consumers use it instead of unwrapping sampled values.
 */
public interface ContinuousPhaseResponse extends ComplexResponse {

    /** The continuous phase in degrees at {@code frequencyHz}; consistent with the complex value mod 360°. */
    double phaseDeg(double frequencyHz);
}
