package org.flyloop.cli.plot;

import org.flyloop.linear.FrequencyResponse;

/**
 * One response for a Bode figure: magnitude and continuous phase on a frequency grid.
 *
 * @param name         legend text
 * @param frequencyHz  frequencies, Hz, ascending
 * @param magnitudeDb  20·log10|H|, dB
 * @param phaseDeg     phase, degrees (continuous, not wrapped)
 * @param emphasis     how much it stands out
 */
public record BodeTrace(String name, double[] frequencyHz, double[] magnitudeDb, double[] phaseDeg,
                        Emphasis emphasis) {

    public BodeTrace {
        if (frequencyHz.length != magnitudeDb.length || frequencyHz.length != phaseDeg.length) {
            throw new IllegalArgumentException("Bode trace '" + name + "': arrays of unequal length");
        }
        frequencyHz = frequencyHz.clone();
        magnitudeDb = magnitudeDb.clone();
        phaseDeg = phaseDeg.clone();
    }

    /** From a sampled response. */
    public static BodeTrace of(String name, FrequencyResponse response, Emphasis emphasis) {
        return new BodeTrace(name, response.frequenciesHz(), response.magnitudeDb(), response.phaseDeg(), emphasis);
    }

    @Override
    public double[] frequencyHz() {
        return frequencyHz.clone();
    }

    @Override
    public double[] magnitudeDb() {
        return magnitudeDb.clone();
    }

    @Override
    public double[] phaseDeg() {
        return phaseDeg.clone();
    }

    public int size() {
        return frequencyHz.length;
    }

    /** The same trace under another name or emphasis. */
    public BodeTrace renamed(String newName, Emphasis newEmphasis) {
        return new BodeTrace(newName, frequencyHz, magnitudeDb, phaseDeg, newEmphasis);
    }

    Trace magnitudeTrace() {
        return new Trace(name, frequencyHz, magnitudeDb, emphasis);
    }

    Trace phaseTrace() {
        return new Trace(name, frequencyHz, phaseDeg, emphasis);
    }
}
