package org.flyloop.loop;

import org.flyloop.linear.TransferFunction;

/**
 * The loop gain T(s) = Gc(s) · k_fb · Gvc(s) of a flyback with its compensator.
 *
 * <p>Sign convention, stated once: every network in {@code org.flyloop.network} reports
 * Gc = −v̂c/v̂o, i.e. the error amplifier's inversion is taken out there, and the loop is analysed
 * as a unity negative-feedback loop around T. Gvc = v̂o/v̂c is the stage's control-to-output
 * response (for voltage mode Gvd/ramp, so the PWM modulator gain 1/ramp is inside it; for current
 * mode from the comparator threshold), and k_fb is {@code control.fb_gain}, the gain from the
 * feedback pin (or amplifier output) to the comparator.
 *
 * @param compensator   Gc(s) = −v̂c/v̂o of the network
 * @param feedbackGain  k_fb, V/V
 * @param stage         Gvc(s)
 */
public record LoopGain(TransferFunction compensator, double feedbackGain, TransferFunction stage) {

    /** T(s) in factored form. */
    public TransferFunction transferFunction() {
        return compensator.times(stage).times(feedbackGain);
    }
}
