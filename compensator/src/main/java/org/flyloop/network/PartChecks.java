package org.flyloop.network;

/** Validation shared by the network records: one message per bad part, naming it. */
final class PartChecks {

    private PartChecks() {
    }

    /** Requires a finite value greater than zero. */
    static void positive(String name, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, got " + value);
        }
    }

    /** Requires a finite value of zero or more (for parts whose absence is written as zero). */
    static void nonNegative(String name, double value) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be zero or positive and finite, got " + value);
        }
    }

    /** Requires a positive frequency in hertz; +∞ is accepted where it means "ideal". */
    static void positiveOrInfinite(String name, double value) {
        if (!(value > 0)) {
            throw new IllegalArgumentException(name + " must be positive, got " + value);
        }
    }
}
