package org.flyloop.loop;

/**
 * A frequency where the loop phase passes −180° (mod 360°), with the gain margin there.
 *
 * @param frequencyHz  phase-crossover frequency, Hz
 * @param gainMarginDb −20·log10|T|: positive where the gain may rise by that much before the locus
 *                     passes −1, negative where it may fall by |GM| (conditional stability, or an
 *                     unstable loop)
 */
public record PhaseCrossover(double frequencyHz, double gainMarginDb) {
}
