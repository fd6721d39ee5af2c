package org.flyloop.envelope;

import java.util.LinkedHashMap;
import java.util.Map;
import org.flyloop.design.NetworkSynthesizer;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.NetworkKind;
import org.flyloop.network.PartNames;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.StageSpec;

/**
 * The compensator a spec describes with {@code feedback.parts}, for checking rather than
 * designing.
 *
 * <p>The network kind follows {@code feedback.amplifier} and {@code feedback.type}; an op-amp with
 * {@code type: auto} is read from its parts: c_fb means type 1, r_ff or c_ff type 3, anything else
 * type 2. Values the feedback section gives as keys fill parts that are not listed: r_upper and
 * r_lower (either one completes the other through the reference, as the designer's divider does),
 * gbw, gm, and for shunt-opto ctr (its typical value; the corners take the extremes), r_pullup,
 * r_led and the optocoupler's capacitance.
 */
public final class GivenNetwork {

    private GivenNetwork() {
    }

    /** The network kind for this feedback section and its parts. */
    public static NetworkKind kindOf(FeedbackSpec feedback) {
        return switch (feedback.amplifier()) {
            case OTA -> NetworkKind.OTA;
            case SHUNT_OPTO -> NetworkKind.SHUNT_OPTO;
            case OPAMP -> switch (feedback.autoType() ? inferredOpAmpType(feedback.parts()) : feedback.type()) {
                case 1 -> NetworkKind.OPAMP_TYPE1;
                case 3 -> NetworkKind.OPAMP_TYPE3;
                default -> NetworkKind.OPAMP_TYPE2;
            };
        };
    }

    private static int inferredOpAmpType(Map<String, Double> parts) {
        if (parts.containsKey(PartNames.C_FB)) {
            return 1;
        }
        return parts.containsKey(PartNames.R_FF) || parts.containsKey(PartNames.C_FF) ? 3 : 2;
    }

    /**
     * The network of {@code feedback.parts}, completed from the feedback keys.
     *
     * @throws IllegalArgumentException when no parts are given, a needed part is missing, a part
     *         belongs to another network type, or a value is invalid; the message names the part
     */
    public static CompensatorNetwork from(FeedbackSpec feedback, StageSpec stage) {
        if (feedback.parts().isEmpty()) {
            throw new IllegalArgumentException("no parts given: a check needs the network's part values");
        }
        NetworkKind kind = kindOf(feedback);
        Map<String, Double> parts = new LinkedHashMap<>(feedback.parts());
        completeDivider(feedback, stage, parts);
        if (feedback.amplifier() == AmplifierKind.OPAMP && !Double.isNaN(feedback.gbwHz())) {
            parts.putIfAbsent(PartNames.GBW, feedback.gbwHz());
        }
        if (feedback.amplifier() == AmplifierKind.OTA && !Double.isNaN(feedback.gmS())) {
            parts.putIfAbsent(PartNames.GM, feedback.gmS());
        }
        if (feedback.amplifier() == AmplifierKind.SHUNT_OPTO) {
            parts.putIfAbsent(PartNames.CTR, feedback.ctr().typical());
            putIfGiven(parts, PartNames.R_PULLUP, feedback.rPullup());
            putIfGiven(parts, PartNames.R_LED, feedback.rLed());
            if (!parts.containsKey(PartNames.C_OPTO) && !parts.containsKey(PartNames.OPTO_POLE)
                    && feedback.optoCapacitance() > 0) {
                parts.put(PartNames.C_OPTO, feedback.optoCapacitance());
            }
        }
        return kind.fromParts(parts);
    }

    private static void putIfGiven(Map<String, Double> parts, String name, double value) {
        if (!Double.isNaN(value)) {
            parts.putIfAbsent(name, value);
        }
    }

    /** r_upper and r_lower from the parts or the keys; one alone completes the other through the reference. */
    private static void completeDivider(FeedbackSpec feedback, StageSpec stage, Map<String, Double> parts) {
        double upper = parts.getOrDefault(PartNames.R_UPPER, feedback.rUpper());
        double lower = parts.getOrDefault(PartNames.R_LOWER, feedback.rLower());
        if (Double.isNaN(upper) && Double.isNaN(lower)) {
            return;
        }
        FeedbackSpec given = new FeedbackSpec(feedback.amplifier(), feedback.type(), feedback.placement(),
                feedback.referenceV(), lower, upper, feedback.gbwHz(), feedback.gmS(), feedback.ctr(),
                feedback.rPullup(), feedback.pullupSupplyV(), feedback.fbMinV(), feedback.optoPoleHz(),
                feedback.cOpto(), feedback.rLed(), feedback.ledDropV(), feedback.shuntMinVoltageV(),
                feedback.shuntMinCurrentA(), feedback.capTolerance(), feedback.parts());
        var divider = NetworkSynthesizer.divider(given, stage.vout());
        parts.putIfAbsent(PartNames.R_UPPER, divider.rUpper());
        parts.putIfAbsent(PartNames.R_LOWER, divider.rLower());
    }
}
