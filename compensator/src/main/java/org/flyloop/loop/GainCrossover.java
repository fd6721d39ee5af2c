package org.flyloop.loop;

/**
 * A frequency where |T| = 1, with the phase margin there.
 *
 * @param frequencyHz    crossover frequency, Hz
 * @param phaseMarginDeg 180° + ∠T, wrapped into (−180°, 180°]
 * @param rising         true where |T| rises through 1 as frequency increases (unusual; it marks
 *                       a conditionally stable or resonant loop)
 */
public record GainCrossover(double frequencyHz, double phaseMarginDeg, boolean rising) {

    /** PM/ω in seconds: the extra loop delay that would use up this phase margin (0 if PM ≤ 0). */
    public double delayMarginS() {
        return phaseMarginDeg <= 0 ? 0 : Math.toRadians(phaseMarginDeg) / (2 * Math.PI * frequencyHz);
    }
}
