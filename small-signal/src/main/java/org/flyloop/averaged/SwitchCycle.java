package org.flyloop.averaged;

import org.flyloop.stage.ConductionMode;

/**
 * The averaged switching cycle at one instant: what the averaged switch network computes from the
 * magnetizing current, the inputs and the output voltage. Currents and voltages are referred to the
 * secondary unless the name says primary.
 *
 * @param duty              switch duty cycle d
 * @param duty2             demagnetizing (rectifier conduction) fraction d2, within [0, 1 − d]
 * @param mode              CCM when d2 sits at its upper limit 1 − d, otherwise DCM
 * @param ccmMarginA        2·iL − i_pk,DCM, A: positive in CCM, negative in DCM, zero on the
 *                          boundary (continuous; the simulator's mode-change event function)
 * @param onVoltageV        secondary-referred winding voltage during the on-interval, Vg′ − Rds′·i_on
 * @param onCurrentA        on-interval average of the secondary-referred magnetizing current
 * @param peakCurrentA      secondary-referred peak magnetizing current of the averaged waveform
 * @param rectifierCurrentA period-average rectifier current
 * @param inductorVoltageV  period-average secondary-referred magnetizing voltage Ls·diL/dt
 * @param outputVoltageV    output node voltage (after the capacitor ESR)
 * @param inputCurrentA     period-average primary input current
 */
public record SwitchCycle(double duty, double duty2, ConductionMode mode, double ccmMarginA,
                          double onVoltageV, double onCurrentA, double peakCurrentA,
                          double rectifierCurrentA, double inductorVoltageV, double outputVoltageV,
                          double inputCurrentA) {
}
