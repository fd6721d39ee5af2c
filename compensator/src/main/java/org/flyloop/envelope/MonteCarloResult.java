package org.flyloop.envelope;

import java.util.List;

/**
 * The outcome of a Monte Carlo run: summaries, and every sampled figure for inspection.
 *
 * <p>"Worst" figures are per sample: the smallest phase margin and the smallest |gain margin| over
 * the corners of that sample, i.e. the distribution of what one built unit achieves across its
 * whole operating envelope.
 */
public final class MonteCarloResult {

    private final int samples;
    private final long seed;
    private final List<String> parameters;
    private final List<CornerDistribution> corners;
    private final Distribution worstPhaseMarginDeg;
    private final Distribution worstGainMarginDb;
    private final double fractionFailing;
    private final double[][] phaseMarginsDeg;
    private final double[][] gainMarginsDb;
    private final double[][] crossoversHz;

    MonteCarloResult(int samples, long seed, List<String> parameters, List<CornerDistribution> corners,
                     Distribution worstPhaseMarginDeg, Distribution worstGainMarginDb, double fractionFailing,
                     double[][] phaseMarginsDeg, double[][] gainMarginsDb, double[][] crossoversHz) {
        this.samples = samples;
        this.seed = seed;
        this.parameters = List.copyOf(parameters);
        this.corners = List.copyOf(corners);
        this.worstPhaseMarginDeg = worstPhaseMarginDeg;
        this.worstGainMarginDb = worstGainMarginDb;
        this.fractionFailing = fractionFailing;
        this.phaseMarginsDeg = phaseMarginsDeg;
        this.gainMarginsDb = gainMarginsDb;
        this.crossoversHz = crossoversHz;
    }

    public int samples() {
        return samples;
    }

    public long seed() {
        return seed;
    }

    /** The sampled quantities, by name. */
    public List<String> parameters() {
        return parameters;
    }

    /** Per corner, in corner order. */
    public List<CornerDistribution> corners() {
        return corners;
    }

    /** Per-sample smallest phase margin over the corners, degrees. */
    public Distribution worstPhaseMarginDeg() {
        return worstPhaseMarginDeg;
    }

    /** Per-sample smallest |gain margin| over the corners, dB. */
    public Distribution worstGainMarginDb() {
        return worstGainMarginDb;
    }

    /** Share of the samples that miss a target at some corner (or cannot run there). */
    public double fractionFailing() {
        return fractionFailing;
    }

    /** Every sample's phase margin at corner {@code c}, degrees (a copy; NaN where it could not run). */
    public double[] phaseMarginsDeg(int c) {
        return phaseMarginsDeg[c].clone();
    }

    /** Every sample's |gain margin| at corner {@code c}, dB (a copy). */
    public double[] gainMarginsDb(int c) {
        return gainMarginsDb[c].clone();
    }

    /** Every sample's highest crossover at corner {@code c}, Hz (a copy; NaN without crossover). */
    public double[] crossoversHz(int c) {
        return crossoversHz[c].clone();
    }
}
