package org.flyloop.spec;

/**
 * Component tolerances for the envelope, worst-case and Monte Carlo analyses.
 *
 * @param lm        magnetizing inductance
 * @param cout      output capacitance
 * @param esr       output capacitor ESR (electrolytics rise several-fold when cold)
 * @param fsw       switching frequency
 * @param ctrFromFeedback true when the optocoupler CTR spans feedback.ctr (the spec's
 *                  {@code ctr: from feedback.ctr})
 * @param resistors compensator resistors
 * @param capacitors compensator capacitors (feedback.cap_tolerance)
 */
public record TolerancesSpec(Tolerance lm, Tolerance cout, Tolerance esr, Tolerance fsw,
                             boolean ctrFromFeedback, Tolerance resistors, Tolerance capacitors) {

    /** No tolerances at all. */
    public static TolerancesSpec none() {
        return new TolerancesSpec(Tolerance.NONE, Tolerance.NONE, Tolerance.NONE, Tolerance.NONE, false,
                Tolerance.NONE, Tolerance.NONE);
    }
}
