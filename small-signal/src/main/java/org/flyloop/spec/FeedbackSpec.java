package org.flyloop.spec;

import java.util.Map;
import java.util.TreeMap;

/**
 * The feedback section of the spec, SI units. Values not given are NaN (numbers) or the stated
 * default.
 *
 * @param amplifier        error amplifier kind
 * @param type             compensator type 1, 2 or 3; 0 for automatic choice
 * @param placement        pole-zero placement method
 * @param referenceV       reference voltage of the amplifier or shunt regulator, V
 * @param rLower           divider lower resistor, Ω (NaN: designer chooses)
 * @param rUpper           divider upper resistor, Ω (NaN: from r_lower and the reference)
 * @param gbwHz            op-amp gain-bandwidth, Hz (NaN: ideal op-amp)
 * @param gmS              transconductance, S (ota)
 * @param ctr              optocoupler current-transfer-ratio range (shunt-opto), as a fraction
 * @param rPullup          feedback-pin pull-up resistor, Ω (shunt-opto)
 * @param pullupSupplyV    supply the pull-up returns to, V (shunt-opto)
 * @param fbMinV           feedback-pin voltage that commands minimum duty or current, V
 * @param optoPoleHz       optocoupler pole at the given pull-up, Hz (NaN when cOpto is given)
 * @param cOpto            optocoupler equivalent capacitance at the feedback pin, F (NaN when
 *                         optoPoleHz is given)
 * @param rLed             LED series resistor, Ω (NaN: designer chooses)
 * @param ledDropV         LED forward drop, V
 * @param shuntMinVoltageV shunt regulator minimum cathode voltage, V
 * @param shuntMinCurrentA shunt regulator minimum cathode current, A
 * @param capTolerance     capacitor tolerance as a fraction (e.g. 0.1)
 * @param parts            given part values by contract name (for checks), SI units
 */
public record FeedbackSpec(AmplifierKind amplifier, int type, PlacementMethod placement,
                           double referenceV, double rLower, double rUpper, double gbwHz, double gmS,
                           ValueRange ctr, double rPullup, double pullupSupplyV, double fbMinV,
                           double optoPoleHz, double cOpto, double rLed, double ledDropV,
                           double shuntMinVoltageV, double shuntMinCurrentA, double capTolerance,
                           Map<String, Double> parts) {

    public FeedbackSpec {
        if (amplifier == null) {
            throw new IllegalArgumentException("feedback.amplifier is required");
        }
        if (type < 0 || type > 3) {
            throw new IllegalArgumentException("feedback.type must be 1, 2, 3 or auto");
        }
        if (amplifier == AmplifierKind.OTA && type == 3) {
            throw new IllegalArgumentException("feedback.type 3 is not available for ota; use 2 or auto");
        }
        if (amplifier == AmplifierKind.SHUNT_OPTO && type == 3) {
            throw new IllegalArgumentException("feedback.type 3 is not available for shunt-opto; use 1, 2 or auto");
        }
        parts = java.util.Collections.unmodifiableMap(new TreeMap<>(parts));
    }

    /** True when the designer picks the type. */
    public boolean autoType() {
        return type == 0;
    }

    /** The optocoupler equivalent capacitance at the feedback pin, F. */
    public double optoCapacitance() {
        if (!Double.isNaN(cOpto)) {
            return cOpto;
        }
        if (Double.isNaN(optoPoleHz) || Double.isNaN(rPullup)) {
            return 0;
        }
        return 1 / (2 * Math.PI * optoPoleHz * rPullup);
    }

    /** A copy with other given parts. */
    public FeedbackSpec withParts(Map<String, Double> newParts) {
        return new FeedbackSpec(amplifier, type, placement, referenceV, rLower, rUpper, gbwHz, gmS, ctr,
                rPullup, pullupSupplyV, fbMinV, optoPoleHz, cOpto, rLed, ledDropV, shuntMinVoltageV,
                shuntMinCurrentA, capTolerance, newParts);
    }

    /** A copy with another CTR range. */
    public FeedbackSpec withCtr(ValueRange newCtr) {
        return new FeedbackSpec(amplifier, type, placement, referenceV, rLower, rUpper, gbwHz, gmS, newCtr,
                rPullup, pullupSupplyV, fbMinV, optoPoleHz, cOpto, rLed, ledDropV, shuntMinVoltageV,
                shuntMinCurrentA, capTolerance, parts);
    }
}
