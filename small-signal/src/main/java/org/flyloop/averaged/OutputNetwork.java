package org.flyloop.averaged;

import java.util.List;

/**
 * What sits between the rectifier and the load: it owns some states, turns the average rectifier
 * current into the output node voltage, and integrates its own states. A post-filter is another
 * implementation with more states; the switch network does not change.
 *
 * <p>Methods read this network's states from {@code x} starting at {@code offset}.
 */
public interface OutputNetwork {

    /** This network's states, appended to the circuit's layout after the magnetizing current. */
    List<StateVariable> states();

    /**
     * Output node voltage given the states and the average rectifier current flowing in, V.
     *
     * @param loadStepA the current drawn by the load-step source
     */
    double outputVoltage(double[] x, int offset, double rectifierCurrentA, double loadStepA);

    /** Writes d(state)/dt of this network's states into {@code dxdt} from {@code offset}. */
    void derivatives(double[] x, int offset, double rectifierCurrentA, double loadStepA, double[] dxdt);

    /** This network's state values in DC steady state with output voltage {@code voutV}. */
    double[] steadyState(double voutV, double loadStepA);

    /** Total DC current drawn from the output node at {@code voutV}: resistor plus step source. */
    double loadCurrent(double voutV, double loadStepA);

    /** Load resistance, Ω (infinite when there is no resistive load). */
    double loadResistanceOhm();
}
