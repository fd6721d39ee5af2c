package org.flyloop.averaged;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.InfeasibleOperatingPointException;

/**
 * The nonlinear averaged flyback, switching between CCM and DCM by itself: equilibria,
 * numerical linearization and large-signal simulation. See {@link AveragedSwitchNetwork} for the
 * equations and the secondary referral, and {@link PeakCurrentDutySolver} for peak current mode.
 *
 * <p>The control input is the duty cycle in voltage mode (the PWM ramp's 1/V_ramp gain and any
 * feedback-pin gain belong to the loop outside this model) and the comparator voltage vc in peak
 * current mode. The load is a resistor, by default R = Vout/Iout of the spec's output voltage,
 * with the load-step current source in parallel. Immutable.
 */
public final class AveragedFlybackModel {

    /** Samples per simulation unless asked otherwise. */
    public static final int DEFAULT_INTERVALS = 1000;

    private final StageSpec stage;
    private final ControlSpec control;
    private final AveragedSwitchNetwork network;
    private final double[] inputScales;

    /**
     * Relative compensation slope used when the spec gives none in peak current mode: the averaged
     * relation of Erickson &amp; Maksimović (§12.3) has an unbounded duty gain at exactly zero slope
     * (its duty equation touches zero instead of crossing it), so zero is taken as this fraction of
     * the sensed on-slope at the highest input. It places the model's current-loop pole near
     * (Sn + Sf)/(0.05·Sn·Ts), several times the switching frequency and far above the fsw/10 up
     * to which an averaged model is read, while keeping the equations integrable with an explicit
     * method; the DC gain then belongs to a controller with 5 % slope (mc = 1.05).
     */
    public static final double ZERO_SLOPE_FLOOR = 0.05;

    public AveragedFlybackModel(StageSpec stage, ControlSpec control) {
        this.stage = stage;
        control = effectiveControl(stage, control);
        this.control = control;
        this.network = new AveragedSwitchNetwork(stage, control);
        this.inputScales = Jacobians.inputScales(0.1, stage.vin().typical(), stage.iout().max());
    }

    /** The control as the averaged model uses it: a zero slope in current mode becomes the floor. */
    public static ControlSpec effectiveControl(StageSpec stage, ControlSpec control) {
        if (control.scheme() != ControlScheme.CURRENT || control.slopeVPerS() > 0) {
            return control;
        }
        double sensedOnSlope = control.senseVPerA() * stage.vin().max() / stage.lm();
        return new ControlSpec(control.scheme(), control.rampV(), control.senseVPerA(),
                ZERO_SLOPE_FLOOR * sensedOnSlope, control.dutyMax(), control.fbGain());
    }

    public StageSpec stage() {
        return stage;
    }

    public ControlSpec control() {
        return control;
    }

    /** The averaged circuit with load resistor {@code loadResistanceOhm}. */
    public AveragedFlybackCircuit circuit(double loadResistanceOhm) {
        return new AveragedFlybackCircuit(network,
                new CapacitorOutputNetwork(stage.cout(), stage.esr(), loadResistanceOhm, stage.vout()),
                2 * stage.iout().max());
    }

    /** R = Vout/Iout at the spec's output voltage, Ω. */
    public double loadResistanceFor(double ioutA) {
        return stage.vout() / ioutA;
    }

    /** Equilibrium at input voltage {@code vinV}, load R = Vout/{@code ioutA} and a fixed control input. */
    public Equilibrium equilibrium(double vinV, double ioutA, double controlInput) {
        return equilibrium(new AveragedInputs(controlInput, vinV, 0), loadResistanceFor(ioutA));
    }

    /** Equilibrium at the given inputs and load resistor. */
    public Equilibrium equilibrium(AveragedInputs u, double loadResistanceOhm) {
        return equilibrium(u, loadResistanceOhm, null);
    }

    private Equilibrium equilibrium(AveragedInputs u, double loadResistanceOhm, double[] guess) {
        AveragedFlybackCircuit circuit = circuit(loadResistanceOhm);
        double[] x = solver(circuit, loadResistanceOhm).solve(u, guess);
        return new Equilibrium(u, loadResistanceOhm, x, circuit.cycle(x, u), stage.turns());
    }

    private EquilibriumSolver solver(AveragedCircuit circuit, double loadResistanceOhm) {
        double settle = 20 * Math.min(loadResistanceOhm, 1e6) * stage.cout() + 500 * stage.periodS();
        return new EquilibriumSolver(circuit, settle, eventCheckIntervalS());
    }

    private double eventCheckIntervalS() {
        return 5 * stage.periodS();
    }

    /**
     * The equilibrium whose output equals the spec's Vout at input {@code vinV} and load
     * {@code ioutA} (R = Vout/Iout): the control input is found by Brent's method on the averaged
     * equilibrium's output voltage, which rises monotonically with duty and with vc.
     *
     * @throws InfeasibleOperatingPointException when Vout is out of reach within duty_max
     */
    public Equilibrium regulatedEquilibrium(double vinV, double ioutA) {
        return regulatedEquilibrium(vinV, loadResistanceFor(ioutA), 0);
    }

