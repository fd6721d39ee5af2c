package org.flyloop.cli.plot;

/**
 * How an axis names its unit: an SI prefix chosen from the largest magnitude shown ("time (ms)",
 * "output (mV)"), none for dB, degrees, percent or a bare number.
 *
 * @param factor       multiply a value in SI units by this to get the number written on a tick
 * @param displayUnit  the prefixed unit, e.g. "mV"
 */
record AxisUnit(double factor, String displayUnit) {

    private static final String[] PREFIXES = {"p", "n", "µ", "m", "", "k", "M", "G"};
    private static final int UNIT_INDEX = 4;

    /** The prefix that writes numbers up to {@code largestMagnitude} in [1, 1000). */
    static AxisUnit of(String unit, double largestMagnitude, boolean prefixAllowed) {
        boolean prefixable = prefixAllowed
                && !(unit.isEmpty() || unit.equals("dB") || unit.equals("°") || unit.equals("%"));
        if (!prefixable || !(largestMagnitude > 0) || !Double.isFinite(largestMagnitude)) {
            return new AxisUnit(1, unit);
        }
        int e = (int) Math.floor(Math.log10(largestMagnitude) / 3 + 1e-9);
        e = Math.max(-UNIT_INDEX, Math.min(PREFIXES.length - 1 - UNIT_INDEX, e));
        return new AxisUnit(Math.pow(1000, -e), PREFIXES[e + UNIT_INDEX] + unit);
    }

    /** "quantity (unit)", or the quantity alone when there is no unit. */
    String title(String quantity) {
        return displayUnit.isEmpty() ? quantity : quantity + " (" + displayUnit + ")";
    }
}
