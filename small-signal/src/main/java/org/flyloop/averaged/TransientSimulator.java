package org.flyloop.averaged;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.flyloop.stage.ConductionMode;

/**
 * Integrates an averaged flyback circuit through an {@link InputProfile} with the adaptive
 * Dormand–Prince 8(5,3) integrator of Commons Math. Integration restarts at every input breakpoint;
 * the zeros of the circuit's {@link AveragedCircuit#modeSurfaces mode surfaces} are located as
 * events so that no step straddles a kink of the vector field, and CCM/DCM crossings are recorded.
 * Samples are interpolated (the integrator's dense output) onto a uniform grid.
 */
public final class TransientSimulator {

    /** Relative tolerance of the integrator. */
    static final double RELATIVE_TOLERANCE = 1e-9;
    /** Absolute tolerance per state, relative to the state's typical magnitude. */
    static final double ABSOLUTE_TOLERANCE = 1e-9;

    private final AveragedCircuit circuit;
    private final double turns;
    private final double eventCheckIntervalS;
    private final int ilIndex;
    private final int vcIndex;

    /**
     * @param circuit             the circuit to integrate
     * @param turns               turns ratio N, to report the primary-referred magnetizing current
     * @param eventCheckIntervalS longest interval between mode-surface sign checks, s (a few switching
     *                            periods: mode changes closer together than this may be missed)
     */
    public TransientSimulator(AveragedCircuit circuit, double turns, double eventCheckIntervalS) {
        this.circuit = circuit;
        this.turns = turns;
        this.eventCheckIntervalS = eventCheckIntervalS;
        this.ilIndex = circuit.layout().indexOf(AveragedFlybackCircuit.MAGNETIZING_CURRENT);
        this.vcIndex = circuit.layout().names().contains(CapacitorOutputNetwork.STATE)
                ? circuit.layout().indexOf(CapacitorOutputNetwork.STATE) : -1;
    }

    /**
     * Simulates from {@code x0} over [0, durationS] and samples {@code intervals + 1} equally spaced
     * points including both ends.
     *
     * @throws IllegalStateException when the integrator fails (step size underflow, too many steps)
     */
    public Transient run(String name, double[] x0, InputProfile profile, double durationS, int intervals) {
        if (!(durationS > 0) || intervals < 1) {
            throw new IllegalArgumentException("need a positive duration and at least one interval");
        }
        int n = circuit.layout().size();
        double[] absTol = new double[n];
        double[] relTol = new double[n];
        for (int i = 0; i < n; i++) {
            absTol[i] = ABSOLUTE_TOLERANCE * circuit.layout().get(i).typicalMagnitude();
            relTol[i] = RELATIVE_TOLERANCE;
        }
        List<TransientSample> samples = new ArrayList<>();
        List<ModeChange> changes = new ArrayList<>();
        double[] y = x0.clone();
        double t = 0;
        List<Double> segmentEnds = new ArrayList<>();
        for (double b : profile.breakpoints()) {
            if (b > 0 && b < durationS) {
                segmentEnds.add(b);
            }
        }
        segmentEnds.add(durationS);
        Sampler sampler = new Sampler(durationS, intervals, samples);
        sampler.record(0, y, profile.at(0));
        for (double end : segmentEnds) {
            final double segmentEnd = end;
            DormandPrince853Integrator integrator = new DormandPrince853Integrator(
                    durationS * 1e-14, durationS / 20, absTol, relTol);
            integrator.setMaxEvaluations(20_000_000);
            FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
                @Override
                public int getDimension() {
                    return n;
                }

                @Override
                public void computeDerivatives(double time, double[] state, double[] dot) {
                    circuit.derivatives(state, profile.within(time, segmentEnd), dot);
                }
            };
            int surfaces = circuit.modeSurfaces(y, profile.within(t, segmentEnd)).length;
            for (int k = 0; k < surfaces; k++) {
                integrator.addEventHandler(new ModeSurface(k, profile, segmentEnd, changes),
                        Math.min(eventCheckIntervalS, (segmentEnd - t) / 2), 1e-9 * eventCheckIntervalS, 1000);
            }
            sampler.segmentEnd = segmentEnd;
            sampler.profile = profile;
            integrator.addStepHandler(sampler);
            double[] out = new double[n];
            try {
                integrator.integrate(ode, t, y, segmentEnd, out);
            } catch (MaxCountExceededException | org.apache.commons.math3.exception.NumberIsTooSmallException e) {
                throw new IllegalStateException("averaged simulation failed at t = " + t + " s: " + e.getMessage(), e);
            }
            y = out;
            t = segmentEnd;
        }
        if (samples.size() < intervals + 1) {
            sampler.record(durationS, y, profile.within(durationS, durationS));
        }
        return new Transient(name, samples, changes, y);
    }

    private TransientSample sample(double time, double[] x, AveragedInputs u) {
        SwitchCycle c = circuit.cycle(x, u);
        return new TransientSample(time, c.outputVoltageV(), x[ilIndex] / turns, vcIndex >= 0 ? x[vcIndex] : Double.NaN,
                u.control(), c.duty(), c.duty2(), c.mode());
    }

    /** Writes samples at the grid times that fall inside each accepted step. */
    private final class Sampler implements StepHandler {
        private final double durationS;
        private final int intervals;
        private final List<TransientSample> out;
        private int next = 1;
        double segmentEnd;
        InputProfile profile;

        Sampler(double durationS, int intervals, List<TransientSample> out) {
            this.durationS = durationS;
            this.intervals = intervals;
            this.out = out;
        }

        void record(double time, double[] x, AveragedInputs u) {
            out.add(sample(time, x, u));
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            // Sampling continues across segments.
        }

        @Override
        public void handleStep(StepInterpolator interpolator, boolean isLast) {
            double tEnd = interpolator.getCurrentTime();
            while (next <= intervals) {
                double tk = next == intervals ? durationS : durationS * next / intervals;
                if (tk > tEnd) {
                    break;
                }
                interpolator.setInterpolatedTime(tk);
                record(tk, interpolator.getInterpolatedState().clone(), profile.within(tk, segmentEnd));
                next++;
            }
        }
    }

    /** Event on one mode surface; records CCM/DCM crossings of surface 0. */
    private final class ModeSurface implements EventHandler {
        private final int index;
        private final InputProfile profile;
        private final double segmentEnd;
        private final List<ModeChange> changes;

        ModeSurface(int index, InputProfile profile, double segmentEnd, List<ModeChange> changes) {
            this.index = index;
            this.profile = profile;
            this.segmentEnd = segmentEnd;
            this.changes = changes;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            // Stateless.
        }

        @Override
        public double g(double t, double[] y) {
            return circuit.modeSurfaces(y, profile.within(t, segmentEnd))[index];
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            if (index == 0) {
                changes.add(increasing
                        ? new ModeChange(t, ConductionMode.DCM, ConductionMode.CCM)
                        : new ModeChange(t, ConductionMode.CCM, ConductionMode.DCM));
            }
            return Action.RESET_DERIVATIVES;
        }

        @Override
        public void resetState(double t, double[] y) {
            // Nothing to reset: the state is continuous across a mode change.
        }
    }
}
