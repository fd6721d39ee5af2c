/**
 * The operating envelope and component tolerances: envelope corners (line × load × the CCM/DCM
 * boundary × CTR), the tolerance box, the worst case over its vertices, Monte Carlo, the robust
 * designer, and the check of a given compensator.
 *
 * <p>Speed comes from the shape of the work: every loop of an analysis is sampled on one fixed
 * {@link org.flyloop.envelope.SweepGrid}; stage responses (which depend only on the stage
 * tolerances) and compensator responses (which depend only on the parts) are sampled separately
 * and multiplied point by point; crossings found on the grid are refined on the exact transfer
 * functions. Entry points: {@link org.flyloop.envelope.EnvelopeCheck#run},
 * {@link org.flyloop.envelope.WorstCaseAnalysis#run}, {@link org.flyloop.envelope.MonteCarloAnalysis#run},
 * {@link org.flyloop.envelope.RobustDesigner#design}.
 */
package org.flyloop.envelope;
