package org.flyloop.averaged;

import org.flyloop.stage.ConductionMode;

/**
 * A located crossing of the CCM/DCM boundary during a simulation.
 *
 * @param timeS time of the crossing, s
 * @param from  mode before
 * @param to    mode after
 */
public record ModeChange(double timeS, ConductionMode from, ConductionMode to) {
}
