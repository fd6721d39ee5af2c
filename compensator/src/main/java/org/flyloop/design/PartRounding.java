package org.flyloop.design;

import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.flyloop.eseries.ESeries;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.SeriesSpec;

/**
 * Rounds a network's resistors and capacitors to IEC 60063 series, nearest in the logarithmic
 * sense; devices (CTR, gm, GBW, the optocoupler's capacitance) and the parts the spec fixed are left
 * alone. r_led rounds down, never up, so that the bias constraint it was chosen under still holds.
 * A c_pullup below 1 % of the optocoupler's own capacitance changes the pole by less than 1 % and
 * is left out rather than rounded to a capacitor nobody would fit.
 */
public final class PartRounding {

    static final double NEGLIGIBLE_PULLUP = 0.01;

    private PartRounding() {
    }

    /**
     * The network with every resistor and capacitor on its series, except the parts the spec's
     * feedback section fixes ({@link #specFixedParts}).
     */
    public static CompensatorNetwork round(CompensatorNetwork network, SeriesSpec series, FeedbackSpec feedback) {
        return round(network, series, specFixedParts(feedback));
    }

    /**
     * Parts whose values the spec fixes, used as given and never rounded: r_pullup always, and
     * r_upper, r_lower, r_led and r_bias when the spec gives them.
     */
    public static Set<String> specFixedParts(FeedbackSpec fb) {
        Set<String> keep = new HashSet<>();
        keep.add(PartNames.R_PULLUP);
        if (!Double.isNaN(fb.rUpper())) {
            keep.add(PartNames.R_UPPER);
        }
        if (!Double.isNaN(fb.rLower())) {
            keep.add(PartNames.R_LOWER);
        }
        if (!Double.isNaN(fb.rLed())) {
            keep.add(PartNames.R_LED);
        }
        if (fb.parts().containsKey(PartNames.R_BIAS)) {
            keep.add(PartNames.R_BIAS);
        }
        return keep;
    }

    /** The network with every resistor and capacitor on its series, keeping the named parts as they are. */
    public static CompensatorNetwork round(CompensatorNetwork network, SeriesSpec series, Set<String> keep) {
        ESeries r = ESeries.parse(series.resistors());
        ESeries c = ESeries.parse(series.capacitors());
        Map<String, Double> parts = network.parts();
        Map<String, Double> rounded = new LinkedHashMap<>();
        for (Map.Entry<String, Double> e : parts.entrySet()) {
            String name = e.getKey();
            double v = e.getValue();
            if (name.equals(PartNames.C_OPTO) || keep.contains(name)) {
                continue;
            }
            if (name.equals(PartNames.C_PULLUP) && v < NEGLIGIBLE_PULLUP * parts.getOrDefault(PartNames.C_OPTO, 0.0)) {
                rounded.put(name, 0.0);
                continue;
            }
            PartRole role = PartNames.role(name);
            if (role == PartRole.RESISTOR) {
                rounded.put(name, name.equals(PartNames.R_LED) ? r.atOrBelow(v) : r.nearest(v));
            } else if (role == PartRole.CAPACITOR) {
                rounded.put(name, c.nearest(v));
            }
        }
        return network.withParts(rounded);
    }
}
