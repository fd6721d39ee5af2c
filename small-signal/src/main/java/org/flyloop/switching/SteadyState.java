package org.flyloop.switching;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.stage.ConductionMode;

/**
 * The periodic steady state of the simulated flyback at a fixed modulator setting, with cycle
 * averages taken over the last simulated period.
 *
 * @param periodStart        state at the start of a period on the periodic orbit
 * @param voutAvgV           period-average output terminal voltage, V
 * @param ipkA               magnetizing current at switch turn-off, A (primary)
 * @param dutyApplied        switch on-time / Ts actually applied
 * @param rectifierFraction  rectifier conduction time / Ts (D2)
 * @param mode               {@link ConductionMode#DCM} when the rectifier stopped before the
 *                           period ended, {@link ConductionMode#CCM} otherwise
 * @param dutyLimited        true when peak-current control ran into its duty limit
 * @param switchRmsA         RMS switch current over the period, A
 * @param rectifierRmsA      RMS secondary rectifier current over the period, A
 * @param inputCurrentAvgA   average switch (input) current, A
 * @param rectifierAvgA      average secondary rectifier current, A
 * @param power              power balance of the period
 * @param cycleMultipliers   eigenvalues of the one-period map's Jacobian with respect to (im, vc)
 *                           at the period start; all inside the unit circle when the orbit is stable
 * @param cyclesSimulated    switching periods integrated to find and confirm the orbit
 * @param lastCycleChange    relative change of vout average and ipk between the last two cycles
 */
public record SteadyState(CircuitState periodStart, double voutAvgV, double ipkA, double dutyApplied,
                          double rectifierFraction, ConductionMode mode, boolean dutyLimited,
                          double switchRmsA, double rectifierRmsA, double inputCurrentAvgA,
                          double rectifierAvgA, PowerBalance power, List<Complex> cycleMultipliers,
                          int cyclesSimulated, double lastCycleChange) {

    public SteadyState {
        cycleMultipliers = List.copyOf(cycleMultipliers);
    }

    /** Magnetizing current at the period start (valley), A; 0 in DCM. */
    public double ivalleyA() {
        return periodStart.imA();
    }

    /** Largest |multiplier|: below 1 for a stable orbit. */
    public double largestMultiplierMagnitude() {
        return cycleMultipliers.stream().mapToDouble(Complex::abs).max().orElse(0);
    }

    /** True when small disturbances of the orbit die out from cycle to cycle. */
    public boolean isOrbitStable() {
        return largestMultiplierMagnitude() < 1;
    }
}
