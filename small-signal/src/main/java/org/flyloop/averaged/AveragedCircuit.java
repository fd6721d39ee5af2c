package org.flyloop.averaged;

import java.util.List;

/**
 * A nonlinear averaged converter circuit: states, their derivatives, outputs and the switching
 * cycle behind them. The simulator, the equilibrium solver and the linearizer only use this
 * interface, so circuits with more states (input filter, output post-filter) reuse them unchanged.
 */
public interface AveragedCircuit {

    StateLayout layout();

    /** dx/dt at state {@code x} and inputs {@code u}, SI units, written into {@code dxdt}. */
    void derivatives(double[] x, AveragedInputs u, double[] dxdt);

    /** The averaged switching cycle at {@code x}, {@code u}. */
    SwitchCycle cycle(double[] x, AveragedInputs u);

    /** Output names in the row order of {@link #outputs}. */
    List<String> outputNames();

    /** Output values at {@code x}, {@code u}. */
    double[] outputs(double[] x, AveragedInputs u);

    /**
     * Continuous functions whose sign changes mark the switch network's mode changes (kinks of the
     * vector field); the simulator locates their zeros as events.
     */
    double[] modeSurfaces(double[] x, AveragedInputs u);

    /** A starting point for the equilibrium search at inputs {@code u}. */
    double[] steadyStateGuess(AveragedInputs u);
}
