package org.flyloop.verify;

import java.util.Map;
import org.flyloop.averaged.AveragedFlybackModel;
import org.flyloop.averaged.AveragedInputs;
import org.flyloop.averaged.Equilibrium;
import org.flyloop.averaged.InputProfile;
import org.flyloop.design.Corner;
import org.flyloop.design.DesignResult;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.PartNames;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.OperatingPoint;

/**
 * Large-signal check of a designed loop: the nonlinear averaged flyback
 * ({@link AveragedFlybackModel}, CCM and DCM in one model) with the compensator's dynamics as extra
 * ODE states closing the loop.
 *
 * <p>The compensator network's Gc(s) = −v̂c/v̂o is realised in state space and driven by
 * vo − Vo,eq; its output y gives the amplifier output vc = Vc,eq − y, and the {@link ControlLaw}
 * turns vc into the stage's duty (voltage mode) or comparator threshold (current mode) with the
 * controller's clamps. The op-amp, OTA and shunt-opto networks are linear circuits, so this is
 * exact for them as long as their own parts stay linear: amplifier rails, OTA current limits,
 * shunt-regulator dropout and the optocoupler's saturation are not modelled, so results that drive
 * vc far from Vc,eq (start-up, very large steps) overstate what the circuit can do. For that reason
 * no start-up scenario is offered: without the amplifier's rails and a soft-start it would only
 * show an ideal integrator winding up. The clamps of the control law are modelled and reported
 * ({@link ClosedLoopTransient#everClamped()}).
 *
 * <p>Everything the averaged model leaves out (the current loop's sampling above about fsw/10,
 * switching ripple) is also left out here. Immutable.
 */
public final class ClosedLoopAveragedSimulation {

    /** Deviation, relative to Vout, that scales the compensator states' integration tolerance. */
    private static final double SCALE_DEVIATION = 0.01;
    /** Frequency, as a fraction of fsw, where that scale is taken: inside any practical loop band. */
    private static final double SCALE_FREQUENCY_FRACTION = 0.05;
    /** Longest interval between event-surface checks, in switching periods (as the averaged model). */
    private static final double EVENT_CHECK_PERIODS = 5;

    private final AveragedFlybackModel model;
    private final CompensatorNetwork network;
    private final CompensatorDynamics compensator;
    private final ControlLaw law;

    /**
     * @param stage        the power stage
     * @param control      the controller (scheme, ramp or sense gain, slope, duty limit)
     * @param network      the compensator network; its {@code transferFunction()} is Gc
     * @param feedbackGain k_fb from the amplifier output to the comparator, V/V
     */
    public ClosedLoopAveragedSimulation(StageSpec stage, ControlSpec control, CompensatorNetwork network,
                                        double feedbackGain) {
        this.model = new AveragedFlybackModel(stage, control);
        this.network = network;
        this.compensator = CompensatorDynamics.of(network.transferFunction());
        this.law = ControlLaw.of(control, feedbackGain);
    }

    /** The rounded (as-built) network of {@code result} with the controller's feedback gain. */
    public static ClosedLoopAveragedSimulation of(DesignResult result) {
        return new ClosedLoopAveragedSimulation(result.request().stage(), result.request().control(),
                result.rounded(), result.request().control().fbGain());
    }

    /** As {@link #of(DesignResult)} with the corner's optocoupler CTR where it has one. */
    public static ClosedLoopAveragedSimulation atCorner(DesignResult result, Corner corner) {
        CompensatorNetwork n = Double.isNaN(corner.ctr()) ? result.rounded()
                : result.rounded().withParts(Map.of(PartNames.CTR, corner.ctr()));
        return new ClosedLoopAveragedSimulation(result.request().stage(), result.request().control(), n,
                result.request().control().fbGain());
    }

    public StageSpec stage() {
        return model.stage();
    }

    public ControlSpec control() {
        return model.control();
    }

    public CompensatorNetwork network() {
        return network;
    }

    public CompensatorDynamics compensator() {
        return compensator;
    }

    public ControlLaw law() {
        return law;
    }

    public AveragedFlybackModel averagedModel() {
        return model;
    }

