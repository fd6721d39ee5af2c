package org.flyloop.envelope;

import java.util.Locale;

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

    /** "vin=36 V, iout=3 A", "vin=36 V, iout=1.02×boundary (2.31 A)", plus ", ctr=0.5" where one applies. */
    public String label() {
        String iout = load instanceof LoadSetting.Boundary
                ? String.format(Locale.ROOT, "%s (%.4g A)", load.describe(), nominalIoutA)
                : load.describe();
        String s = String.format(Locale.ROOT, "vin=%.4g V, iout=%s", vinV, iout);
        return Double.isNaN(ctr) ? s : s + String.format(Locale.ROOT, ", ctr=%.3g", ctr);
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
