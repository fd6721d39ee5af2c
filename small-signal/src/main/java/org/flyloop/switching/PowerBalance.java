package org.flyloop.switching;

/**
 * Period-average powers of one simulated cycle, W. Every term is an integral the ODE integrator
 * carried along with the state, so the residual measures how well the simulation conserves energy.
 *
 * @param inputW           Vin · average switch current
 * @param loadW            average of v·(v/R + Ix) at the output terminals
 * @param switchLossW      Rds · mean of isw²
 * @param rectifierLossW   Vf · average rectifier current
 * @param esrLossW         ESR · mean of ic²
 * @param storedChangeW    change of ½·Lm·im² + ½·C·vc² over the cycle, divided by Ts (≈ 0 in steady state)
 */
public record PowerBalance(double inputW, double loadW, double switchLossW, double rectifierLossW,
                           double esrLossW, double storedChangeW) {

    /** Sum of the three loss terms, W. */
    public double lossesW() {
        return switchLossW + rectifierLossW + esrLossW;
    }

    /** inputW − loadW − lossesW − storedChangeW: zero for an exact simulation, W. */
    public double residualW() {
        return inputW - loadW - lossesW() - storedChangeW;
    }

    /** loadW / inputW. */
    public double efficiency() {
        return loadW / inputW;
    }
}
