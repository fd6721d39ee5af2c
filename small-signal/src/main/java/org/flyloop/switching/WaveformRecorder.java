package org.flyloop.switching;

import java.util.Arrays;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Collects samples from the integrator's dense output: on a fixed grid of {@code samplesPerPeriod}
 * points per period plus both ends of every interval, so switching edges appear as two samples at
 * the same instant (before and after).
 */
final class WaveformRecorder implements StepHandler {

    private final FlybackCircuit circuit;
    private final double sampleStepS;
    private double[] time = new double[1024];
    private double[] vout = new double[1024];
    private double[] im = new double[1024];
    private double[] isw = new double[1024];
    private double[] isec = new double[1024];
    private int size;
    private Topology topology = Topology.IDLE;
    private double periodStartS;

    WaveformRecorder(FlybackCircuit circuit, double periodS, int samplesPerPeriod) {
        if (samplesPerPeriod < 1) {
            throw new IllegalArgumentException("need at least one sample per period, got " + samplesPerPeriod);
        }
        this.circuit = circuit;
        this.sampleStepS = periodS / samplesPerPeriod;
    }

    /** Announces the topology of the next interval and the absolute time of its period's start. */
    void beginInterval(Topology next, double periodStart) {
        this.topology = next;
        this.periodStartS = periodStart;
    }

    @Override
    public void init(double t0, double[] y0, double t) {
        record(t0, y0);
    }

    @Override
    public void handleStep(StepInterpolator interpolator, boolean isLast) {
        double previous = interpolator.getPreviousTime();
        double current = interpolator.getCurrentTime();
        long k = (long) Math.floor(previous / sampleStepS) + 1;
        for (double tk = k * sampleStepS; tk < current; k++, tk = k * sampleStepS) {
            if (tk > previous) {
                interpolator.setInterpolatedTime(tk);
                record(tk, interpolator.getInterpolatedState());
            }
        }
        if (isLast) {
            interpolator.setInterpolatedTime(current);
            record(current, interpolator.getInterpolatedState());
        }
    }

    private void record(double localT, double[] y) {
        if (size == time.length) {
            int n = size * 2;
            time = Arrays.copyOf(time, n);
            vout = Arrays.copyOf(vout, n);
            im = Arrays.copyOf(im, n);
            isw = Arrays.copyOf(isw, n);
            isec = Arrays.copyOf(isec, n);
        }
        double current = topology == Topology.IDLE ? 0 : Math.max(0, y[FlybackCircuit.IM]);
        double secondary = circuit.secondaryCurrent(topology, current);
        time[size] = periodStartS + localT;
        im[size] = current;
        isw[size] = circuit.switchCurrent(topology, current);
        isec[size] = secondary;
        vout[size] = circuit.terminalVoltage(y[FlybackCircuit.VC], secondary);
        size++;
    }

    /** The samples so far, with the state the run ended in. */
    Waveform toWaveform(CircuitState finalState) {
        return new Waveform(Arrays.copyOf(time, size), Arrays.copyOf(vout, size), Arrays.copyOf(im, size),
                Arrays.copyOf(isw, size), Arrays.copyOf(isec, size), finalState);
    }
}
