package org.flyloop.cli.spec;

import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.flyloop.cli.spec.SpecSection.Sign;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.units.Unit;

/**
 * What the spec accepts under {@code feedback.parts}: the names of the {@link PartNames} contract,
 * the unit each one is written in, whether zero is allowed, and which amplifier's networks use it.
 */
final class PartKeys {

    /**
     * Every part name of the contract, in declaration order. {@link PartNames} publishes its names
     * only as constants, so they are read reflectively: a part added there is accepted here without
     * a second list to keep in step.
     */
    static final List<String> ALL = contractNames();

    /**
     * Parts each amplifier's networks take (op-amp: the union of types 1 to 3). Mirrors the
     * {@code fromParts} readers of the network classes; a test checks it against their
     * {@code parts()} output.
     */
    private static final Map<AmplifierKind, Set<String>> BY_AMPLIFIER = Map.of(
            AmplifierKind.OPAMP, Set.of(PartNames.R_UPPER, PartNames.R_LOWER, PartNames.C_FB, PartNames.R_ZERO,
                    PartNames.C_ZERO, PartNames.C_POLE, PartNames.R_FF, PartNames.C_FF, PartNames.GBW),
            AmplifierKind.OTA, Set.of(PartNames.GM, PartNames.R_UPPER, PartNames.R_LOWER, PartNames.R_ZERO,
                    PartNames.C_ZERO, PartNames.C_POLE),
            AmplifierKind.SHUNT_OPTO, Set.of(PartNames.R_UPPER, PartNames.R_LOWER, PartNames.R_ZERO,
                    PartNames.C_ZERO, PartNames.R_LED, PartNames.R_BIAS, PartNames.CTR, PartNames.R_PULLUP,
                    PartNames.C_OPTO, PartNames.OPTO_POLE, PartNames.C_PULLUP, PartNames.R_LED_DYNAMIC));

    /**
     * Parts whose absence the networks write as zero (type 1 shunt-opto has r_zero = 0; no added
     * pin capacitor, no optocoupler pole, an ideal LED); every other part must be positive.
     */
    private static final Set<String> ZERO_ALLOWED = Set.of(PartNames.R_ZERO, PartNames.C_OPTO,
            PartNames.C_PULLUP, PartNames.R_LED_DYNAMIC);

    private PartKeys() {
    }

    /** The unit a part is written in: resistors ohms, capacitors farads, devices by what they are. */
    static Unit unit(String partName) {
        PartRole role = PartNames.role(partName);
        if (role == PartRole.RESISTOR) {
            return Unit.OHM;
        }
        if (role == PartRole.CAPACITOR) {
            return Unit.FARAD;
        }
        return switch (partName) {
            case PartNames.GBW, PartNames.OPTO_POLE -> Unit.HERTZ;
            case PartNames.GM -> Unit.SIEMENS;
            case PartNames.CTR -> Unit.DIMENSIONLESS;
            case PartNames.C_OPTO -> Unit.FARAD;
            case PartNames.R_LED_DYNAMIC -> Unit.OHM;
            default -> throw new IllegalStateException("no spec unit for device part " + partName);
        };
    }

    /** Positive, or zero-or-positive for the parts the networks take as absent at zero. */
    static Sign sign(String partName) {
        return ZERO_ALLOWED.contains(partName) ? Sign.ZERO_OR_POSITIVE : Sign.POSITIVE;
    }

    /** True when a network of this amplifier takes the part. */
    static boolean belongsTo(String partName, AmplifierKind amplifier) {
        return BY_AMPLIFIER.get(amplifier).contains(partName);
    }

    /** The parts of this amplifier's networks, in contract order. */
    static List<String> of(AmplifierKind amplifier) {
        return ALL.stream().filter(n -> belongsTo(n, amplifier)).toList();
    }

    private static List<String> contractNames() {
        List<String> names = new ArrayList<>();
        for (Field f : PartNames.class.getFields()) {
            int m = f.getModifiers();
            if (Modifier.isStatic(m) && Modifier.isFinal(m) && f.getType() == String.class) {
                try {
                    names.add((String) f.get(null));
                } catch (IllegalAccessException e) {
                    throw new IllegalStateException("cannot read PartNames." + f.getName(), e);
                }
            }
        }
        return Collections.unmodifiableList(names);
    }
}
