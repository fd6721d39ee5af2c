package org.flyloop.verify;

import org.flyloop.averaged.Equilibrium;

/**
 * A DC point of the closed loop: the averaged stage regulated to the spec's output voltage and the
 * compensator output that holds it there (the compensator's own states are zero in the deviation
 * coordinates of {@link CompensatorDynamics}).
 *
 * @param stage      the averaged stage's equilibrium
 * @param amplifierV the compensator output Vc,eq, V
 */
public record ClosedLoopEquilibrium(Equilibrium stage, double amplifierV) {

    /** Output voltage, V. */
    public double voutV() {
        return stage.voutV();
    }

    /** Control input of the averaged stage (duty, or comparator threshold in V). */
    public double controlInput() {
        return stage.inputs().control();
    }
}
