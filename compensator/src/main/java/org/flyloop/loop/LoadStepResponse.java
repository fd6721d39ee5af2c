package org.flyloop.loop;

/**
 * Output deviation after a load-current step, from the linear closed-loop model.
 *
 * @param timesS          sample times, s (step at t = 0)
 * @param deviationV      vo(t) − vo(0⁻), V
 * @param stepA           the load step, A (positive: more load)
 * @param peakDeviationV  largest |deviation|, with its sign, V
 * @param peakTimeS       when it occurs, s
 * @param settlingBandV   half-width of the settling band, V
 * @param settlingTimeS   time after which |deviation − final| stays inside the band, s
 *                        (0 when it never leaves it; NaN when not settled within the window)
 */
public record LoadStepResponse(double[] timesS, double[] deviationV, double stepA, double peakDeviationV,
                               double peakTimeS, double settlingBandV, double settlingTimeS) {

    /**
     * Peak and settling of a sampled deviation. The final value is the last sample.
     */
    public static LoadStepResponse of(double[] t, double[] dv, double stepA, double settlingBandV) {
        int peak = 0;
        for (int i = 0; i < dv.length; i++) {
            if (Math.abs(dv[i]) > Math.abs(dv[peak])) {
                peak = i;
            }
        }
        double finalValue = dv[dv.length - 1];
        int last = -1;
        for (int i = dv.length - 1; i >= 0; i--) {
            if (Math.abs(dv[i] - finalValue) > settlingBandV) {
                last = i;
                break;
            }
        }
        double settle;
        if (last < 0) {
            settle = 0;
        } else if (last >= dv.length - 2) {
            settle = Double.NaN;
        } else {
            // Interpolate the exit from the band between samples last and last + 1.
            double e1 = Math.abs(dv[last] - finalValue) - settlingBandV;
            double e2 = Math.abs(dv[last + 1] - finalValue) - settlingBandV;
            double frac = e1 / (e1 - e2);
            settle = t[last] + frac * (t[last + 1] - t[last]);
        }
        return new LoadStepResponse(t.clone(), dv.clone(), stepA, dv[peak], t[peak], settlingBandV, settle);
    }
}
