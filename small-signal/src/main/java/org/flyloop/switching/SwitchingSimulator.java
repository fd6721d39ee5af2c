package org.flyloop.switching;

import java.util.List;
import java.util.Objects;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;

/**
 * Cycle-by-cycle simulation of a flyback stage at one input voltage and load, under open-loop
 * fixed-duty or peak-current control. See the package description for the circuit model.
 *
 * <p>Instances are immutable; every run starts from the state it is given.
 */
public final class SwitchingSimulator {

    /** Cycle-to-cycle relative change of vout average and ipk under which a run has settled. */
    public static final double SETTLED_CHANGE = 1e-7;
    /** Cycles the plain-iteration fallback may spend when shooting does not converge. */
    private static final int MAX_FALLBACK_CYCLES = 200_000;

    private final StageSpec stage;
    private final ControlSpec control;
    private final double vin;
    private final double loadResistance;
    private final double extraLoadCurrentA;
    private final FlybackCircuit circuit;
    private final CycleRunner runner;
    private final double currentScaleA;
    private final double voltageScaleV;

    /**
     * @param stage          the power stage (vout is used only as a voltage scale for tolerances)
     * @param control        the controller: scheme, sense gain, slope and duty limit
     * @param vin            input voltage, V
     * @param loadResistance load resistance, Ω
     */
    public SwitchingSimulator(StageSpec stage, ControlSpec control, double vin, double loadResistance) {
        this(stage, control, vin, loadResistance, 0);
    }

    private SwitchingSimulator(StageSpec stage, ControlSpec control, double vin, double loadResistance,
                               double extraLoadCurrentA) {
        this.stage = Objects.requireNonNull(stage, "stage");
        this.control = Objects.requireNonNull(control, "control");
        if (!(vin > 0) || !Double.isFinite(vin)) {
            throw new IllegalArgumentException("vin must be positive, got " + vin);
        }
        if (!(loadResistance > 0) || !Double.isFinite(loadResistance)) {
            throw new IllegalArgumentException("load resistance must be positive, got " + loadResistance);
        }
        if (!Double.isFinite(extraLoadCurrentA)) {
            throw new IllegalArgumentException("extra load current must be finite, got " + extraLoadCurrentA);
        }
        this.vin = vin;
        this.loadResistance = loadResistance;
        this.extraLoadCurrentA = extraLoadCurrentA;
        this.circuit = new FlybackCircuit(stage, vin, loadResistance, extraLoadCurrentA);
        // Natural scales: the ramp a full period of Vin would build, and the rated output.
        this.currentScaleA = vin * stage.periodS() / stage.lm();
        this.voltageScaleV = stage.vout();
        this.runner = new CycleRunner(circuit, stage.periodS(), currentScaleA, voltageScaleV);
    }

    /** The same circuit with a constant current sink of {@code amps} added in parallel with the load. */
    public SwitchingSimulator withExtraLoadCurrent(double amps) {
        return new SwitchingSimulator(stage, control, vin, loadResistance, amps);
    }

    /**
     * The modulator the control spec implies: for voltage mode a {@link FixedDuty} with this duty,
     * for current mode a {@link PeakCurrent} with this comparator threshold and the spec's sense
     * gain, slope and duty limit.
     */
    public Modulator modulatorFor(double dutyOrControlVoltage) {
        if (control.scheme() == ControlScheme.VOLTAGE) {
            return new FixedDuty(dutyOrControlVoltage);
        }
        return new PeakCurrent(dutyOrControlVoltage, control.senseVPerA(), control.slopeVPerS(), control.dutyMax());
    }

    /** {@link #runToSteadyState(Modulator)} with {@link #modulatorFor(double)}. */
    public SteadyState runToSteadyState(double dutyOrControlVoltage) {
        return runToSteadyState(modulatorFor(dutyOrControlVoltage));
    }

    /**
     * Finds the periodic steady state: Newton shooting from a lossless estimate, then plain cycles
     * until two successive cycles differ by less than {@link #SETTLED_CHANGE} (relative) in vout
     * average and ipk. Averages, RMS values and powers are those of the last cycle.
     *
     * @throws IllegalArgumentException when a fixed duty exceeds control.duty_max
     * @throws IllegalStateException    when neither shooting nor {@value #MAX_FALLBACK_CYCLES}
     *                                  plain cycles settle
     */
    public SteadyState runToSteadyState(Modulator modulator) {
        checkDuty(modulator);
        PeriodicOrbitSolver shooting = new PeriodicOrbitSolver(runner, currentScaleA, voltageScaleV);
        PeriodicOrbitSolver.Orbit orbit = shooting.find(new InitialGuess(circuit, stage.periodS()).startFor(modulator),
                modulator);
        int cycles = orbit.cycles();
        CycleResult previous = runner.run(orbit.start(), modulator);
        CycleResult last = runner.run(previous.end(), modulator);
        cycles += 2;
        double change = relativeChange(previous, last);
        while (change > SETTLED_CHANGE && cycles < MAX_FALLBACK_CYCLES) {
            previous = last;
            last = runner.run(previous.end(), modulator);
            cycles++;
            change = relativeChange(previous, last);
        }
        if (change > SETTLED_CHANGE) {
            throw new IllegalStateException("no steady state at vin=" + vin + " V, R=" + loadResistance
                    + " Ω after " + cycles + " cycles (last change " + change + ")");
        }
        double[][] jac = orbit.converged() ? orbit.jacobian() : shooting.jacobian(last.start(), last, modulator);
        return summarize(last, multipliers(jac), cycles, change);
    }

