package org.flyloop.cli.spec;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.flyloop.cli.output.NumberText;
import org.flyloop.cli.spec.SpecSection.Sign;
import org.flyloop.network.PartNames;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.PlacementMethod;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;
import org.flyloop.units.Unit;

/** Reads the optional {@code feedback:} section into a {@link FeedbackSpec}. */
final class FeedbackSectionReader {

    static final List<String> KEYS = List.of("amplifier", "type", "placement", "reference", "r_lower", "r_upper",
            "gbw", "gm", "ctr", "r_pullup", "pullup_supply", "fb_min", "opto_pole", "c_opto", "r_led", "led_drop",
            "shunt_min_voltage", "shunt_min_current", "cap_tolerance", "parts");

    /** Keys that describe one amplifier only; any other amplifier refuses them. */
    private static final Map<String, AmplifierKind> OWNED_KEYS = ownedKeys();

    /**
     * Reference voltage when none is given: the 2.5 V of the TL431-class shunt regulators, also a
     * frequent op-amp and OTA controller reference (common practice, no source). Documented as a
     * default for every amplifier; write the reference of the part you use.
     */
    static final double DEFAULT_REFERENCE_V = 2.5;
    /** Feedback-pin pull-up supply: many controllers pull up to an internal 5 V (common practice, no source). */
    static final double DEFAULT_PULLUP_SUPPLY_V = 5;
    /** Feedback-pin voltage at minimum duty or current (common practice, no source). */
    static final double DEFAULT_FB_MIN_V = 1.0;
    /** Infrared LED forward drop at a few milliamperes (common practice, no source). */
    static final double DEFAULT_LED_DROP_V = 1.0;
    /**
     * Shunt-regulator minimum cathode voltage and current: a TL431 needs its cathode at or above
     * its 2.5 V reference and at most 1 mA to regulate (Texas Instruments, "TL431, TL432
     * Precision Programmable Reference", data sheet SLVS543, recommended operating conditions and
     * I_min).
     */
    static final double DEFAULT_SHUNT_MIN_VOLTAGE_V = 2.5;
    static final double DEFAULT_SHUNT_MIN_CURRENT_A = 1e-3;
    /** Capacitor tolerance: ±10 % is the usual X7R ceramic grade (common practice, no source). */
    static final double DEFAULT_CAP_TOLERANCE = 0.1;
    /**
     * Largest CTR taken at face value. Transistor optocouplers stay well below 10 (1000 %); a
     * larger number is almost always a percentage written without its % sign (common practice,
     * no source).
     */
    static final double MAX_CTR = 10;

    /** Two spellings of one value agree to this relative difference (far below any part tolerance). */
    private static final double SAME_VALUE_SLACK = 1e-9;

    private static final String CTR_HINT = "write a ratio such as 1.0 or a percentage such as 100%, "
            + "one value or [min, max] or [min, nominal, max]";

    private FeedbackSectionReader() {
    }

