package org.flyloop.cli.plot;

/** How an axis steps and labels its ticks. */
public enum Scale {
    /** Linear, ticks at 1-2-5 steps with an SI prefix chosen for the unit (V → mV, s → ms). */
    LINEAR,
    /** Linear in decibels: ticks at 10, 20, 40 … dB. */
    DECIBEL,
    /** Linear in degrees: ticks at 15, 30, 45, 90 … degrees. */
    DEGREE,
    /** Logarithmic: a tick and a label at every decade, light ticks at 2…9. */
    LOG
}
