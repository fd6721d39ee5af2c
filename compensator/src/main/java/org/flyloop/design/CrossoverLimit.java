package org.flyloop.design;

/**
 * One upper bound on the crossover frequency, with where it comes from.
 *
 * @param name        what limits the crossover, e.g. "RHP zero"
 * @param frequencyHz the bound, Hz
 * @param basis       how it is computed and its standing, e.g. "f_RHPZ/4 at the lowest CCM RHP
 *                    zero (common practice, no source)"
 */
public record CrossoverLimit(String name, double frequencyHz, String basis) {
}
