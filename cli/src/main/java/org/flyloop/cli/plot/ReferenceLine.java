package org.flyloop.cli.plot;

/**
 * A straight line at a fixed value: vertical when given to a {@link Figure} (it crosses every
 * panel), horizontal when given to a {@link Panel}.
 *
 * @param value position in axis units
 * @param label text beside the line, or empty
 * @param kind  how it is drawn
 */
public record ReferenceLine(double value, String label, Kind kind) {

    /** How a reference line is drawn; the lower-case name is its SVG class. */
    public enum Kind {
        /** A design limit (RHP-zero bound, fsw/2): dark red dash-dot, labelled. */
        LIMIT,
        /** A guide such as 0 dB or −180°: thin grey, solid. */
        GUIDE,
        /** A dotted drop line tying a marked point to the other panels. */
        CURSOR
    }

    public ReferenceLine {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("reference line value must be finite");
        }
        label = label == null ? "" : label;
    }

    public static ReferenceLine limit(double value, String label) {
        return new ReferenceLine(value, label, Kind.LIMIT);
    }

    public static ReferenceLine guide(double value) {
        return new ReferenceLine(value, "", Kind.GUIDE);
    }

    /** A guide with a small label at its left end. */
    public static ReferenceLine guide(double value, String label) {
        return new ReferenceLine(value, label, Kind.GUIDE);
    }

    public static ReferenceLine cursor(double value) {
        return new ReferenceLine(value, "", Kind.CURSOR);
    }

    String cssClass() {
        return "reference " + kind.name().toLowerCase(java.util.Locale.ROOT);
    }
}
