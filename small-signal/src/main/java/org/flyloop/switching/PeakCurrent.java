package org.flyloop.switching;

/**
 * Open-loop peak-current control: the switch turns off when the sensed primary current plus the
 * compensation ramp, senseVPerA·im(t) + slopeVPerS·t (t from the start of the period), reaches
 * {@code controlVoltage}, or at dutyMax·Ts if it never does. If the sum already exceeds the
 * threshold at turn-on the switch stays off for that period (no minimum on-time, no blanking).
 *
 * @param controlVoltage comparator threshold, V
 * @param senseVPerA     current-sense gain, V/A
 * @param slopeVPerS     compensation ramp slope, V/s (0 for none)
 * @param dutyMax        latest turn-off as a fraction of the period, 0 &lt; dutyMax &lt; 1
 */
public record PeakCurrent(double controlVoltage, double senseVPerA, double slopeVPerS, double dutyMax)
        implements Modulator {

    public PeakCurrent {
        if (!Double.isFinite(controlVoltage)) {
            throw new IllegalArgumentException("control voltage must be finite, got " + controlVoltage);
        }
        if (!(senseVPerA > 0) || !Double.isFinite(senseVPerA)) {
            throw new IllegalArgumentException("sense gain must be positive, got " + senseVPerA);
        }
        if (!(slopeVPerS >= 0) || !Double.isFinite(slopeVPerS)) {
            throw new IllegalArgumentException("slope must be zero or positive, got " + slopeVPerS);
        }
        if (!(dutyMax > 0 && dutyMax < 1)) {
            throw new IllegalArgumentException("dutyMax must lie in (0, 1), got " + dutyMax);
        }
    }
}