    /**
     * The closed loop's DC point at input {@code vinV} and load {@code ioutA} (resistor
     * Vout/Iout): the averaged stage regulated to the spec's Vout, and the amplifier output that
     * commands its control input.
     *
     * @throws org.flyloop.stage.InfeasibleOperatingPointException when Vout is out of reach
     */
    public ClosedLoopEquilibrium equilibrium(double vinV, double ioutA) {
        Equilibrium e = model.regulatedEquilibrium(vinV, ioutA);
        return new ClosedLoopEquilibrium(e, law.amplifierOutputFor(e.inputs().control()));
    }

    /**
     * Load step at t = 0 from the closed-loop equilibrium at {@code ioutFromA} to
     * {@code ioutToA}: the load resistor stays Vout/ioutFrom and a current source in parallel
     * steps by ioutTo − ioutFrom — the same load a linearization at ioutFrom sees, so the result
     * is directly comparable with {@code ClosedLoop.loadStep} at that point. A step down makes the
     * source return current.
     *
     * @param timesS increasing sample times from 0, s
     */
    public ClosedLoopTransient loadStep(double vinV, double ioutFromA, double ioutToA, double[] timesS) {
        if (!(ioutFromA > 0) || !(ioutToA > 0)) {
            throw new IllegalArgumentException("load currents must be positive");
        }
        ClosedLoopEquilibrium start = equilibrium(vinV, ioutFromA);
        InputProfile profile = InputProfile.constant(start.stage().inputs())
                .step(AveragedInputs.ISTEP, 0, ioutToA - ioutFromA);
        return simulate("load step", start, profile, timesS);
    }

    /** As {@link #loadStep(double, double, double, double[])} from the input voltage and load of {@code from}. */
    public ClosedLoopTransient loadStep(OperatingPoint from, double ioutToA, double[] timesS) {
        return loadStep(from.vin(), from.iout(), ioutToA, timesS);
    }

    /** As {@link #loadStep(double, double, double, double[])} on a uniform grid of {@code intervals}. */
    public ClosedLoopTransient loadStep(double vinV, double ioutFromA, double ioutToA, double durationS,
                                        int intervals) {
        return loadStep(vinV, ioutFromA, ioutToA, uniform(durationS, intervals));
    }

    /** Line step at t = 0 from {@code vinFromV} to {@code vinToV} at load {@code ioutA}. */
    public ClosedLoopTransient lineStep(double vinFromV, double vinToV, double ioutA, double[] timesS) {
        ClosedLoopEquilibrium start = equilibrium(vinFromV, ioutA);
        InputProfile profile = InputProfile.constant(start.stage().inputs()).step(AveragedInputs.VIN, 0, vinToV);
        return simulate("line step", start, profile, timesS);
    }

    /**
     * Simulates from {@code start} (compensator states at zero, i.e. the amplifier at
     * Vc,eq) under the input-voltage and load-step-current profile {@code disturbances}; the
     * profile's control column is ignored, the loop sets the control input.
     */
    public ClosedLoopTransient simulate(String name, ClosedLoopEquilibrium start, InputProfile disturbances,
                                        double[] timesS) {
        StageSpec s = model.stage();
        double[] scales = compensator.typicalMagnitudes(SCALE_DEVIATION * s.vout(),
                SCALE_FREQUENCY_FRACTION * s.fswHz());
        ClosedLoopIntegrator integrator = new ClosedLoopIntegrator(model.circuit(start.stage().loadResistanceOhm()),
                compensator, law, s.turns(), EVENT_CHECK_PERIODS * s.periodS(), scales);
        return integrator.run(name, start, disturbances, timesS);
    }

    /** {@code intervals + 1} equally spaced times over [0, durationS]. */
    static double[] uniform(double durationS, int intervals) {
        if (!(durationS > 0) || intervals < 1) {
            throw new IllegalArgumentException("need a positive duration and at least one interval");
        }
        double[] t = new double[intervals + 1];
        for (int i = 0; i <= intervals; i++) {
            t[i] = durationS * i / intervals;
        }
        return t;
    }
}
