package org.flyloop.envelope;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * One corner of the operating envelope, independent of component tolerances: an input voltage, a
 * load setting, and the optocoupler CTR taken there.
 *
 * @param vinV         input voltage, V
 * @param load         how the load current is set
 * @param ctr          optocoupler CTR at this corner; NaN when the network has no optocoupler or
 *                     the CTR is a sampled tolerance
 * @param nominalIoutA the load current this corner has with the nominal stage, A (for labels)
 */
public record EnvelopeCorner(double vinV, LoadSetting load, double ctr, double nominalIoutA) {

    /** "vin=36 V, iout=3 A", "vin=36 V, iout=1.02×boundary (2.31 A)", plus ", ctr=50 %" where one applies. */
    public String label() {
        String iout = load instanceof LoadSetting.Boundary
                ? load.describe() + " (" + significant(nominalIoutA) + " A)"
                : load.describe();
        String s = "vin=" + significant(vinV) + " V, iout=" + iout;
        return Double.isNaN(ctr) ? s : s + ", ctr=" + significant(100 * ctr) + " %";
    }

    /** Four significant digits without trailing zeros or exponent: 36, 0.5, 2.312. */
    static String significant(double x) {
        if (!Double.isFinite(x)) {
            return Double.toString(x);
        }
        return new BigDecimal(x).round(new MathContext(4)).stripTrailingZeros().toPlainString();
    }

    /** True for a corner placed beside the CCM/DCM boundary. */
    public boolean nearBoundary() {
        return load instanceof LoadSetting.Boundary;
    }

    /** The same corner without its CTR (for analyses that sample the CTR). */
    EnvelopeCorner withoutCtr() {
        return new EnvelopeCorner(vinV, load, Double.NaN, nominalIoutA);
    }
}
