package org.flyloop.verify;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.NumberIsTooSmallException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.flyloop.averaged.AveragedCircuit;
import org.flyloop.averaged.AveragedFlybackCircuit;
import org.flyloop.averaged.AveragedInputs;
import org.flyloop.averaged.InputProfile;
import org.flyloop.averaged.ModeChange;
import org.flyloop.averaged.SwitchCycle;
import org.flyloop.stage.ConductionMode;

/**
 * Integrates the averaged stage and the compensator as one ODE: z = [stage states; compensator
 * states]. At every evaluation the compensator output y = C·x_c + D·(vo − Vo,eq) gives the
 * amplifier output vc = Vc,eq − y, the {@link ControlLaw} turns it into the stage's control input,
 * and the stage's averaged cycle gives vo and the stage derivatives.
 *
 * <p>With D = 0 (a strictly proper Gc, every op-amp and OTA network) this is explicit. With D ≠ 0
 * vo depends on the control input through the capacitor ESR, and the control input on vo through
 * D: vo is then the root of vo = v_out(z, law(Vc,eq − C·x_c − D·(vo − Vo,eq))), found by Brent's
 * method.
 *
 * <p>Adaptive Dormand–Prince 8(5,3) of Commons Math, restarted at every input breakpoint; the
 * stage's mode surfaces and the control law's clamp surfaces are located as events so that no step
 * straddles a kink. Samples come from the integrator's dense output.
 */
final class ClosedLoopIntegrator {

    /** Relative tolerance of the integrator (as the open-loop averaged simulator). */
    static final double RELATIVE_TOLERANCE = 1e-9;
    /** Absolute tolerance per state, relative to the state's typical magnitude. */
    static final double ABSOLUTE_TOLERANCE = 1e-9;

    private final AveragedCircuit circuit;
    private final CompensatorDynamics compensator;
    private final ControlLaw law;
    private final double turns;
    private final double eventCheckIntervalS;
    private final double[] compensatorScales;
    private final int plantStates;

    /**
     * @param circuit             the averaged stage
     * @param compensator         Gc as states
     * @param law                 compensator output to control input
     * @param turns               turns ratio N, for the primary-referred magnetizing current
     * @param eventCheckIntervalS longest interval between surface sign checks, s
     * @param compensatorScales   typical magnitude of each compensator state (tolerance scaling)
     */
    ClosedLoopIntegrator(AveragedCircuit circuit, CompensatorDynamics compensator, ControlLaw law, double turns,
                         double eventCheckIntervalS, double[] compensatorScales) {
        this.circuit = circuit;
        this.compensator = compensator;
        this.law = law;
        this.turns = turns;
        this.eventCheckIntervalS = eventCheckIntervalS;
        this.compensatorScales = compensatorScales.clone();
        this.plantStates = circuit.layout().size();
    }

    /** The closed loop evaluated at one state. */
    private record Point(AveragedInputs inputs, SwitchCycle cycle, double amplifierV) {
    }

    private final class Evaluator {
        private final ClosedLoopEquilibrium start;
        private final double[] plant = new double[plantStates];

        Evaluator(ClosedLoopEquilibrium start) {
            this.start = start;
        }

        Point at(double[] z, double vinV, double iStepA) {
            System.arraycopy(z, 0, plant, 0, plantStates);
            if (compensator.feedthrough() == 0) {
                return withOutput(z, vinV, iStepA, start.voutV());
            }
            UnivariateFunction residual = v -> withOutput(z, vinV, iStepA, v).cycle().outputVoltageV() - v;
            double v0 = start.voutV();
            double r0 = residual.value(v0);
            if (r0 == 0) {
                return withOutput(z, vinV, iStepA, v0);
            }
            // The residual falls with v (the ESR path gain is far below one), so the root lies on
            // the side the residual points to.
            double step = Math.max(1e-3 * Math.abs(v0), 1e-6) * Math.signum(r0);
            double far = v0 + step;
            for (int k = 0; k < 80 && Math.signum(residual.value(far)) == Math.signum(r0); k++) {
                step *= 2;
                far = v0 + step;
            }
            double root = new BrentSolver(1e-14, 1e-13).solve(200, residual, Math.min(v0, far), Math.max(v0, far));
            return withOutput(z, vinV, iStepA, root);
        }

