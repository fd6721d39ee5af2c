package org.flyloop.spec;

/**
 * A relative tolerance band: the actual value lies in [nominal·(1 + low), nominal·(1 + high)].
 *
 * @param low  lower relative deviation, e.g. −0.2 (≥ −1 exclusive)
 * @param high upper relative deviation, e.g. +0.2
 */
public record Tolerance(double low, double high) {

    public static final Tolerance NONE = new Tolerance(0, 0);

    public Tolerance {
        if (!(low > -1 && low <= 0 && high >= 0 && Double.isFinite(high))) {
            throw new IllegalArgumentException("a tolerance needs −100 % < low ≤ 0 ≤ high, got [" + low + ", " + high + "]");
        }
    }

    /** A symmetric band ±fraction. */
    public static Tolerance symmetric(double fraction) {
        return new Tolerance(-fraction, fraction);
    }

    public boolean isNone() {
        return low == 0 && high == 0;
    }

    /** nominal·(1 + low). */
    public double lowest(double nominal) {
        return nominal * (1 + low);
    }

    /** nominal·(1 + high). */
    public double highest(double nominal) {
        return nominal * (1 + high);
    }

    /** nominal·(1 + low + u·(high − low)) for u in [0, 1]. */
    public double at(double nominal, double u) {
        return nominal * (1 + low + u * (high - low));
    }
}
