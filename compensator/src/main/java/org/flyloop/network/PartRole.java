package org.flyloop.network;

/**
 * What kind of thing a named part value is, so a designer knows which values to round to a
 * preferred-number series and which to leave alone.
 */
public enum PartRole {
    /** A resistor picked by the designer; usually rounded to a fine series such as E96. */
    RESISTOR,
    /** A capacitor picked by the designer; usually rounded to a coarse series such as E12. */
    CAPACITOR,
    /**
     * A property of a chosen device (transconductance, CTR, gain-bandwidth, an equivalent
     * capacitance, a dynamic resistance): never rounded.
     */
    DEVICE
}
