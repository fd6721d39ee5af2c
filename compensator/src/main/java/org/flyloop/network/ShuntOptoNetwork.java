package org.flyloop.network;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;

/**
 * Shunt regulator with optocoupler. The divider r_upper/r_lower feeds the shunt regulator's
 * reference; r_zero in series with c_zero (type 2), or c_zero alone (type 1, r_zero = 0), runs
 * from its cathode to its reference; r_led runs from the output to the LED anode, the LED cathode
 * sits on the shunt regulator's cathode, r_bias lies across the LED. The phototransistor pulls the
 * controller's feedback pin down against r_pullup (to the feedback supply), with c_pullup and the
 * optocoupler's equivalent capacitance c_opto from the pin to ground.
 *
 * <p>Small-signal model: the shunt regulator is ideal (its reference input is a virtual earth), the
 * CTR is a constant current gain, the optocoupler's own pole is the capacitance c_opto at the pin.
 * An ideal LED (r_led_dynamic = 0) holds a fixed drop, so r_bias sees a constant voltage and has
 * no AC effect; with a dynamic resistance r_d it shunts part of the signal current (see
 * {@link #effectiveLedResistance()}).
 *
 * <p>The fast lane: because r_led returns to the output itself, the LED current follows the output
 * directly as well as through the compensation. This sets a floor under the mid-band gain,
 * CTR·r_pullup/r_led (ideal LED), that no choice of r_zero can go below. Design procedure: take
 * the largest r_led the bias allows ({@link ShuntOptoBias#maxLedResistance}); the required mid-band
 * gain must be at least CTR·r_pullup/r_led (else raise r_led, or use another network); r_zero then
 * supplies the rest: r_zero = r_upper·(G·r_led/(CTR·r_pullup) − 1); c_zero places the zero and
 * c_pullup the pole.
 *
 * @param rUpper      output to reference, Ω
 * @param rLower      reference to ground, Ω (no AC effect: virtual earth)
 * @param rZero       series resistor cathode–reference, Ω; 0 for the type 1 variant
 * @param cZero       capacitor cathode–reference, F
 * @param rLed        output to LED anode, Ω
 * @param rBias       across the LED, Ω
 * @param ctr         optocoupler current transfer ratio (a ratio, 1.0 = 100 %)
 * @param rPullup     feedback pin to feedback supply, Ω
 * @param cOpto       optocoupler pole as a capacitance at the pin, F (0: none)
 * @param cPullup     capacitor from the pin to ground, F (0: none)
 * @param rLedDynamic LED dynamic resistance, Ω (0: ideal LED)
 */