    /**
     * Reads and checks the section against the already-read stage: keys of another amplifier are
     * refused, required keys of the chosen one must be present, the reference must lie below
     * stage.vout and the minimum feedback-pin voltage below its pull-up supply.
     */
    static FeedbackSpec read(String source, JsonNode value, StageSpec stage) {
        SpecSection s = new SpecSection(source, "feedback", value, KEYS);
        AmplifierKind amplifier = AmplifierKind.fromSpecName(s.word("amplifier",
                List.of(AmplifierKind.OPAMP.specName(), AmplifierKind.OTA.specName(),
                        AmplifierKind.SHUNT_OPTO.specName())));
        refuseForeignKeys(s, amplifier);
        int type = readType(s, amplifier);
        PlacementMethod placement = PlacementMethod.fromSpecName(s.word("placement",
                List.of(PlacementMethod.K_FACTOR.specName(), PlacementMethod.POLES_ZEROS.specName(),
                        PlacementMethod.BEST.specName()), PlacementMethod.BEST.specName()));
        double reference = s.quantity("reference", Unit.VOLT, Sign.POSITIVE, DEFAULT_REFERENCE_V);
        if (!(reference < stage.vout())) {
            throw s.at("reference", "must lie below stage.vout = " + number(stage.vout()) + " V, got "
                    + number(reference) + " V", "write the reference voltage of the amplifier or shunt regulator");
        }
        double rLower = s.quantity("r_lower", Unit.OHM, Sign.POSITIVE, Double.NaN);
        double rUpper = s.quantity("r_upper", Unit.OHM, Sign.POSITIVE, Double.NaN);
        double capTolerance = s.quantity("cap_tolerance", Unit.DIMENSIONLESS, Sign.ZERO_OR_POSITIVE,
                DEFAULT_CAP_TOLERANCE);
        if (!(capTolerance < 1)) {
            throw s.at("cap_tolerance", "a band of ±100 % or more reaches zero", "write a fraction such as 10%");
        }
        double gbw = amplifier == AmplifierKind.OPAMP ? s.quantity("gbw", Unit.HERTZ, Sign.POSITIVE, Double.NaN)
                : Double.NaN;
        double gm = amplifier == AmplifierKind.OTA ? s.quantity("gm", Unit.SIEMENS, Sign.POSITIVE) : Double.NaN;
        Map<String, Double> parts = readParts(s, amplifier);
        if (amplifier != AmplifierKind.SHUNT_OPTO) {
            return new FeedbackSpec(amplifier, type, placement, reference, rLower, rUpper, gbw, gm,
                    ValueRange.of(1), Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN, Double.NaN, capTolerance, parts);
        }
        ValueRange ctr = s.range("ctr", Unit.DIMENSIONLESS, Sign.POSITIVE);
        checkCtr(s, "ctr", ctr.max());
        double rPullup = s.quantity("r_pullup", Unit.OHM, Sign.POSITIVE);
        double pullupSupply = s.quantity("pullup_supply", Unit.VOLT, Sign.POSITIVE, DEFAULT_PULLUP_SUPPLY_V);
        double fbMin = s.quantity("fb_min", Unit.VOLT, Sign.ZERO_OR_POSITIVE, DEFAULT_FB_MIN_V);
        if (!(fbMin < pullupSupply)) {
            throw s.at("fb_min", "must lie below pullup_supply = " + number(pullupSupply) + " V, got "
                    + number(fbMin) + " V", "write the feedback-pin voltage at minimum duty or current");
        }
        if (s.has("opto_pole") && s.has("c_opto")) {
            throw s.at("c_opto", "given together with opto_pole",
                    "give one: opto_pole (Hz, at r_pullup) or c_opto (F)");
        }
        double optoPole = s.quantity("opto_pole", Unit.HERTZ, Sign.POSITIVE, Double.NaN);
        double cOpto = s.quantity("c_opto", Unit.FARAD, Sign.POSITIVE, Double.NaN);
        double rLed = s.quantity("r_led", Unit.OHM, Sign.POSITIVE, Double.NaN);
        double ledDrop = s.quantity("led_drop", Unit.VOLT, Sign.POSITIVE, DEFAULT_LED_DROP_V);
        double shuntMinVoltage = s.quantity("shunt_min_voltage", Unit.VOLT, Sign.POSITIVE,
                DEFAULT_SHUNT_MIN_VOLTAGE_V);
        double shuntMinCurrent = s.quantity("shunt_min_current", Unit.AMPERE, Sign.POSITIVE,
                DEFAULT_SHUNT_MIN_CURRENT_A);
        return new FeedbackSpec(amplifier, type, placement, reference, rLower, rUpper, gbw, gm, ctr, rPullup,
                pullupSupply, fbMin, optoPole, cOpto, rLed, ledDrop, shuntMinVoltage, shuntMinCurrent,
                capTolerance, parts);
    }

    /** A key that belongs to another amplifier is an error rather than silently unused. */
    private static void refuseForeignKeys(SpecSection s, AmplifierKind amplifier) {
        for (String key : s.presentKeys()) {
            AmplifierKind owner = OWNED_KEYS.get(key);
            if (owner != null && owner != amplifier) {
                throw s.at(key, "applies to " + owner.specName() + " only, not " + amplifier.specName(),
                        "remove it or write amplifier: " + owner.specName());
            }
        }
    }

