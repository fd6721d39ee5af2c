package org.flyloop.units;

/**
 * The kinds of quantity a spec value can have, each with its SI symbol.
 *
 * <p>A percentage is not a unit of its own: {@code 75%} is the dimensionless number 0.75.
 */
public enum Unit {
    VOLT("V", "voltage", "volts", "12"),
    AMPERE("A", "current", "amperes", "2"),
    HERTZ("Hz", "frequency", "hertz", "65k"),
    HENRY("H", "inductance", "henries", "700u"),
    FARAD("F", "capacitance", "farads", "1000u"),
    OHM("ohm", "resistance", "ohms", "40m"),
    SECOND("s", "time", "seconds", "10u"),
    WATT("W", "power", "watts", "24"),
    /** Transresistance, e.g. a current-sense gain. */
    VOLT_PER_AMPERE("V/A", "transresistance", "volts per ampere", "0.5"),
    /** Slew rate, e.g. a compensation ramp; {@code V/us} is accepted and converted. */
    VOLT_PER_SECOND("V/s", "slew rate", "volts per second", "50k"),
    /** Conductance, e.g. a transconductance amplifier's gm. */
    SIEMENS("S", "conductance", "siemens", "200u"),
    DIMENSIONLESS("", "dimensionless number", "a plain number", "8");

    private final String symbol;
    private final String dimension;
    private final String pluralName;
    private final String exampleNumber;

    Unit(String symbol, String dimension, String pluralName, String exampleNumber) {
        this.symbol = symbol;
        this.dimension = dimension;
        this.pluralName = pluralName;
        this.exampleNumber = exampleNumber;
    }

    /** The SI symbol as written after a number, e.g. {@code F}; empty for dimensionless. */
    public String symbol() {
        return symbol;
    }

    /** What the unit measures, e.g. {@code capacitance}. */
    public String dimension() {
        return dimension;
    }

    /** How to ask for the unit in a hint, e.g. {@code farads}. */
    public String pluralName() {
        return pluralName;
    }

    /**
     * A short hint of accepted spellings, e.g. {@code 1000u or 1000uF}, built on the given number
     * with its suffix (or on a typical value when {@code numberWithSuffix} is null or empty).
     */
    public String example(String numberWithSuffix) {
        String n = numberWithSuffix == null || numberWithSuffix.isEmpty() ? exampleNumber : numberWithSuffix;
        return symbol.isEmpty() ? n : n + " or " + n + symbol;
    }

    /** The accepted-forms half of an error message, e.g. {@code write farads, e.g. 1000u or 1000uF}. */
    public String hint(String numberWithSuffix) {
        return "write " + pluralName + ", e.g. " + example(numberWithSuffix);
    }
}
