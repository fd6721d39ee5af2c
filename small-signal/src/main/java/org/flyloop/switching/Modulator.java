package org.flyloop.switching;

/**
 * How the simulated controller decides when the switch turns off within each period. The switch
 * always turns on at the start of a period.
 */
public sealed interface Modulator permits FixedDuty, PeakCurrent {
}
