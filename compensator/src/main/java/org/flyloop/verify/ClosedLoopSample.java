package org.flyloop.verify;

import org.flyloop.stage.ConductionMode;

/**
 * One row of a closed-loop averaged simulation.
 *
 * @param timeS        time, s
 * @param voutV        output node voltage, V
 * @param imA          primary-referred average magnetizing current, A
 * @param amplifierV   compensator output vc (amplifier output, or feedback-pin voltage for a
 *                     shunt-opto network), V
 * @param controlInput the averaged stage's control input: duty (voltage mode) or comparator
 *                     threshold in V (current mode), after the clamps
 * @param duty         switch duty cycle
 * @param mode         conduction mode of the averaged cycle
 * @param clamped      true when vc lies beyond a clamp of the control law (loop open)
 */
public record ClosedLoopSample(double timeS, double voutV, double imA, double amplifierV, double controlInput,
                               double duty, ConductionMode mode, boolean clamped) {
}
