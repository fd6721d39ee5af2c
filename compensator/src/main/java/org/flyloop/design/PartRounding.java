package org.flyloop.design;

import java.util.LinkedHashMap;
import java.util.Map;
import org.flyloop.eseries.ESeries;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;
import org.flyloop.spec.SeriesSpec;

/**
 * Rounds a network's resistors and capacitors to IEC 60063 series, nearest in the logarithmic
 * sense; devices (CTR, gm, GBW, the optocoupler's capacitance) are left alone. r_led rounds down,
 * never up, so that the bias constraint it was chosen under still holds.
 */
public final class PartRounding {

    private PartRounding() {
    }

    /** The network with every resistor and capacitor on its series. */
    public static CompensatorNetwork round(CompensatorNetwork network, SeriesSpec series) {
        ESeries r = ESeries.parse(series.resistors());
        ESeries c = ESeries.parse(series.capacitors());
        Map<String, Double> rounded = new LinkedHashMap<>();
        for (Map.Entry<String, Double> e : network.parts().entrySet()) {
            String name = e.getKey();
            double v = e.getValue();
            if (name.equals(PartNames.C_OPTO)) {
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
