package org.flyloop.switching;

import org.flyloop.spec.StageSpec;

/**
 * The flyback's state equations for each {@link Topology}, plus the running integrals the
 * simulator needs for averages, RMS values and the power balance.
 *
 * <p>With im the primary-referred magnetizing current, vc the capacitor voltage, N = Np/Ns and the
 * secondary current isec = N·im while the rectifier conducts (0 otherwise), the output terminal
 * voltage follows from v = vc + ESR·ic and ic = isec − v/R − Ix:
 * <pre>
 *   v = (vc + ESR·(isec − Ix)) · R/(R + ESR)
 * </pre>
 * and the state equations are
 * <pre>
 *   switch on:   Lm·dim/dt = Vin − Rds·im
 *   rectifying:  Lm·dim/dt = −N·(v + Vf)
 *   idle:        dim/dt = 0 (im = 0)
 *   always:      C·dvc/dt = ic
 * </pre>
 * These are Kirchhoff's laws for the ideal-transformer flyback model; nothing else is assumed.
 */
final class FlybackCircuit {

    static final int IM = 0;
    static final int VC = 1;
    /** ∫ v dt. */
    static final int INT_VOUT = 2;
    /** ∫ isw dt (switch current = im while on). */
    static final int INT_ISW = 3;
    /** ∫ isw² dt. */
    static final int INT_ISW_SQ = 4;
    /** ∫ isec dt. */
    static final int INT_ISEC = 5;
    /** ∫ isec² dt. */
    static final int INT_ISEC_SQ = 6;
    /** ∫ v·(v/R + Ix) dt, the energy taken by the load. */
    static final int INT_LOAD_ENERGY = 7;
    /** ∫ ic² dt. */
    static final int INT_IC_SQ = 8;
    static final int DIMENSION = 9;

    private final double vin;
    private final double lm;
    private final double turns;
    private final double cout;
    private final double esr;
    private final double rectifierDrop;
    private final double switchResistance;
    private final double loadResistance;
    private final double extraLoadCurrent;

    FlybackCircuit(StageSpec stage, double vin, double loadResistance, double extraLoadCurrent) {
        this.vin = vin;
        this.lm = stage.lm();
        this.turns = stage.turns();
        this.cout = stage.cout();
        this.esr = stage.esr();
        this.rectifierDrop = stage.rectifierDrop();
        this.switchResistance = stage.switchResistance();
        this.loadResistance = loadResistance;
        this.extraLoadCurrent = extraLoadCurrent;
    }

    double vin() {
        return vin;
    }

    double lm() {
        return lm;
    }

    double cout() {
        return cout;
    }

    double esr() {
        return esr;
    }

    double rectifierDrop() {
        return rectifierDrop;
    }

    double switchResistance() {
        return switchResistance;
    }

    double loadResistance() {
        return loadResistance;
    }

    double turns() {
        return turns;
    }

    double extraLoadCurrent() {
        return extraLoadCurrent;
    }

    /** Secondary (rectifier) current in this topology, A. */
    double secondaryCurrent(Topology topology, double im) {
        return topology == Topology.RECTIFYING ? turns * im : 0;
    }

    /** Switch current in this topology, A. */
    double switchCurrent(Topology topology, double im) {
        return topology == Topology.SWITCH_ON ? im : 0;
    }

    /** Output terminal voltage v = (vc + ESR·(isec − Ix))·R/(R + ESR), V. */
    double terminalVoltage(double vc, double isec) {
        return (vc + esr * (isec - extraLoadCurrent)) * loadResistance / (loadResistance + esr);
    }

    /** Fills {@code yDot} with the state equations and integrands for this topology. */
    void derivatives(Topology topology, double[] y, double[] yDot) {
        double im = topology == Topology.IDLE ? 0 : y[IM];
        double isec = secondaryCurrent(topology, im);
        double isw = switchCurrent(topology, im);
        double v = terminalVoltage(y[VC], isec);
        double iload = v / loadResistance + extraLoadCurrent;
        double ic = isec - iload;
        switch (topology) {
            case SWITCH_ON -> yDot[IM] = (vin - switchResistance * im) / lm;
            case RECTIFYING -> yDot[IM] = -turns * (v + rectifierDrop) / lm;
            case IDLE -> yDot[IM] = 0;
            default -> throw new IllegalStateException("unknown topology " + topology);
        }
        yDot[VC] = ic / cout;
        yDot[INT_VOUT] = v;
        yDot[INT_ISW] = isw;
        yDot[INT_ISW_SQ] = isw * isw;
        yDot[INT_ISEC] = isec;
        yDot[INT_ISEC_SQ] = isec * isec;
        yDot[INT_LOAD_ENERGY] = v * iload;
        yDot[INT_IC_SQ] = ic * ic;
    }

    /** Energy stored in Lm and C, J. */
    double storedEnergy(CircuitState s) {
        return 0.5 * lm * s.imA() * s.imA() + 0.5 * cout * s.vcV() * s.vcV();
    }
}
