package org.flyloop.network;

import java.util.Map;

/**
 * The part names of the compensator networks. They are a public contract: they appear as keys in
 * the spec and in JSON output, so they never change. Values are SI: ohms, farads, siemens, hertz,
 * and a plain ratio for the CTR.
 */
public final class PartNames {

    /** Divider resistor from the output to the sensing node. */
    public static final String R_UPPER = "r_upper";
    /** Divider resistor from the sensing node to ground. */
    public static final String R_LOWER = "r_lower";
    /** Integrating capacitor of an op-amp type 1 network (output to inverting input). */
    public static final String C_FB = "c_fb";
    /** Resistor of the series R–C that places the main zero. */
    public static final String R_ZERO = "r_zero";
    /** Capacitor of the series R–C that places the main zero. */
    public static final String C_ZERO = "c_zero";
    /** Capacitor across (op-amp) or beside (OTA) the zero branch, placing the high-frequency pole. */
    public static final String C_POLE = "c_pole";
    /** Resistor of the R–C pair across r_upper in an op-amp type 3 network. */
    public static final String R_FF = "r_ff";
    /** Capacitor of the R–C pair across r_upper in an op-amp type 3 network. */
    public static final String C_FF = "c_ff";
    /** Op-amp gain-bandwidth product, Hz; absent for an ideal op-amp. */
    public static final String GBW = "gbw";
    /** Transconductance of an OTA, S. */
    public static final String GM = "gm";
    /** Resistor from the output to the optocoupler LED anode. */
    public static final String R_LED = "r_led";
    /** Resistor across the LED that keeps the shunt regulator's minimum current. */
    public static final String R_BIAS = "r_bias";
    /** Optocoupler current transfer ratio used for the transfer function (a ratio, not percent). */
    public static final String CTR = "ctr";
    /** Pull-up resistor from the controller's feedback pin to its feedback supply. */
    public static final String R_PULLUP = "r_pullup";
    /** Capacitor added from the feedback pin to ground. */
    public static final String C_PULLUP = "c_pullup";
    /** Equivalent capacitance standing for the optocoupler's own pole at the feedback pin, F. */
    public static final String C_OPTO = "c_opto";
    /**
     * The optocoupler's own pole, Hz, measured at the network's r_pullup; accepted as input in
     * place of {@link #C_OPTO}, never emitted.
     */
    public static final String OPTO_POLE = "opto_pole";
    /** LED dynamic (small-signal) resistance, Ω; absent means an ideal LED. */
    public static final String R_LED_DYNAMIC = "r_led_dynamic";

    private static final Map<String, PartRole> ROLES = Map.ofEntries(
            Map.entry(R_UPPER, PartRole.RESISTOR),
            Map.entry(R_LOWER, PartRole.RESISTOR),
            Map.entry(C_FB, PartRole.CAPACITOR),
            Map.entry(R_ZERO, PartRole.RESISTOR),
            Map.entry(C_ZERO, PartRole.CAPACITOR),
            Map.entry(C_POLE, PartRole.CAPACITOR),
            Map.entry(R_FF, PartRole.RESISTOR),
            Map.entry(C_FF, PartRole.CAPACITOR),
            Map.entry(GBW, PartRole.DEVICE),
            Map.entry(GM, PartRole.DEVICE),
            Map.entry(R_LED, PartRole.RESISTOR),
            Map.entry(R_BIAS, PartRole.RESISTOR),
            Map.entry(CTR, PartRole.DEVICE),
            Map.entry(R_PULLUP, PartRole.RESISTOR),
            Map.entry(C_PULLUP, PartRole.CAPACITOR),
            Map.entry(C_OPTO, PartRole.DEVICE),
            Map.entry(OPTO_POLE, PartRole.DEVICE),
            Map.entry(R_LED_DYNAMIC, PartRole.DEVICE));

    private PartNames() {
    }

    /**
     * The role of a named part.
     *
     * @throws IllegalArgumentException for a name that is not a part of any network
     */
    public static PartRole role(String partName) {
        PartRole r = ROLES.get(partName);
        if (r == null) {
            throw new IllegalArgumentException("unknown part name '" + partName + "'");
        }
        return r;
    }
}
