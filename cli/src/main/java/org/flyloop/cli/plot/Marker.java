package org.flyloop.cli.plot;

/**
 * A marked point in a panel. Labelled markers are drawn large with their text in a box;
 * unlabelled ones small and hollow (the same event at a less important trace).
 *
 * @param x     abscissa, in the figure's x unit
 * @param y     ordinate, in the panel's unit
 * @param kind  what it stands for
 * @param label text, or empty for an unlabelled marker
 */
public record Marker(double x, double y, MarkerKind kind, String label) {

    public Marker {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("marker position must be finite: " + x + ", " + y);
        }
        label = label == null ? "" : label;
    }

    public boolean labelled() {
        return !label.isEmpty();
    }
}
