package org.flyloop.averaged;

import org.flyloop.stage.ConductionMode;

/**
 * A DC solution of the averaged model: all state derivatives zero.
 *
 * @param inputs            the inputs held constant
 * @param loadResistanceOhm the load resistor
 * @param state             the state vector (see the circuit's {@link StateLayout}); copied
 * @param cycle             the averaged switching cycle at this state
 * @param turns             transformer turns ratio N, for primary referral
 */
public record Equilibrium(AveragedInputs inputs, double loadResistanceOhm, double[] state, SwitchCycle cycle,
                          double turns) {

    public Equilibrium {
        state = state.clone();
    }

    @Override
    public double[] state() {
        return state.clone();
    }

    /** Output voltage, V. */
    public double voutV() {
        return cycle.outputVoltageV();
    }

    /** Duty cycle. */
    public double duty() {
        return cycle.duty();
    }

    /** Demagnetizing fraction d2. */
    public double duty2() {
        return cycle.duty2();
    }

    public ConductionMode mode() {
        return cycle.mode();
    }

    /** Secondary-referred average magnetizing current, A. */
    public double ilSecondaryA() {
        return state[AveragedFlybackCircuit.IL];
    }

    /** Primary-referred average magnetizing current iL/N, A. */
    public double imAvgPrimaryA() {
        return state[AveragedFlybackCircuit.IL] / turns;
    }

    /** Total load current: resistor plus step source, A. */
    public double ioutA() {
        return voutV() / loadResistanceOhm + inputs.iStepA();
    }
}