public record ShuntOptoNetwork(double rUpper, double rLower, double rZero, double cZero, double rLed,
                               double rBias, double ctr, double rPullup, double cOpto, double cPullup,
                               double rLedDynamic) implements CompensatorNetwork {

    // Relative slack under which a computed r_zero or c_pullup that should be zero is taken as zero.
    private static final double ZERO_SLACK = 1e-9;

    public ShuntOptoNetwork {
        PartChecks.positive(PartNames.R_UPPER, rUpper);
        PartChecks.positive(PartNames.R_LOWER, rLower);
        PartChecks.nonNegative(PartNames.R_ZERO, rZero);
        PartChecks.positive(PartNames.C_ZERO, cZero);
        PartChecks.positive(PartNames.R_LED, rLed);
        PartChecks.positive(PartNames.R_BIAS, rBias);
        PartChecks.positive(PartNames.CTR, ctr);
        PartChecks.positive(PartNames.R_PULLUP, rPullup);
        PartChecks.nonNegative(PartNames.C_OPTO, cOpto);
        PartChecks.nonNegative(PartNames.C_PULLUP, cPullup);
        PartChecks.nonNegative(PartNames.R_LED_DYNAMIC, rLedDynamic);
    }

    /** C_opto = 1/(2π·opto_pole·r_pullup): the capacitance that puts a pole at opto_pole with r_pullup. */
    public static double equivalentOptoCapacitance(double optoPoleHz, double rPullup) {
        PartChecks.positive(PartNames.OPTO_POLE, optoPoleHz);
        PartChecks.positive(PartNames.R_PULLUP, rPullup);
        return 1 / (2 * Math.PI * optoPoleHz * rPullup);
    }

    /**
     * The smallest r_led whose fast-lane floor CTR·r_pullup/r_led stays at or below the mid-band
     * gain {@code midbandGain} (ideal LED).
     */
    public static double minimumLedResistance(double ctr, double rPullup, double midbandGain) {
        return ctr * rPullup / midbandGain;
    }

    /**
     * Type 2 parts from a zero, a pole and a gain target. The pole sets the pin capacitance,
     * c_pullup = 1/(2π·f_pole·r_pullup) − c_opto; the target gives ωI; then
     * c_zero = CTR·r_pullup/(R_e·r_upper·ωI) and r_zero = 1/(ωz·c_zero) − r_upper (see
     * {@link #transferFunction()}). A result within 1e-9·r_upper of r_zero = 0 becomes the type 1
     * variant.
     *
     * @throws UnrealisablePlacementException when the pole lies above the optocoupler's own pole
     *         (c_pullup &lt; 0) or the gain lies under the fast-lane floor (r_zero &lt; 0)
     */
    public static ShuntOptoNetwork place(ShuntOptoFixedParts fixed, GainTarget gain, double zeroHz,
                                         double poleHz) {
        PartChecks.positive("zero frequency", zeroHz);
        double cPullup = pullupCapacitance(fixed, poleHz);
        double rUpper = fixed.divider().rUpper();
        double re = effectiveLedResistance(fixed.rLed(), fixed.rBias(), fixed.rLedDynamic());
        double wz = 2 * Math.PI * zeroHz;
        double wI = gain.integratorRadPerS(List.of(Root.realAtHz(zeroHz)), List.of(Root.realAtHz(poleHz)));
        double cZero = fixed.ctr() * fixed.rPullup() / (re * rUpper * wI);
        double rZero = 1 / (wz * cZero) - rUpper;
        if (rZero < 0) {
            double floor = fixed.ctr() * fixed.rPullup() / re;
            if (rZero < -ZERO_SLACK * rUpper) {
                throw new UnrealisablePlacementException(String.format(Locale.ROOT,
                        "shunt-opto: the mid-band gain asked for (%.4g) lies below the fast-lane floor "
                                + "CTR·r_pullup/r_led = %.4g; raise r_led to at least %.4g Ω if the bias "
                                + "allows, or use an op-amp or OTA network",
                        wI / wz, floor, fixed.rLed() * floor / (wI / wz)));
            }
            rZero = 0;
        }
        return build(fixed, rZero, cZero, cPullup);
    }

    /**
     * Type 1 parts (c_zero alone, r_zero = 0): the zero sits at 1/(2π·r_upper·c_zero) and the
     * mid-band gain is the fast-lane floor itself, so only the zero and the pole are free.
     */
    public static ShuntOptoNetwork placeType1(ShuntOptoFixedParts fixed, double zeroHz, double poleHz) {
        PartChecks.positive("zero frequency", zeroHz);
        double cPullup = pullupCapacitance(fixed, poleHz);
        double cZero = 1 / (2 * Math.PI * zeroHz * fixed.divider().rUpper());
        return build(fixed, 0, cZero, cPullup);
    }

    private static double pullupCapacitance(ShuntOptoFixedParts fixed, double poleHz) {
        PartChecks.positive("pole frequency", poleHz);
        double total = 1 / (2 * Math.PI * poleHz * fixed.rPullup());
        double cPullup = total - fixed.cOpto();
        if (cPullup < 0) {
            if (cPullup < -ZERO_SLACK * total) {
                throw new UnrealisablePlacementException(String.format(Locale.ROOT,
                        "shunt-opto: the pole asked for (%.4g Hz) lies above the optocoupler's own pole "
                                + "(%.4g Hz with r_pullup = %.4g Ω); c_pullup would be negative",
                        poleHz, 1 / (2 * Math.PI * fixed.cOpto() * fixed.rPullup()), fixed.rPullup()));
            }
            cPullup = 0;
        }
        return cPullup;
    }

    private static ShuntOptoNetwork build(ShuntOptoFixedParts f, double rZero, double cZero, double cPullup) {
        return new ShuntOptoNetwork(f.divider().rUpper(), f.divider().rLower(), rZero, cZero, f.rLed(),
                f.rBias(), f.ctr(), f.rPullup(), f.cOpto(), cPullup, f.rLedDynamic());
    }

    /**
     * Builds from named parts: r_upper, r_lower, c_zero, r_led, r_bias, ctr, r_pullup; optional
     * r_zero, c_pullup, r_led_dynamic (absent: 0) and either c_opto or opto_pole (Hz at this
     * r_pullup; absent: no optocoupler pole).
     */
    public static ShuntOptoNetwork fromParts(Map<String, Double> parts) {
        PartReader r = new PartReader(NetworkKind.SHUNT_OPTO.specName(), parts);
        double rPullup = r.required(PartNames.R_PULLUP);
        if (r.has(PartNames.C_OPTO) && r.has(PartNames.OPTO_POLE)) {
            throw new IllegalArgumentException("shunt-opto: give c_opto or opto_pole, not both");
        }
        double cOpto = r.has(PartNames.OPTO_POLE)
                ? equivalentOptoCapacitance(r.required(PartNames.OPTO_POLE), rPullup)
                : r.optional(PartNames.C_OPTO, 0);
        ShuntOptoNetwork n = new ShuntOptoNetwork(r.required(PartNames.R_UPPER),
                r.required(PartNames.R_LOWER), r.optional(PartNames.R_ZERO, 0),
                r.required(PartNames.C_ZERO), r.required(PartNames.R_LED), r.required(PartNames.R_BIAS),
                r.required(PartNames.CTR), rPullup, cOpto, r.optional(PartNames.C_PULLUP, 0),
                r.optional(PartNames.R_LED_DYNAMIC, 0));
        r.requireAllUsed();
        return n;
    }

    @Override
    public NetworkKind kind() {
        return NetworkKind.SHUNT_OPTO;
    }

    /** 1 when c_zero stands alone (r_zero = 0), else 2. */
    public int type() {
        return rZero == 0 ? 1 : 2;
    }

    @Override
    public Map<String, Double> parts() {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put(PartNames.R_UPPER, rUpper);
        m.put(PartNames.R_LOWER, rLower);
        putIfPresent(m, PartNames.R_ZERO, rZero);
        m.put(PartNames.C_ZERO, cZero);
        m.put(PartNames.R_LED, rLed);
        m.put(PartNames.R_BIAS, rBias);
        m.put(PartNames.CTR, ctr);
        m.put(PartNames.R_PULLUP, rPullup);
        putIfPresent(m, PartNames.C_OPTO, cOpto);
        putIfPresent(m, PartNames.C_PULLUP, cPullup);
        putIfPresent(m, PartNames.R_LED_DYNAMIC, rLedDynamic);
        return Collections.unmodifiableMap(m);
    }

    private static void putIfPresent(Map<String, Double> m, String name, double value) {
        if (value != 0) {
            m.put(name, value);
        }
    }

    /**
     * Resistance R_e with i_led = (v_out − v_cathode)/R_e: r_led in series with r_d ‖ r_bias, of
     * which the LED takes the share r_bias/(r_d + r_bias); so R_e = r_led + r_d + r_led·r_d/r_bias.
     * Equals r_led for an ideal LED (r_d = 0).
     */
    public double effectiveLedResistance() {
        return effectiveLedResistance(rLed, rBias, rLedDynamic);
    }

    private static double effectiveLedResistance(double rLed, double rBias, double rDyn) {
        return rLed + rDyn + rLed * rDyn / rBias;
    }

    /** The fast-lane floor CTR·r_pullup/R_e: the mid-band gain with r_zero = 0. */
    public double fastLaneFloor() {
        return ctr * rPullup / effectiveLedResistance();
    }

    /** Mid-band asymptote CTR·r_pullup/R_e·(1 + r_zero/r_upper). */
    public double midbandGain() {
        return fastLaneFloor() * (1 + rZero / rUpper);
    }

    /**
     * Derivation (small-signal, ideal shunt regulator so v_ref = 0):
     * the current v_out/r_upper flows through Zf = r_zero + 1/(s·c_zero), so
     * v_cathode = −v_out·Zf/r_upper; the LED current is
     * i_led = (v_out − v_cathode)/R_e = v_out·(1 + Zf/r_upper)/R_e; the phototransistor sinks
     * CTR·i_led from the pin, whose impedance is Z_pin = r_pullup/(1 + s·r_pullup·(c_opto + c_pullup)),
     * so v_fb = −CTR·i_led·Z_pin and
     * <pre>
     *   Gc = −v_fb/v_out = CTR·r_pullup/(R_e·r_upper·c_zero)
     *        · (1 + s·c_zero·(r_upper + r_zero)) / (s·(1 + s·r_pullup·(c_opto + c_pullup)))
     * </pre>
     * The "1 +" in (1 + Zf/r_upper) is the fast lane; it moves the zero from 1/(r_zero·c_zero) to
     * 1/((r_upper + r_zero)·c_zero) and keeps a zero even when r_zero = 0.
     */
    @Override
    public TransferFunction transferFunction() {
        double gain = ctr * rPullup / (effectiveLedResistance() * rUpper * cZero);
        List<Root> poles = new ArrayList<>();
        double cPin = cOpto + cPullup;
        if (cPin > 0) {
            poles.add(Root.real(-1 / (rPullup * cPin)));
        }
        return TransferFunction.of(gain, 1, List.of(Root.real(-1 / (cZero * (rUpper + rZero)))), poles);
    }
}
