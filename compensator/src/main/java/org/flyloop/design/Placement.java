package org.flyloop.design;

import java.util.List;

/**
 * Where a compensator's zeros and poles go (besides its integrator), for a crossover.
 *
 * @param method      "k-factor" or "poles-zeros"
 * @param type        network type 1, 2 or 3
 * @param crossoverHz the crossover the gain is set for, Hz
 * @param boostDeg    the phase boost asked for at the crossover, degrees
 * @param zerosHz     zero frequencies, Hz, ascending
 * @param polesHz     pole frequencies, Hz, ascending
 */
public record Placement(String method, int type, double crossoverHz, double boostDeg, List<Double> zerosHz,
                        List<Double> polesHz) {

    public Placement {
        zerosHz = List.copyOf(zerosHz);
        polesHz = List.copyOf(polesHz);
    }
}
