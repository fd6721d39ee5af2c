package org.flyloop.cli.output;

import java.util.Locale;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;

/**
 * Part values the way they are written on a schematic: engineering notation with an SI prefix and
 * the unit ({@code 38.3 kΩ}, {@code 10 nF}, {@code 1 mS}). The CTR, a plain ratio, is written as a
 * percentage, the way optocoupler data sheets state it.
 */
public final class PartsNotation {

    private static final String[] PREFIXES = {"f", "p", "n", "µ", "m", "", "k", "M", "G"};
    private static final int UNIT_PREFIX_INDEX = 5;

    private PartsNotation() {
    }

    /** The unit symbol a named part is given in ({@code ""} for the CTR, a ratio). */
    public static String unitOf(String partName) {
        PartRole role = PartNames.role(partName);
        if (role == PartRole.RESISTOR || partName.equals(PartNames.R_LED_DYNAMIC)) {
            return "Ω";
        }
        if (role == PartRole.CAPACITOR || partName.equals(PartNames.C_OPTO)) {
            return "F";
        }
        return switch (partName) {
            case PartNames.GM -> "S";
            case PartNames.GBW, PartNames.OPTO_POLE -> "Hz";
            default -> "";
        };
    }

    /** A named part's value with its unit, {@code digits} significant digits. */
    public static String part(String partName, double value, int digits) {
        if (partName.equals(PartNames.CTR)) {
            return NumberText.significant(100 * value, digits) + " %";
        }
        return engineering(value, unitOf(partName), digits);
    }

    /**
     * {@code value} with {@code digits} significant digits and an SI prefix chosen so that the
     * mantissa lies in [1, 1000): {@code engineering(38300, "Ω", 3)} is {@code 38.3 kΩ}. Values
     * outside femto to giga keep the nearest prefix and a longer mantissa; zero is {@code 0 <unit>};
     * NaN is {@code -}.
     */
    public static String engineering(double value, String unit, int digits) {
        if (!Double.isFinite(value)) {
            return NumberText.significant(value, digits);
        }
        String space = unit.isEmpty() ? "" : " ";
        if (value == 0) {
            return "0" + space + unit;
        }
        // Round first, so that 999.96 with three digits becomes 1.00 k rather than 1000.
        double rounded = Double.parseDouble(String.format(Locale.ROOT, "%." + (digits - 1) + "e", value));
        int exponent3 = (int) Math.floor(Math.log10(Math.abs(rounded)) / 3);
        int index = Math.max(0, Math.min(PREFIXES.length - 1, exponent3 + UNIT_PREFIX_INDEX));
        double mantissa = rounded / Math.pow(1000, index - UNIT_PREFIX_INDEX);
        return NumberText.significant(mantissa, digits) + space + PREFIXES[index] + unit;
    }
}
