package org.flyloop.verify;

import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;

/**
 * How the compensator's output voltage vc drives the averaged stage's control input, with the
 * controller's limits:
 * <ul>
 *   <li>voltage mode: duty d = k_fb·vc/V_ramp, clamped to [0, duty_max] (the PWM comparator
 *       against a ramp of V_ramp peak to peak);</li>
 *   <li>peak current mode: comparator threshold k_fb·vc, clamped at 0 (a negative threshold
 *       cannot command a negative peak current); the duty limit acts inside the averaged model.</li>
 * </ul>
 * These are the large-signal forms of the modulator gains the loop gain uses
 * ({@code org.flyloop.loop.LoopGain}: 1/V_ramp inside Gvc in voltage mode, k_fb outside).
 *
 * @param scheme       voltage or peak current mode
 * @param feedbackGain k_fb, feedback pin (or amplifier output) to comparator, V/V
 * @param rampV        PWM ramp amplitude, V (voltage mode; ignored in current mode)
 * @param dutyMax      the controller's duty limit
 */
public record ControlLaw(ControlScheme scheme, double feedbackGain, double rampV, double dutyMax) {

    public ControlLaw {
        if (!(feedbackGain > 0) || !Double.isFinite(feedbackGain)) {
            throw new IllegalArgumentException("feedback gain must be positive, got " + feedbackGain);
        }
        if (scheme == ControlScheme.VOLTAGE && !(rampV > 0)) {
            throw new IllegalArgumentException("voltage mode needs a positive ramp, got " + rampV);
        }
    }

    /** The law of {@code control} with its own feedback gain. */
    public static ControlLaw of(ControlSpec control) {
        return of(control, control.fbGain());
    }

    /** The law of {@code control} with feedback gain {@code feedbackGain}. */
    public static ControlLaw of(ControlSpec control, double feedbackGain) {
        return new ControlLaw(control.scheme(), feedbackGain, control.rampV(), control.dutyMax());
    }

    /** The unclamped control input for amplifier output {@code amplifierV}: duty or threshold in V. */
    public double unclampedInput(double amplifierV) {
        return scheme == ControlScheme.VOLTAGE ? feedbackGain * amplifierV / rampV : feedbackGain * amplifierV;
    }

    /** The averaged model's control input for amplifier output {@code amplifierV}, clamped. */
    public double controlInput(double amplifierV) {
        double raw = unclampedInput(amplifierV);
        return scheme == ControlScheme.VOLTAGE ? Math.min(Math.max(raw, 0), dutyMax) : Math.max(raw, 0);
    }

    /** The amplifier output that gives control input {@code controlInput} (inside the limits). */
    public double amplifierOutputFor(double controlInput) {
        return scheme == ControlScheme.VOLTAGE ? controlInput * rampV / feedbackGain : controlInput / feedbackGain;
    }

    /** True when {@code amplifierV} lies beyond a clamp, so the loop is open there. */
    public boolean isClamped(double amplifierV) {
        double raw = unclampedInput(amplifierV);
        return raw < 0 || (scheme == ControlScheme.VOLTAGE && raw > dutyMax);
    }

    /**
     * Functions of the amplifier output that change sign where a clamp engages: voltage mode
     * {raw duty, duty_max − raw duty}, current mode {threshold}. The integrator locates their
     * zeros so that no step straddles a kink of the control law.
     */
    public double[] clampSurfaces(double amplifierV) {
        double raw = unclampedInput(amplifierV);
        return scheme == ControlScheme.VOLTAGE ? new double[] {raw, dutyMax - raw} : new double[] {raw};
    }
}
