package org.flyloop.spec;

/**
 * The controller as written in the spec, in SI units.
 *
 * @param scheme  voltage-mode or peak-current-mode
 * @param rampV   peak-to-peak PWM ramp, V (voltage mode; NaN when not given)
 * @param senseVPerA primary current to comparator voltage, V/A (current mode; NaN when not given)
 * @param slopeVPerS added compensation ramp at the comparator, V/s (current mode; 0 for none)
 * @param dutyMax largest duty cycle the controller allows, 0 &lt; duty_max &lt; 1
 * @param fbGain  feedback pin to comparator gain, V/V (1 when not given)
 */
public record ControlSpec(ControlScheme scheme, double rampV, double senseVPerA, double slopeVPerS,
                          double dutyMax, double fbGain) {

    public ControlSpec {
        if (scheme == null) {
            throw new IllegalArgumentException("control.scheme is required");
        }
        if (scheme == ControlScheme.VOLTAGE && !(rampV > 0)) {
            throw new IllegalArgumentException("control.ramp must be positive for voltage mode");
        }
        if (scheme == ControlScheme.CURRENT && !(senseVPerA > 0)) {
            throw new IllegalArgumentException("control.sense must be positive for current mode");
        }
        if (!(slopeVPerS >= 0)) {
            throw new IllegalArgumentException("control.slope must be zero or positive");
        }
        if (!(dutyMax > 0 && dutyMax < 1)) {
            throw new IllegalArgumentException("control.duty_max must lie between 0 and 1");
        }
        if (!(fbGain > 0)) {
            throw new IllegalArgumentException("control.fb_gain must be positive");
        }
    }

    /** Voltage-mode control with the given ramp and duty limit. */
    public static ControlSpec voltageMode(double rampV, double dutyMax) {
        return new ControlSpec(ControlScheme.VOLTAGE, rampV, Double.NaN, 0, dutyMax, 1);
    }

    /** Peak-current-mode control with the given sense gain, compensation slope and duty limit. */
    public static ControlSpec currentMode(double senseVPerA, double slopeVPerS, double dutyMax) {
        return new ControlSpec(ControlScheme.CURRENT, Double.NaN, senseVPerA, slopeVPerS, dutyMax, 1);
    }
}
