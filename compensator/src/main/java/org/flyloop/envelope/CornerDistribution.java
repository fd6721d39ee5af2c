package org.flyloop.envelope;

/**
 * The sampled figures at one corner.
 *
 * @param corner          the corner
 * @param phaseMarginDeg  phase margin, degrees (−∞ for a sample without crossover)
 * @param gainMarginDb    |gain margin|, dB: the quantity the target applies to (+∞ without phase
 *                        crossover)
 * @param crossoverHz     highest crossover, Hz (samples without crossover left out)
 * @param fractionFailing share of the samples that miss a target here (or cannot run)
 */
public record CornerDistribution(EnvelopeCorner corner, Distribution phaseMarginDeg, Distribution gainMarginDb,
                                 Distribution crossoverHz, double fractionFailing) {
}
