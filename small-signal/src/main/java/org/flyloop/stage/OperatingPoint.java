package org.flyloop.stage;

/**
 * Steady-state solution of the flyback at one input voltage and load, SI units, primary-referred
 * currents unless the name says otherwise.
 *
 * @param vin            input voltage, V
 * @param iout           load current, A
 * @param vout           output voltage, V
 * @param mode           conduction mode
 * @param duty           switch duty cycle D
 * @param duty2          demagnetizing fraction D2 (in CCM: 1 − D)
 * @param duty3          idle fraction D3 = 1 − D − D2 (0 in CCM)
 * @param ipk            primary peak magnetizing current, A
 * @param ivalley        primary valley magnetizing current, A (0 in DCM)
 * @param imAvg          average primary-referred magnetizing current over a period, A
 * @param isecPk         secondary peak current, A
 * @param iswRms         RMS switch (primary) current, A
 * @param irectRms       RMS rectifier (secondary) current, A
 * @param iinAvg         average input current, A
 * @param ioutBoundary   load current at the CCM/DCM boundary at this vin, A
 * @param vswMax         switch voltage stress Vin + N·(Vout + Vf), V (no leakage spike)
 */
public record OperatingPoint(double vin, double iout, double vout, ConductionMode mode, double duty,
                             double duty2, double duty3, double ipk, double ivalley, double imAvg,
                             double isecPk, double iswRms, double irectRms, double iinAvg,
                             double ioutBoundary, double vswMax) {

    /** Load resistance Vout/Iout, Ω. */
    public double loadResistance() {
        return vout / iout;
    }

    /** True when the CCM small-signal models apply (CCM or boundary). */
    public boolean isContinuous() {
        return mode != ConductionMode.DCM;
    }
}
