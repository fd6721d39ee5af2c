package org.flyloop.cli.plot;

/** What a marked point stands for; the name is also its class in the SVG. */
public enum MarkerKind {
    /** |T| = 1: crossover with its phase margin. */
    GAIN_CROSSOVER("gain-crossover"),
    /** ∠T = −180°: phase crossover with its gain margin. */
    PHASE_CROSSOVER("phase-crossover"),
    /** Largest excursion of a response. */
    PEAK("peak"),
    /** Where a response enters its settling band for good. */
    SETTLING("settling"),
    /** Largest disagreement between two models. */
    DISAGREEMENT("disagreement");

    private final String cssClass;

    MarkerKind(String cssClass) {
        this.cssClass = cssClass;
    }

    /** The class name used in the SVG. */
    public String cssClass() {
        return cssClass;
    }
}
