package org.flyloop.loop;

/** Closed-loop stability from the Nyquist criterion. */
public enum StabilityVerdict {
    /** No closed-loop pole in the right half-plane. */
    STABLE,
    /** At least one closed-loop pole in the right half-plane. */
    UNSTABLE,
    /** The locus passes through or numerically indistinguishably near −1. */
    MARGINAL;

    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
