package org.flyloop.switching;

/**
 * Open-loop duty-cycle control: the switch conducts for {@code duty}·Ts at the start of each
 * period.
 *
 * @param duty on-time fraction, 0 ≤ duty &lt; 1
 */
public record FixedDuty(double duty) implements Modulator {

    public FixedDuty {
        if (!(duty >= 0 && duty < 1)) {
            throw new IllegalArgumentException("duty must lie in [0, 1), got " + duty);
        }
    }
}