        /** The loop with the compensator's feedthrough evaluated at output voltage {@code voutGuessV}. */
        private Point withOutput(double[] z, double vinV, double iStepA, double voutGuessV) {
            double y = compensator.output(z, plantStates, voutGuessV - start.voutV());
            double vc = start.amplifierV() - y;
            AveragedInputs u = new AveragedInputs(law.controlInput(vc), vinV, iStepA);
            return new Point(u, circuit.cycle(plant, u), vc);
        }
    }

    /**
     * Simulates from {@code start} (compensator states zero) with the input voltage and load-step
     * current of {@code disturbances} (its control column is ignored: the loop sets the control),
     * sampled at {@code timesS}.
     */
    ClosedLoopTransient run(String name, ClosedLoopEquilibrium start, InputProfile disturbances, double[] timesS) {
        if (timesS.length < 2 || !(timesS[0] >= 0)) {
            throw new IllegalArgumentException("need at least two sample times from t >= 0");
        }
        for (int i = 1; i < timesS.length; i++) {
            if (!(timesS[i] > timesS[i - 1])) {
                throw new IllegalArgumentException("sample times must increase");
            }
        }
        double endS = timesS[timesS.length - 1];
        int n = plantStates + compensator.stateCount();
        double[] absTol = new double[n];
        double[] relTol = new double[n];
        for (int i = 0; i < n; i++) {
            double scale = i < plantStates ? circuit.layout().get(i).typicalMagnitude()
                    : compensatorScales[i - plantStates];
            absTol[i] = ABSOLUTE_TOLERANCE * scale;
            relTol[i] = RELATIVE_TOLERANCE;
        }
        double[] z = new double[n];
        System.arraycopy(start.stage().state(), 0, z, 0, plantStates);

        Evaluator eval = new Evaluator(start);
        Recorder recorder = new Recorder(eval, timesS);
        List<ModeChange> changes = new ArrayList<>();
        int[] clampEvents = new int[1];
        if (timesS[0] == 0) {
            recorder.record(0, z, disturbances.at(0));
        }
        List<Double> ends = new ArrayList<>();
        for (double b : disturbances.breakpoints()) {
            if (b > 0 && b < endS) {
                ends.add(b);
            }
        }
        ends.add(endS);
        double t = 0;
        for (double segmentEnd : ends) {
            Window window = new Window(disturbances, segmentEnd);
            DormandPrince853Integrator integrator = new DormandPrince853Integrator(endS * 1e-14, endS / 20, absTol,
                    relTol);
            integrator.setMaxEvaluations(20_000_000);
            FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
                @Override
                public int getDimension() {
                    return n;
                }

                @Override
                public void computeDerivatives(double time, double[] state, double[] dot) {
                    AveragedInputs ext = window.at(time);
                    Point p = eval.at(state, ext.vinV(), ext.iStepA());
                    circuit.derivatives(eval.plant, p.inputs(), dot);
                    compensator.derivatives(state, plantStates, p.cycle().outputVoltageV() - start.voutV(), dot);
                }
            };
            AveragedInputs first = window.at(t);
            Point p0 = eval.at(z, first.vinV(), first.iStepA());
            int modeSurfaces = circuit.modeSurfaces(eval.plant, p0.inputs()).length;
            int clampSurfaces = law.clampSurfaces(p0.amplifierV()).length;
            double check = Math.min(eventCheckIntervalS, (segmentEnd - t) / 2);
            for (int k = 0; k < modeSurfaces + clampSurfaces; k++) {
                integrator.addEventHandler(new Surface(k, modeSurfaces, eval, window, changes, clampEvents), check,
                        1e-9 * eventCheckIntervalS, 1000);
            }
            recorder.window = window;
            integrator.addStepHandler(recorder);
            double[] out = new double[n];
            try {
                integrator.integrate(ode, t, z, segmentEnd, out);
            } catch (MathIllegalStateException | NumberIsTooSmallException e) {
                throw new IllegalStateException("closed-loop averaged simulation failed after t = " + t + " s: "
                        + e.getMessage(), e);
            }
            z = out;
            t = segmentEnd;
        }
        while (recorder.next < timesS.length) {
            recorder.record(timesS[recorder.next], z, disturbances.before(endS));
        }
        return new ClosedLoopTransient(name, start, recorder.samples, changes, clampEvents[0]);
    }

    /** The disturbance inputs as seen from inside (start, end]: at the end, the value before any step. */
    private static final class Window {
        private final InputProfile profile;
        private final double endS;

        Window(InputProfile profile, double endS) {
            this.profile = profile;
            this.endS = endS;
        }

        AveragedInputs at(double timeS) {
            return timeS < endS ? profile.at(timeS) : profile.before(endS);
        }
    }

    /** Writes a sample at each requested time inside an accepted step. */
    private final class Recorder implements StepHandler {
        private final Evaluator eval;
        private final double[] timesS;
        private final List<ClosedLoopSample> samples = new ArrayList<>();
        private int next;
        Window window;

        Recorder(Evaluator eval, double[] timesS) {
            this.eval = eval;
            this.timesS = timesS;
        }

        void record(double time, double[] z, AveragedInputs ext) {
            Point p = eval.at(z, ext.vinV(), ext.iStepA());
            SwitchCycle c = p.cycle();
            samples.add(new ClosedLoopSample(time, c.outputVoltageV(), z[AveragedFlybackCircuit.IL] / turns,
                    p.amplifierV(), p.inputs().control(), c.duty(), c.mode(), law.isClamped(p.amplifierV())));
            next++;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            // Sampling continues across segments.
        }

        @Override
        public void handleStep(StepInterpolator interpolator, boolean isLast) {
            double tEnd = interpolator.getCurrentTime();
            while (next < timesS.length && timesS[next] <= tEnd) {
                interpolator.setInterpolatedTime(timesS[next]);
                record(timesS[next], interpolator.getInterpolatedState().clone(), window.at(timesS[next]));
            }
        }
    }

    /** One event surface: the stage's mode surfaces first, then the control law's clamps. */
    private final class Surface implements EventHandler {
        private final int index;
        private final int modeSurfaces;
        private final Evaluator eval;
        private final Window window;
        private final List<ModeChange> changes;
        private final int[] clampEvents;

        Surface(int index, int modeSurfaces, Evaluator eval, Window window, List<ModeChange> changes,
                int[] clampEvents) {
            this.index = index;
            this.modeSurfaces = modeSurfaces;
            this.eval = eval;
            this.window = window;
            this.changes = changes;
            this.clampEvents = clampEvents;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            // Stateless.
        }

        @Override
        public double g(double t, double[] y) {
            AveragedInputs ext = window.at(t);
            Point p = eval.at(y, ext.vinV(), ext.iStepA());
            if (index < modeSurfaces) {
                return circuit.modeSurfaces(eval.plant, p.inputs())[index];
            }
            return law.clampSurfaces(p.amplifierV())[index - modeSurfaces];
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            if (index == 0) {
                changes.add(increasing
                        ? new ModeChange(t, ConductionMode.DCM, ConductionMode.CCM)
                        : new ModeChange(t, ConductionMode.CCM, ConductionMode.DCM));
            } else if (index >= modeSurfaces) {
                clampEvents[0]++;
            }
            return Action.RESET_DERIVATIVES;
        }

        @Override
        public void resetState(double t, double[] y) {
            // The state is continuous across every surface.
        }
    }
}
