package org.flyloop.spec;

/** How the designer places the compensator's poles and zeros. */
public enum PlacementMethod {
    /** Venable's K factor (Powercon 10, 1983). */
    K_FACTOR("k-factor"),
    /** Zeros at the stage's double or output pole, poles at the ESR zero and the RHP zero or fsw/2. */
    POLES_ZEROS("poles-zeros"),
    /** Both; keep the one with the larger worst-corner phase margin after rounding. */
    BEST("best");

    private final String specName;

    PlacementMethod(String specName) {
        this.specName = specName;
    }

    public String specName() {
        return specName;
    }

    public static PlacementMethod fromSpecName(String word) {
        for (PlacementMethod p : values()) {
            if (p.specName.equals(word)) {
                return p;
            }
        }
        return null;
    }
}
