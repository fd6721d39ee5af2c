package org.flyloop.averaged;

import org.flyloop.stage.ConductionMode;

/**
 * One row of a large-signal simulation.
 *
 * @param timeS      time, s
 * @param voutV      output node voltage, V
 * @param imA        primary-referred average magnetizing current iL/N, A
 * @param capacitorV output capacitor voltage vC (without the ESR drop), V
 * @param control    control input at this time (duty, or comparator voltage in V)
 * @param duty       duty cycle d
 * @param duty2      demagnetizing fraction d2
 * @param mode       CCM or DCM
 */
public record TransientSample(double timeS, double voutV, double imA, double capacitorV, double control,
                              double duty, double duty2, ConductionMode mode) {
}
