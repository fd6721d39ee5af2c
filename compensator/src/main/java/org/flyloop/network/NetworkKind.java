package org.flyloop.network;

import java.util.Locale;
import java.util.Map;
import java.util.function.Function;

/** The compensator circuits flyloop can design, with the word used for each in the spec. */
public enum NetworkKind {
    /** Op-amp integrator. */
    OPAMP_TYPE1("opamp-type1", OpAmpType1Network::fromParts),
    /** Op-amp integrator with one zero and one pole. */
    OPAMP_TYPE2("opamp-type2", OpAmpType2Network::fromParts),
    /** Op-amp integrator with two zeros and two poles. */
    OPAMP_TYPE3("opamp-type3", OpAmpType3Network::fromParts),
    /** Transconductance amplifier with one zero and one pole. */
    OTA("ota", OtaType2Network::fromParts),
    /** Shunt regulator driving an optocoupler into the controller's feedback pin. */
    SHUNT_OPTO("shunt-opto", ShuntOptoNetwork::fromParts);

    private final String specName;
    private final Function<Map<String, Double>, CompensatorNetwork> builder;

    NetworkKind(String specName, Function<Map<String, Double>, CompensatorNetwork> builder) {
        this.specName = specName;
        this.builder = builder;
    }

    /** The word for this network in the spec and in JSON. */
    public String specName() {
        return specName;
    }

    /**
     * Builds this network from named parts ({@link PartNames}).
     *
     * @throws IllegalArgumentException for a missing or unknown part or an invalid value
     */
    public CompensatorNetwork fromParts(Map<String, Double> parts) {
        return builder.apply(parts);
    }

    /**
     * The kind with the given spec word, case-insensitive.
     *
     * @throws IllegalArgumentException naming the accepted words
     */
    public static NetworkKind parse(String name) {
        if (name != null) {
            String key = name.trim().toLowerCase(Locale.ROOT);
            for (NetworkKind k : values()) {
                if (k.specName.equals(key)) {
                    return k;
                }
            }
        }
        throw new IllegalArgumentException("unknown compensator network '" + name
                + "'; use one of opamp-type1, opamp-type2, opamp-type3, ota, shunt-opto");
    }
}