    /** {@code 1}, {@code 2}, {@code 3} or {@code auto} (0), limited to what the amplifier can build. */
    private static int readType(SpecSection s, AmplifierKind amplifier) {
        List<String> allowed = switch (amplifier) {
            case OPAMP -> List.of("1", "2", "3");
            case OTA -> List.of("2");
            case SHUNT_OPTO -> List.of("1", "2");
        };
        String accepted = "write " + String.join(", ", allowed) + " or auto for " + amplifier.specName();
        if (!s.has("type")) {
            return 0;
        }
        JsonNode v = s.node("type");
        if (!v.isTextual()) {
            throw s.at("type", "expected 1, 2, 3 or auto, got " + SpecSection.describe(v), accepted);
        }
        String typed = v.asText().strip().toLowerCase(Locale.ROOT);
        if (typed.equals("auto")) {
            return 0;
        }
        if (!List.of("1", "2", "3").contains(typed)) {
            throw s.at("type", "'" + v.asText().strip() + "' is not a compensator type", accepted);
        }
        if (!allowed.contains(typed)) {
            throw s.at("type", "type " + typed + " is not available for " + amplifier.specName(), accepted);
        }
        return Integer.parseInt(typed);
    }

    /**
     * Given part values by contract name, each in the unit of its role; names of another
     * amplifier's networks are refused, and a part also given as a feedback key must agree with it.
     */
    private static Map<String, Double> readParts(SpecSection s, AmplifierKind amplifier) {
        Map<String, Double> parts = new LinkedHashMap<>();
        if (!s.has("parts")) {
            return parts;
        }
        SpecSection p = s.child("parts", PartKeys.ALL);
        for (String name : p.presentKeys()) {
            if (!PartKeys.belongsTo(name, amplifier)) {
                throw p.at(name, "not a part of a " + amplifier.specName() + " network",
                        "parts of " + amplifier.specName() + ": " + String.join(", ", PartKeys.of(amplifier)));
            }
            double v = p.quantity(name, PartKeys.unit(name), PartKeys.sign(name));
            if (name.equals(PartNames.CTR)) {
                checkCtr(p, name, v);
            }
            // feedback.ctr is the spread; parts.ctr the one value a given network uses.
            if (!name.equals(PartNames.CTR) && s.has(name) && s.node(name).isTextual()) {
                double keyValue = s.quantity(name, PartKeys.unit(name), Sign.POSITIVE);
                // Relative slack: 8.06k and 8060 differ in the last bit after scaling.
                if (Math.abs(keyValue - v) > SAME_VALUE_SLACK * Math.max(Math.abs(keyValue), Math.abs(v))) {
                    throw p.at(name, "differs from feedback." + name + " (" + p.node(name).asText().strip()
                            + " against " + s.node(name).asText().strip() + ")", "give the value once");
                }
            }
            parts.put(name, v);
        }
        if (parts.containsKey(PartNames.OPTO_POLE) && parts.containsKey(PartNames.C_OPTO)) {
            throw p.at(PartNames.C_OPTO, "given together with " + PartNames.OPTO_POLE,
                    "give one: opto_pole (Hz, at r_pullup) or c_opto (F)");
        }
        return parts;
    }

    private static void checkCtr(SpecSection s, String key, double largest) {
        if (largest > MAX_CTR) {
            throw s.at(key, "a CTR of " + number(largest) + " is " + number(largest * 100)
                    + " %; a percentage needs its % sign", CTR_HINT);
        }
    }

    private static Map<String, AmplifierKind> ownedKeys() {
        Map<String, AmplifierKind> m = new LinkedHashMap<>();
        m.put("gbw", AmplifierKind.OPAMP);
        m.put("gm", AmplifierKind.OTA);
        for (String k : List.of("ctr", "r_pullup", "pullup_supply", "fb_min", "opto_pole", "c_opto", "r_led",
                "led_drop", "shunt_min_voltage", "shunt_min_current")) {
            m.put(k, AmplifierKind.SHUNT_OPTO);
        }
        return Map.copyOf(m);
    }

    private static String number(double v) {
        return NumberText.significant(v, 4);
    }
}
