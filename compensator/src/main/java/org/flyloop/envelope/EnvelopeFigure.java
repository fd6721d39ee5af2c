package org.flyloop.envelope;

/** The four figures a worst case is sought for, each with the direction that makes it worse. */
public enum EnvelopeFigure {
    /** The smallest phase margin (no crossover counts as −∞). */
    PHASE_MARGIN("phase margin", "°"),
    /** The gain margin of smallest magnitude. */
    GAIN_MARGIN("gain margin", "dB"),
    /** The lowest crossover (slowest loop). */
    LOWEST_CROSSOVER("lowest crossover", "Hz"),
    /** The highest crossover (nearest the RHP zero, fsw and the optocoupler pole). */
    HIGHEST_CROSSOVER("highest crossover", "Hz");

    private final String label;
    private final String unit;

    EnvelopeFigure(String label, String unit) {
        this.label = label;
        this.unit = unit;
    }

    public String label() {
        return label;
    }

    public String unit() {
        return unit;
    }

    /** The reported value: PM (−∞ without crossover), signed GM, or the crossover (NaN without). */
    public double valueOf(LoopFigures f) {
        return switch (this) {
            case PHASE_MARGIN -> f.rankedPhaseMarginDeg();
            case GAIN_MARGIN -> f.gainMarginDb();
            case LOWEST_CROSSOVER, HIGHEST_CROSSOVER -> f.crossoverHz();
        };
    }

    /**
     * How bad {@code f} is for this figure: larger is worse. A loop without a crossover has no
     * crossover figure to be worst in (−∞ for both crossover figures).
     */
    public double badness(LoopFigures f) {
        return switch (this) {
            case PHASE_MARGIN -> -f.rankedPhaseMarginDeg();
            case GAIN_MARGIN -> -f.gainMarginMagnitudeDb();
            case LOWEST_CROSSOVER -> f.hasCrossover() ? -f.crossoverHz() : Double.NEGATIVE_INFINITY;
            case HIGHEST_CROSSOVER -> f.hasCrossover() ? f.crossoverHz() : Double.NEGATIVE_INFINITY;
        };
    }
}
