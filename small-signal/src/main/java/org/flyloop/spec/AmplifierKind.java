package org.flyloop.spec;

/** The error amplifier that closes the loop. */
public enum AmplifierKind {
    /** Operational amplifier with an inverting RC network (types 1, 2, 3). */
    OPAMP("opamp"),
    /** Transconductance amplifier with an RC network to ground (type 2). */
    OTA("ota"),
    /** Shunt regulator driving an optocoupler (types 1, 2). */
    SHUNT_OPTO("shunt-opto");

    private final String specName;

    AmplifierKind(String specName) {
        this.specName = specName;
    }

    /** The spec-file word. */
    public String specName() {
        return specName;
    }

    /** Parses the spec-file word; null when unknown. */
    public static AmplifierKind fromSpecName(String word) {
        for (AmplifierKind k : values()) {
            if (k.specName.equals(word)) {
                return k;
            }
        }
        return null;
    }
}