    /** As {@link #regulatedEquilibrium(double, double)} with an explicit resistor and step current. */
    public Equilibrium regulatedEquilibrium(double vinV, double loadResistanceOhm, double iStepA) {
        double target = stage.vout();
        Equilibrium[] last = new Equilibrium[1];
        UnivariateFunction error = c -> {
            double[] guess = last[0] == null ? null : last[0].state();
            Equilibrium e = equilibrium(new AveragedInputs(c, vinV, iStepA), loadResistanceOhm, guess);
            last[0] = e;
            return e.voutV() - target;
        };
        double lo;
        double hi;
        if (control.scheme() == ControlScheme.VOLTAGE) {
            lo = 1e-4 * control.dutyMax();
            hi = control.dutyMax();
            if (error.value(hi) < 0) {
                throw new InfeasibleOperatingPointException(String.format(
                        "Vout %.4g V is out of reach at Vin %.4g V even at the duty limit %.3g", target, vinV, hi));
            }
        } else {
            lo = 0;
            hi = 0.05;
            while (error.value(hi) < 0) {
                if (last[0].duty() >= control.dutyMax()) {
                    throw new InfeasibleOperatingPointException(String.format(
                            "Vout %.4g V is out of reach at Vin %.4g V even at the duty limit %.3g", target, vinV,
                            control.dutyMax()));
                }
                lo = hi;
                hi *= 2;
            }
        }
        last[0] = null;
        double c = new BrentSolver(1e-14, 1e-15).solve(500, error, lo, hi);
        return equilibrium(new AveragedInputs(c, vinV, iStepA), loadResistanceOhm, last[0] == null ? null
                : last[0].state());
    }

    /** Central-difference linearization at {@code op} (inputs: control, vin, istep; outputs: vout, il). */
    public LinearizedModel linearize(Equilibrium op) {
        return new NumericalLinearizer(Jacobians.DEFAULT_RELATIVE_STEP, inputScales)
                .linearize(circuit(op.loadResistanceOhm()), op);
    }

    /** Linearization at the regulated equilibrium for {@code vinV}, {@code ioutA}. */
    public LinearizedModel linearize(double vinV, double ioutA) {
        return linearize(regulatedEquilibrium(vinV, ioutA));
    }

    /** Simulates {@code scenario} over [0, durationS] with {@link #DEFAULT_INTERVALS} samples. */
    public Transient simulate(Scenario scenario, double durationS) {
        return simulate(scenario, durationS, DEFAULT_INTERVALS);
    }

    /** Simulates {@code scenario} over [0, durationS] sampled at {@code intervals + 1} points. */
    public Transient simulate(Scenario scenario, double durationS, int intervals) {
        AveragedFlybackCircuit circuit = circuit(scenario.loadResistanceOhm());
        double[] x0 = scenario.fromSteadyState()
                ? equilibrium(scenario.inputs().before(0), scenario.loadResistanceOhm()).state()
                : new double[circuit.layout().size()];
        return new TransientSimulator(circuit, stage.turns(), eventCheckIntervalS())
                .run(scenario.name(), x0, scenario.inputs(), durationS, intervals);
    }

    /** Start-up from zero with the control input fixed, load R = Vout/{@code ioutA}. */
    public Scenario startUp(double vinV, double ioutA, double controlInput) {
        return Scenario.startUp(new AveragedInputs(controlInput, vinV, 0), loadResistanceFor(ioutA));
    }

    /** From {@code from}, the control input steps to {@code newControl} at {@code atS}. */
    public Scenario controlStep(Equilibrium from, double newControl, double atS) {
        return Scenario.controlStep(from.inputs(), from.loadResistanceOhm(), newControl, atS);
    }

    /**
     * Load step from {@code ioutFromA} to {@code ioutToA} at {@code atS}, open loop with the control
     * input that regulates at the first load. The smaller load is the resistor R = Vout/min; the
     * difference is the step source, so the source only ever draws current.
     */
    public Scenario loadStep(double vinV, double ioutFromA, double ioutToA, double atS) {
        double base = Math.min(ioutFromA, ioutToA);
        double r = loadResistanceFor(base);
        Equilibrium from = regulatedEquilibrium(vinV, r, ioutFromA - base);
        return Scenario.loadStep(from.inputs(), r, ioutToA - base, atS);
    }

    /** Line step from {@code vinFromV} to {@code vinToV} at {@code atS}, control held at its regulating value. */
    public Scenario lineStep(double vinFromV, double vinToV, double ioutA, double atS) {
        Equilibrium from = regulatedEquilibrium(vinFromV, ioutA);
        return Scenario.lineStep(from.inputs(), from.loadResistanceOhm(), vinToV, atS);
    }
}
