package org.flyloop.switching;

/**
 * What one simulated switching period produced.
 *
 * @param start         state at the start of the period
 * @param end           state at the end of the period
 * @param onTimeS       time the switch conducted, s
 * @param rectifyingS   time the rectifier conducted, s
 * @param peakCurrentA  magnetizing current at switch turn-off, A
 * @param dutyLimited   true when peak-current control hit its duty limit before the comparator
 * @param integrals     the running integrals of {@link FlybackCircuit}, indexed by its constants
 */
record CycleResult(CircuitState start, CircuitState end, double onTimeS, double rectifyingS,
                   double peakCurrentA, boolean dutyLimited, double[] integrals) {

    double integral(int index) {
        return integrals[index];
    }
}
