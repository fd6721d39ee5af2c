package org.flyloop.switching;

import java.util.Arrays;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * Integrates one switching period, interval by interval: switch on, rectifier conducting, idle.
 *
 * <p>Time is local to the period (0 … Ts), which keeps event times accurate to the solver's
 * absolute convergence (Ts·1e-10, i.e. 1e-15 s at 100 kHz) however long a run lasts.
 */
final class CycleRunner {

    private static final double RELATIVE_TOLERANCE = 1e-12;
    private static final double ABSOLUTE_SCALE = 1e-13;
    private static final double EVENT_CONVERGENCE_PER_PERIOD = 1e-10;
    private static final int EVENT_MAX_ITERATIONS = 200;
    /** Intervals shorter than this fraction of the period are skipped. */
    private static final double NEGLIGIBLE_INTERVAL = 1e-11;

    private final FlybackCircuit circuit;
    private final double periodS;
    private final double[] absoluteTolerance;
    private final double[] relativeTolerance;

    /**
     * @param circuit  the circuit equations
     * @param periodS  switching period, s
     * @param currentScaleA typical magnetizing current, sets the absolute tolerance on im
     * @param voltageScaleV typical output voltage, sets the absolute tolerance on vc
     */
    CycleRunner(FlybackCircuit circuit, double periodS, double currentScaleA, double voltageScaleV) {
        this.circuit = circuit;
        this.periodS = periodS;
        double i = currentScaleA * ABSOLUTE_SCALE;
        double v = voltageScaleV * ABSOLUTE_SCALE;
        double t = periodS;
        absoluteTolerance = new double[FlybackCircuit.DIMENSION];
        absoluteTolerance[FlybackCircuit.IM] = i;
        absoluteTolerance[FlybackCircuit.VC] = v;
        absoluteTolerance[FlybackCircuit.INT_VOUT] = v * t;
        absoluteTolerance[FlybackCircuit.INT_ISW] = i * t;
        absoluteTolerance[FlybackCircuit.INT_ISW_SQ] = i * i * t;
        absoluteTolerance[FlybackCircuit.INT_ISEC] = i * circuit.turns() * t;
        absoluteTolerance[FlybackCircuit.INT_ISEC_SQ] = i * i * circuit.turns() * circuit.turns() * t;
        absoluteTolerance[FlybackCircuit.INT_LOAD_ENERGY] = v * i * t;
        absoluteTolerance[FlybackCircuit.INT_IC_SQ] = i * i * circuit.turns() * circuit.turns() * t;
        relativeTolerance = new double[FlybackCircuit.DIMENSION];
        Arrays.fill(relativeTolerance, RELATIVE_TOLERANCE);
    }

    FlybackCircuit circuit() {
        return circuit;
    }

    double periodS() {
        return periodS;
    }

    /** Runs one period from {@code start}; no samples are kept. */
    CycleResult run(CircuitState start, Modulator modulator) {
        return run(start, modulator, null, 0);
    }

    /**
     * Runs one period from {@code start}.
     *
     * @param recorder     receives samples, or null
     * @param periodStartS absolute time of the period start, for the recorder
     */
    CycleResult run(CircuitState start, Modulator modulator, WaveformRecorder recorder, double periodStartS) {
        double[] y = new double[FlybackCircuit.DIMENSION];
        y[FlybackCircuit.IM] = Math.max(0, start.imA());
        y[FlybackCircuit.VC] = start.vcV();

        double turnOff;
        boolean limited = false;
        if (modulator instanceof FixedDuty fixed) {
            turnOff = fixed.duty() * periodS;
            if (turnOff > 0) {
                integrate(Topology.SWITCH_ON, 0, turnOff, y, null, recorder, periodStartS);
            }
        } else if (modulator instanceof PeakCurrent peak) {
            Comparator comparator = new Comparator(peak);
            double latest = peak.dutyMax() * periodS;
            if (comparator.g(0, y) <= 0) {
                turnOff = 0;
            } else {
                turnOff = integrate(Topology.SWITCH_ON, 0, latest, y, comparator, recorder, periodStartS);
                limited = !comparator.tripped;
            }
        } else {
            throw new IllegalArgumentException("unknown modulator " + modulator);
        }
        double peakCurrent = y[FlybackCircuit.IM];

        double rectifierOff = turnOff;
        if (y[FlybackCircuit.IM] > 0 && turnOff < periodS) {
            ZeroCurrent zero = new ZeroCurrent();
            rectifierOff = integrate(Topology.RECTIFYING, turnOff, periodS, y, zero, recorder, periodStartS);
            if (zero.reached) {
                y[FlybackCircuit.IM] = 0;
            }
        } else {
            y[FlybackCircuit.IM] = Math.max(0, y[FlybackCircuit.IM]);
        }
        if (rectifierOff < periodS) {
            y[FlybackCircuit.IM] = 0;
            integrate(Topology.IDLE, rectifierOff, periodS, y, null, recorder, periodStartS);
        }
        CircuitState end = new CircuitState(y[FlybackCircuit.IM], y[FlybackCircuit.VC]);
        return new CycleResult(start, end, turnOff, rectifierOff - turnOff, peakCurrent, limited, y.clone());
    }

    /** Integrates one topology from t0 to t1 (or to the stop event), updating y; returns the end time. */
    private double integrate(Topology topology, double t0, double t1, double[] y, EventHandler stop,
                             WaveformRecorder recorder, double periodStartS) {
        double span = t1 - t0;
        if (span <= periodS * NEGLIGIBLE_INTERVAL) {
            // Commons Math refuses spans near round-off; the state cannot move in 1e-16 s anyway.
            return t1;
        }
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(
                span * 1e-12, span, absoluteTolerance, relativeTolerance);
        if (stop != null) {
            integrator.addEventHandler(stop, span / 4, periodS * EVENT_CONVERGENCE_PER_PERIOD,
                    EVENT_MAX_ITERATIONS);
        }
        if (recorder != null) {
            recorder.beginInterval(topology, periodStartS);
            integrator.addStepHandler(recorder);
        }
        FirstOrderDifferentialEquations equations = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return FlybackCircuit.DIMENSION;
            }

            @Override
            public void computeDerivatives(double t, double[] state, double[] stateDot) {
                circuit.derivatives(topology, state, stateDot);
            }
        };
        return integrator.integrate(equations, t0, y, t1, y);
    }

    /** The current-mode comparator: g = vc − (sense·im + slope·t) falls through zero at turn-off. */
    private static final class Comparator implements EventHandler {
        private final PeakCurrent peak;
        private boolean tripped;

        Comparator(PeakCurrent peak) {
            this.peak = peak;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            tripped = false;
        }

        @Override
        public double g(double t, double[] y) {
            return peak.controlVoltage() - (peak.senseVPerA() * y[FlybackCircuit.IM] + peak.slopeVPerS() * t);
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            tripped = true;
            return Action.STOP;
        }

        @Override
        public void resetState(double t, double[] y) {
            // STOP never asks for a reset.
        }
    }

    /** The rectifier turn-off: the magnetizing (hence secondary) current falls to zero. */
    private static final class ZeroCurrent implements EventHandler {
        private boolean reached;

        @Override
        public void init(double t0, double[] y0, double t) {
            reached = false;
        }

        @Override
        public double g(double t, double[] y) {
            return y[FlybackCircuit.IM];
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            reached = true;
            return Action.STOP;
        }

        @Override
        public void resetState(double t, double[] y) {
            // STOP never asks for a reset.
        }
    }
}
