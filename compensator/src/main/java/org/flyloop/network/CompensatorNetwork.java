package org.flyloop.network;

import java.util.LinkedHashMap;
import java.util.Map;
import org.flyloop.linear.TransferFunction;

/**
 * A compensator network: named part values and the small-signal transfer function they give.
 *
 * <p>The transfer function is Gc(s) = −v_c(s)/v_out(s), with v_c the amplifier or control output
 * (for the shunt-opto network, the controller's feedback-pin voltage). The sign flip removes the
 * error amplifier's inversion once, so a loop gain is Gc times the power stage's control-to-output
 * response, and a positive Gc gain means negative feedback.
 */
public interface CompensatorNetwork {

    /** Which circuit this is. */
    NetworkKind kind();

    /**
     * The part values by name ({@link PartNames}), SI units, in a stable order; immutable. Optional
     * parts whose value means "absent" (zero or an ideal device) are left out.
     */
    Map<String, Double> parts();

    /** Gc(s) = −v_c(s)/v_out(s), small-signal, in factored form. */
    TransferFunction transferFunction();

    /**
     * The same network with some parts replaced, e.g. after rounding to a preferred series. The
     * result is validated like any network built from parts.
     *
     * @throws IllegalArgumentException for an unknown part name or an invalid value
     */
    default CompensatorNetwork withParts(Map<String, Double> replacements) {
        Map<String, Double> merged = new LinkedHashMap<>(parts());
        merged.putAll(replacements);
        return kind().fromParts(merged);
    }
}
