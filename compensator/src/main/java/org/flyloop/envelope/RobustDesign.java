package org.flyloop.envelope;

import org.flyloop.design.DesignResult;

/**
 * What the robust designer produced, beside what it started from.
 *
 * @param design      the chosen design, in the designer's shape (its corners are the envelope
 *                    corners); the starting design when no placement beat it
 * @param start       the designer's own design, the starting point
 * @param startWorst  the worst case of the starting design's built (rounded) network
 * @param worst       the worst case of the chosen design's built network
 * @param evaluations loop evaluations spent by the optimiser
 * @param improved    true when the chosen design differs from the start
 */
public record RobustDesign(DesignResult design, DesignResult start, WorstCase startWorst, WorstCase worst,
                           long evaluations, boolean improved) {
}
