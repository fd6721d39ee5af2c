package org.flyloop.averaged;

import java.util.List;

/**
 * The output capacitor C with its ESR, in parallel with the load resistor R and the load-step
 * current source. One state: the capacitor's internal voltage vC.
 *
 * <p>Kirchhoff at the output node with i_out = v_o/R + i_step:
 * v_o = vC + ESR·(i_rect − i_out), solved algebraically
 * <pre>
 *   v_o = (vC + ESR·(i_rect − i_step)) / (1 + ESR/R)
 *   C·dvC/dt = i_rect − v_o/R − i_step
 * </pre>
 * Immutable.
 */
public final class CapacitorOutputNetwork implements OutputNetwork {

    /** Name of the capacitor-voltage state. */
    public static final String STATE = "vc";

    private final double capacitanceF;
    private final double esrOhm;
    private final double loadResistanceOhm;
    private final double loadConductanceS;
    private final double typicalVoltageV;

    /**
     * @param capacitanceF      C, F
     * @param esrOhm            ESR, Ω (0 allowed)
     * @param loadResistanceOhm R, Ω (positive; {@code Double.POSITIVE_INFINITY} for none)
     * @param typicalVoltageV   typical output voltage, scales numerical steps
     */
    public CapacitorOutputNetwork(double capacitanceF, double esrOhm, double loadResistanceOhm,
                                  double typicalVoltageV) {
        if (!(capacitanceF > 0) || !(esrOhm >= 0) || !(loadResistanceOhm > 0)) {
            throw new IllegalArgumentException("need C > 0, ESR >= 0, R > 0");
        }
        this.capacitanceF = capacitanceF;
        this.esrOhm = esrOhm;
        this.loadResistanceOhm = loadResistanceOhm;
        this.loadConductanceS = 1 / loadResistanceOhm;
        this.typicalVoltageV = typicalVoltageV;
    }

    public double capacitanceF() {
        return capacitanceF;
    }

    public double esrOhm() {
        return esrOhm;
    }

    @Override
    public double loadResistanceOhm() {
        return loadResistanceOhm;
    }

    @Override
    public List<StateVariable> states() {
        return List.of(new StateVariable(STATE, "V", typicalVoltageV));
    }

    @Override
    public double outputVoltage(double[] x, int offset, double rectifierCurrentA, double loadStepA) {
        return (x[offset] + esrOhm * (rectifierCurrentA - loadStepA)) / (1 + esrOhm * loadConductanceS);
    }

    @Override
    public void derivatives(double[] x, int offset, double rectifierCurrentA, double loadStepA, double[] dxdt) {
        double vo = outputVoltage(x, offset, rectifierCurrentA, loadStepA);
        dxdt[offset] = (rectifierCurrentA - vo * loadConductanceS - loadStepA) / capacitanceF;
    }

    @Override
    public double[] steadyState(double voutV, double loadStepA) {
        // No capacitor current in steady state, so no ESR drop.
        return new double[] {voutV};
    }

    @Override
    public double loadCurrent(double voutV, double loadStepA) {
        return voutV * loadConductanceS + loadStepA;
    }
}
