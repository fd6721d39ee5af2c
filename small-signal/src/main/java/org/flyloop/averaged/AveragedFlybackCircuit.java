package org.flyloop.averaged;

import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flyloop.spec.ControlScheme;

/**
 * The averaged flyback: the switch network of {@link AveragedSwitchNetwork} feeding an
 * {@link OutputNetwork}. State 0 is {@code il}, the secondary-referred average magnetizing current
 * (A); the output network's states follow (for {@link CapacitorOutputNetwork}: {@code vc}).
 * Outputs: {@code vout} (output node voltage, V) and {@code il} (A, secondary-referred).
 * Immutable.
 */
public final class AveragedFlybackCircuit implements AveragedCircuit {

    /** Name of the magnetizing-current state. */
    public static final String MAGNETIZING_CURRENT = "il";
    /** Index of the magnetizing-current state. */
    public static final int IL = 0;
    private static final int OUTPUT_OFFSET = 1;
    private static final List<String> OUTPUTS = List.of("vout", "il");

    private final AveragedSwitchNetwork network;
    private final OutputNetwork output;
    private final StateLayout layout;

    /**
     * @param typicalCurrentA typical secondary-referred magnetizing current, scales numerical steps
     */
    public AveragedFlybackCircuit(AveragedSwitchNetwork network, OutputNetwork output, double typicalCurrentA) {
        this.network = network;
        this.output = output;
        this.layout = StateLayout.of(List.of(new StateVariable(MAGNETIZING_CURRENT, "A", typicalCurrentA)))
                .followedBy(output.states());
    }

    public AveragedSwitchNetwork switchNetwork() {
        return network;
    }

    public OutputNetwork outputNetwork() {
        return output;
    }

    @Override
    public StateLayout layout() {
        return layout;
    }

    @Override
    public SwitchCycle cycle(double[] x, AveragedInputs u) {
        return network.cycle(x[IL], u.control(), u.vinV(),
                irect -> output.outputVoltage(x, OUTPUT_OFFSET, irect, u.iStepA()));
    }

    @Override
    public void derivatives(double[] x, AveragedInputs u, double[] dxdt) {
        SwitchCycle c = cycle(x, u);
        dxdt[IL] = c.inductorVoltageV() / network.secondaryInductance();
        output.derivatives(x, OUTPUT_OFFSET, c.rectifierCurrentA(), u.iStepA(), dxdt);
    }

    @Override
    public List<String> outputNames() {
        return OUTPUTS;
    }

    @Override
    public double[] outputs(double[] x, AveragedInputs u) {
        return new double[] {cycle(x, u).outputVoltageV(), x[IL]};
    }

    @Override
    public double[] modeSurfaces(double[] x, AveragedInputs u) {
        SwitchCycle c = cycle(x, u);
        double ipkDcm = 2 * x[IL] - c.ccmMarginA();
        // CCM/DCM boundary, and the rectifier-idle boundary (d2 reaching 0, seen at start-up).
        return new double[] {c.ccmMarginA(), 2 * x[IL] - c.duty() * ipkDcm};
    }

    /**
     * Lossless estimate from the ideal conversion ratios (switch resistance and ESR ignored, the
     * rectifier drop kept): CCM M = d/(1 − d), DCM from the energy per cycle ½·Ls·i_pk²·fsw
     * delivered to the output — the standard flyback results (R. W. Erickson, D. Maksimović,
     * Fundamentals of Power Electronics, 2nd ed., 2001, §6.3.4, and ch. 5 for the DCM buck-boost).
     * In current mode the duty comes from the averaged peak relation at that estimate.
     */
    @Override
    public double[] steadyStateGuess(AveragedInputs u) {
        double d;
        if (network.control().scheme() == ControlScheme.VOLTAGE) {
            d = network.clampDuty(u.control());
        } else {
            double dMax = network.control().dutyMax();
            UnivariateFunction residual = dd -> {
                double[] st = idealSteadyState(dd, u);
                double peak = st[0] + u.vinV() / network.turns() * dd * network.periodS()
                        / (2 * network.secondaryInductance());
                return peak - network.commandedPeak(u.control(), dd);
            };
            double lo = 1e-6 * dMax;
            if (residual.value(lo) >= 0) {
                d = lo;
            } else if (residual.value(dMax) <= 0) {
                d = dMax;
            } else {
                d = new BrentSolver(1e-12).solve(200, residual, lo, dMax);
            }
        }
        double[] st = idealSteadyState(Math.max(d, 1e-9), u);
        double[] out = output.steadyState(st[1], u.iStepA());
        double[] x = new double[layout.size()];
        x[IL] = st[0];
        System.arraycopy(out, 0, x, OUTPUT_OFFSET, out.length);
        return x;
    }

    /** {iL, vout} of the ideal flyback at duty d (see {@link #steadyStateGuess}). */
    private double[] idealSteadyState(double d, AveragedInputs u) {
        double vgs = u.vinV() / network.turns();
        double ls = network.secondaryInductance();
        double ts = network.periodS();
        double vf = network.rectifierDropV();
        double g = 1 / output.loadResistanceOhm();
        double ipk = vgs * d * ts / ls;
        double vCcm = Math.max(d * vgs / (1 - d) - vf, 0);
        double iCcm = output.loadCurrent(vCcm, u.iStepA()) / (1 - d);
        if (2 * iCcm >= ipk) {
            return new double[] {iCcm, vCcm};
        }
        double power = 0.5 * ls * ipk * ipk / ts;
        // (v + Vf)·(g·v + i_step) = P
        double a = g;
        double b = u.iStepA() + vf * g;
        double c = vf * u.iStepA() - power;
        double v = a > 0 ? (-b + Math.sqrt(b * b - 4 * a * c)) / (2 * a) : -c / b;
        v = Math.max(v, 0);
        double d2 = Math.min(d * vgs / (v + vf), 1 - d);
        return new double[] {ipk * (d + d2) / 2, v};
    }
}
