package org.flyloop.cli.report;

import org.flyloop.cli.plot.SiText;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;

/** Part values as a reader expects them: "49.9 kΩ", "4.7 nF", "CTR 70.7 %", "gm 200 µS". */
public final class PartText {

    private PartText() {
    }

    /** The SI unit of a named part's value ("" for the CTR, which is a ratio). */
    public static String unit(String partName) {
        return switch (partName) {
            case PartNames.GBW, PartNames.OPTO_POLE -> "Hz";
            case PartNames.GM -> "S";
            case PartNames.CTR -> "";
            case PartNames.C_OPTO -> "F";
            case PartNames.R_LED_DYNAMIC -> "Ω";
            default -> PartNames.role(partName) == PartRole.CAPACITOR ? "F" : "Ω";
        };
    }

    /** A part value with its unit, three significant digits (the CTR as a percentage). */
    public static String value(String partName, double value) {
        if (partName.equals(PartNames.CTR)) {
            return SiText.plain(100 * value, 3) + " %";
        }
        if (Double.isInfinite(value)) {
            return "ideal";
        }
        return SiText.format(value, unit(partName), 3);
    }

    /** What kind of part it is and whether it was rounded. */
    public static String role(String partName, String resistorSeries, String capacitorSeries) {
        return switch (PartNames.role(partName)) {
            case RESISTOR -> "resistor, " + resistorSeries;
            case CAPACITOR -> "capacitor, " + capacitorSeries;
            case DEVICE -> "device property, not rounded";
        };
    }
}
