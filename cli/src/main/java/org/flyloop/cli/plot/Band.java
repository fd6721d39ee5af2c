package org.flyloop.cli.plot;

/**
 * A horizontal band across a panel, e.g. a settling band.
 *
 * @param low   lower edge, panel units
 * @param high  upper edge, panel units
 * @param label text inside the band at the right, or empty
 */
public record Band(double low, double high, String label) {

    public Band {
        if (!(low <= high) || !Double.isFinite(low) || !Double.isFinite(high)) {
            throw new IllegalArgumentException("band needs finite low <= high: " + low + ", " + high);
        }
        label = label == null ? "" : label;
    }
}
