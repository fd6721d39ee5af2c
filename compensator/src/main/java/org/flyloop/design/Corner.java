package org.flyloop.design;

import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.model.StageTransferFunctions;

/**
 * One corner of the operating envelope: an operating point, the optocoupler CTR assumed there
 * (NaN when the network has none) and the stage's small-signal model at that point.
 *
 * @param point the operating point
 * @param ctr   optocoupler CTR at this corner, NaN for networks without one
 * @param stage the stage model
 */
public record Corner(OperatingPoint point, double ctr, StageTransferFunctions stage) {

    /** "vin=90 V, iout=2 A" (plus the CTR where one applies). */
    public String describe() {
        String s = String.format(java.util.Locale.ROOT, "vin=%.4g V, iout=%.4g A", point.vin(), point.iout());
        return Double.isNaN(ctr) ? s : s + String.format(java.util.Locale.ROOT, ", ctr=%.3g", ctr);
    }
}
