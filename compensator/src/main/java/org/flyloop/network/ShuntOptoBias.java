package org.flyloop.network;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * DC bias limits of a shunt-opto network: can the LED pull the feedback pin low enough at the
 * worst CTR, and does the shunt regulator always get its minimum current?
 *
 * <p>At the lightest load the controller needs its feedback pin down at {@code fb_min}, so the
 * phototransistor must sink (Vdd − fb_min)/r_pullup, which at CTR min takes an LED current of that
 * divided by CTR min. The LED current comes through r_led from the output, with the LED's drop and
 * the shunt regulator's minimum cathode voltage in the way, and r_bias (at the LED's drop) takes
 * its share too: r_led ≤ (Vout − led_drop − shunt_min_voltage)/(i_led + led_drop/r_bias). When
 * the LED current is low, r_bias alone must still carry the shunt regulator's minimum current:
 * r_bias ≤ led_drop/shunt_min_current. These are straight Ohm's-law limits; the defaults for
 * led_drop (1.0 V), shunt_min_voltage (2.5 V) and shunt_min_current (1 mA) are common practice,
 * no source.
 *
 * @param voutV            regulated output voltage, V
 * @param pullupSupplyV    the controller's feedback supply Vdd, V
 * @param fbMinV           feedback-pin voltage that commands minimum duty or current, V
 * @param ledDropV         LED forward drop, V
 * @param shuntMinVoltageV shunt regulator's minimum cathode voltage, V
 * @param shuntMinCurrentA shunt regulator's minimum cathode current, A
 * @param ctrMin           lowest optocoupler CTR over life and temperature (a ratio)
 */
public record ShuntOptoBias(double voutV, double pullupSupplyV, double fbMinV, double ledDropV,
                            double shuntMinVoltageV, double shuntMinCurrentA, double ctrMin) {

    /** Default LED forward drop, V (common practice, no source). */
    public static final double DEFAULT_LED_DROP_V = 1.0;
    /** Default shunt regulator minimum cathode voltage, V (common practice, no source). */
    public static final double DEFAULT_SHUNT_MIN_VOLTAGE_V = 2.5;
    /** Default shunt regulator minimum cathode current, A (common practice, no source). */
    public static final double DEFAULT_SHUNT_MIN_CURRENT_A = 1e-3;

    public ShuntOptoBias {
        PartChecks.positive("vout", voutV);
        PartChecks.positive("pullup_supply", pullupSupplyV);
        PartChecks.nonNegative("fb_min", fbMinV);
        PartChecks.nonNegative("led_drop", ledDropV);
        PartChecks.nonNegative("shunt_min_voltage", shuntMinVoltageV);
        PartChecks.positive("shunt_min_current", shuntMinCurrentA);
        PartChecks.positive("ctr min", ctrMin);
    }

    /** With the default LED drop and shunt regulator minimums. */
    public static ShuntOptoBias withDefaults(double voutV, double pullupSupplyV, double fbMinV, double ctrMin) {
        return new ShuntOptoBias(voutV, pullupSupplyV, fbMinV, DEFAULT_LED_DROP_V,
                DEFAULT_SHUNT_MIN_VOLTAGE_V, DEFAULT_SHUNT_MIN_CURRENT_A, ctrMin);
    }

    /** Phototransistor current that pulls the pin to fb_min: (Vdd − fb_min)/r_pullup, A. */
    public double collectorCurrentNeededA(double rPullup) {
        return (pullupSupplyV - fbMinV) / rPullup;
    }

    /** LED current that gives that collector current at CTR min, A. */
    public double ledCurrentNeededA(double rPullup) {
        return collectorCurrentNeededA(rPullup) / ctrMin;
    }

    /** Current r_bias draws at the LED's forward drop, A. */
    public double biasCurrentA(double rBias) {
        return ledDropV / rBias;
    }

    /** Voltage left for r_led: Vout − led_drop − shunt_min_voltage, V. */
    public double ledResistorHeadroomV() {
        return voutV - ledDropV - shuntMinVoltageV;
    }

    /**
     * The largest r_led that still delivers the needed LED current plus r_bias's current with
     * the cathode at its minimum: (Vout − led_drop − shunt_min_voltage)/(i_led + i_bias), Ω.
     */
    public double maxLedResistance(double rPullup, double rBias) {
        return ledResistorHeadroomV() / (ledCurrentNeededA(rPullup) + biasCurrentA(rBias));
    }

    /** The largest r_bias that alone carries the shunt regulator's minimum current: led_drop/i_min, Ω. */
    public double maxBiasResistance() {
        return ledDropV / shuntMinCurrentA;
    }

    /** The violated constraints of a network's r_led, r_bias and r_pullup; empty when it biases. */
    public List<String> violations(ShuntOptoNetwork network) {
        return violations(network.rLed(), network.rBias(), network.rPullup());
    }

    /** Every violated constraint as a one-line message; empty when all hold. */
    public List<String> violations(double rLed, double rBias, double rPullup) {
        List<String> out = new ArrayList<>();
        if (!(fbMinV < pullupSupplyV)) {
            out.add(format("fb_min (%.4g V) must lie below pullup_supply (%.4g V)", fbMinV, pullupSupplyV));
        }
        if (!(ledResistorHeadroomV() > 0)) {
            out.add(format("the output (%.4g V) leaves no headroom for r_led above led_drop (%.4g V) "
                    + "plus shunt_min_voltage (%.4g V)", voutV, ledDropV, shuntMinVoltageV));
        } else if (fbMinV < pullupSupplyV && rLed > maxLedResistance(rPullup, rBias)) {
            out.add(format("r_led = %.4g Ω exceeds %.4g Ω: at CTR min %.3g it cannot carry the "
                            + "%.4g mA LED current plus %.4g mA into r_bias needed to pull the feedback "
                            + "pin to fb_min", rLed, maxLedResistance(rPullup, rBias), ctrMin,
                    1e3 * ledCurrentNeededA(rPullup), 1e3 * biasCurrentA(rBias)));
        }
        if (rBias > maxBiasResistance()) {
            out.add(format("r_bias = %.4g Ω exceeds %.4g Ω: at the LED's %.4g V drop it would carry less "
                    + "than the shunt regulator's minimum %.4g mA", rBias, maxBiasResistance(), ledDropV,
                    1e3 * shuntMinCurrentA));
        }
        return List.copyOf(out);
    }

    private static String format(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }
}