    /**
     * Simulates {@code cycles} periods from {@code initial} and returns the sampled waveforms.
     *
     * @param samplesPerPeriod grid samples per period (switching edges are added on top)
     */
    public Waveform simulate(Modulator modulator, CircuitState initial, int cycles, int samplesPerPeriod) {
        checkDuty(modulator);
        if (cycles < 1) {
            throw new IllegalArgumentException("need at least one cycle, got " + cycles);
        }
        WaveformRecorder recorder = new WaveformRecorder(circuit, stage.periodS(), samplesPerPeriod);
        CircuitState state = initial;
        for (int k = 0; k < cycles; k++) {
            state = runner.run(state, modulator, recorder, k * stage.periodS()).end();
        }
        return recorder.toWaveform(state);
    }

    /** {@link #simulate(Modulator, CircuitState, int, int)} with {@link #modulatorFor(double)}. */
    public Waveform simulate(double dutyOrControlVoltage, CircuitState initial, int cycles, int samplesPerPeriod) {
        return simulate(modulatorFor(dutyOrControlVoltage), initial, cycles, samplesPerPeriod);
    }

    private void checkDuty(Modulator modulator) {
        if (modulator instanceof FixedDuty fixed && fixed.duty() > control.dutyMax()) {
            throw new IllegalArgumentException("duty " + fixed.duty() + " is above control.duty_max="
                    + control.dutyMax());
        }
    }

    private SteadyState summarize(CycleResult cycle, List<Complex> multipliers, int cycles, double change) {
        double ts = stage.periodS();
        double inputAvg = cycle.integral(FlybackCircuit.INT_ISW) / ts;
        double rectifierAvg = cycle.integral(FlybackCircuit.INT_ISEC) / ts;
        double switchMeanSquare = cycle.integral(FlybackCircuit.INT_ISW_SQ) / ts;
        double rectifierMeanSquare = cycle.integral(FlybackCircuit.INT_ISEC_SQ) / ts;
        PowerBalance power = new PowerBalance(
                vin * inputAvg,
                cycle.integral(FlybackCircuit.INT_LOAD_ENERGY) / ts,
                stage.switchResistance() * switchMeanSquare,
                stage.rectifierDrop() * rectifierAvg,
                stage.esr() * cycle.integral(FlybackCircuit.INT_IC_SQ) / ts,
                (circuit.storedEnergy(cycle.end()) - circuit.storedEnergy(cycle.start())) / ts);
        boolean idle = cycle.onTimeS() + cycle.rectifyingS() < ts * (1 - 1e-9);
        return new SteadyState(cycle.start(), cycle.integral(FlybackCircuit.INT_VOUT) / ts, cycle.peakCurrentA(),
                cycle.onTimeS() / ts, cycle.rectifyingS() / ts, idle ? ConductionMode.DCM : ConductionMode.CCM,
                cycle.dutyLimited(), Math.sqrt(switchMeanSquare), Math.sqrt(rectifierMeanSquare), inputAvg,
                rectifierAvg, power, multipliers, cycles, change);
    }

    private double relativeChange(CycleResult a, CycleResult b) {
        double ts = stage.periodS();
        double va = a.integral(FlybackCircuit.INT_VOUT) / ts;
        double vb = b.integral(FlybackCircuit.INT_VOUT) / ts;
        double dv = Math.abs(va - vb) / Math.max(Math.abs(vb), 1e-9 * voltageScaleV);
        double di = Math.abs(a.peakCurrentA() - b.peakCurrentA())
                / Math.max(Math.abs(b.peakCurrentA()), 1e-9 * currentScaleA);
        return Math.max(dv, di);
    }

    /** Eigenvalues of a 2×2 matrix: tr/2 ± √(tr²/4 − det). */
    private static List<Complex> multipliers(double[][] j) {
        double half = (j[0][0] + j[1][1]) / 2;
        double det = j[0][0] * j[1][1] - j[0][1] * j[1][0];
        double disc = half * half - det;
        if (disc >= 0) {
            double root = Math.sqrt(disc);
            return List.of(new Complex(half + root), new Complex(half - root));
        }
        double root = Math.sqrt(-disc);
        return List.of(new Complex(half, root), new Complex(half, -root));
    }
}
