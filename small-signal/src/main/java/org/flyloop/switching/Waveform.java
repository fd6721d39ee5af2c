package org.flyloop.switching;

import java.util.Arrays;

/**
 * Sampled time series of a simulation run, for plots and numerical checks. Samples lie on a fixed
 * grid plus both sides of every switching edge (two samples share the edge's time).
 */
public final class Waveform {

    private final double[] timeS;
    private final double[] voutV;
    private final double[] imA;
    private final double[] switchCurrentA;
    private final double[] rectifierCurrentA;
    private final CircuitState finalState;

    Waveform(double[] timeS, double[] voutV, double[] imA, double[] switchCurrentA,
             double[] rectifierCurrentA, CircuitState finalState) {
        this.timeS = timeS;
        this.voutV = voutV;
        this.imA = imA;
        this.switchCurrentA = switchCurrentA;
        this.rectifierCurrentA = rectifierCurrentA;
        this.finalState = finalState;
    }

    /** Number of samples. */
    public int size() {
        return timeS.length;
    }

    /** Sample times, s, non-decreasing. */
    public double[] timeS() {
        return timeS.clone();
    }

    /** Output terminal voltage (capacitor plus ESR drop), V. */
    public double[] voutV() {
        return voutV.clone();
    }

    /** Primary-referred magnetizing current, A. */
    public double[] imA() {
        return imA.clone();
    }

    /** Primary switch current, A. */
    public double[] switchCurrentA() {
        return switchCurrentA.clone();
    }

    /** Secondary rectifier current, A. */
    public double[] rectifierCurrentA() {
        return rectifierCurrentA.clone();
    }

    /** State at the end of the run, to continue from. */
    public CircuitState finalState() {
        return finalState;
    }

    @Override
    public String toString() {
        return "Waveform[" + size() + " samples, t=" + (size() == 0 ? "-" : timeS[0] + ".." + timeS[size() - 1])
                + " s, end " + finalState + "]";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Waveform w && Arrays.equals(timeS, w.timeS) && Arrays.equals(voutV, w.voutV)
                && Arrays.equals(imA, w.imA) && finalState.equals(w.finalState);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(timeS) + finalState.hashCode();
    }
}
