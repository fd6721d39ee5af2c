package org.flyloop.verify;

import org.ejml.data.DMatrixRMaj;
import org.flyloop.linear.StateSpace;
import org.flyloop.linear.TransferFunction;

/**
 * The compensator Gc(s) = −v̂c/v̂o as ODE states next to the averaged stage's: the cascade
 * realisation of {@link StateSpace#fromTransferFunction} read into plain arrays, so the derivative
 * evaluation inside the integrator does not allocate.
 *
 * <p>Input: the output-voltage deviation vo − Vo,eq; output y = C·x + D·(vo − Vo,eq), so that the
 * amplifier output is vc = Vc,eq − y. All states zero is the equilibrium for zero input, whether
 * or not Gc integrates. Immutable.
 */
public final class CompensatorDynamics {

    private final TransferFunction transferFunction;
    private final double[][] a;
    private final double[] b;
    private final double[] c;
    private final double d;

    private CompensatorDynamics(TransferFunction transferFunction, StateSpace ss) {
        this.transferFunction = transferFunction;
        int n = ss.stateCount();
        DMatrixRMaj am = ss.a();
        DMatrixRMaj bm = ss.b();
        DMatrixRMaj cm = ss.c();
        this.a = new double[n][n];
        this.b = new double[n];
        this.c = new double[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i][j] = am.get(i, j);
            }
            b[i] = bm.get(i, 0);
            c[i] = cm.get(0, i);
        }
        this.d = ss.d().get(0, 0);
    }

    /**
     * The dynamics of {@code gc}.
     *
     * @throws IllegalArgumentException if {@code gc} is improper (no state-space model)
     */
    public static CompensatorDynamics of(TransferFunction gc) {
        return new CompensatorDynamics(gc, StateSpace.fromTransferFunction(gc));
    }

    public TransferFunction transferFunction() {
        return transferFunction;
    }

    public int stateCount() {
        return b.length;
    }

    /** The direct feedthrough D: nonzero when Gc has as many zeros as poles. */
    public double feedthrough() {
        return d;
    }

    /** y = C·x + D·input, reading the states from {@code z} at {@code offset}. */
    public double output(double[] z, int offset, double inputV) {
        double y = d * inputV;
        for (int i = 0; i < c.length; i++) {
            y += c[i] * z[offset + i];
        }
        return y;
    }

    /** dx/dt = A·x + B·input into {@code dzdt} at {@code offset}. */
    public void derivatives(double[] z, int offset, double inputV, double[] dzdt) {
        int n = b.length;
        for (int i = 0; i < n; i++) {
            double s = b[i] * inputV;
            double[] row = a[i];
            for (int j = 0; j < n; j++) {
                s += row[j] * z[offset + j];
            }
            dzdt[offset + i] = s;
        }
    }

    /**
     * Per-state magnitudes for integrator tolerances: |X_i(j·2π·f)| for a sinusoidal input of
     * amplitude {@code inputV} at {@code frequencyHz}, from the exact response (jωI − A)⁻¹·B.
     * A magnitude that the state reaches for a deviation of that size in the loop's band; a floor
     * of 1e-12 of the largest keeps every entry positive.
     */
    public double[] typicalMagnitudes(double inputV, double frequencyHz) {
        int n = b.length;
        double[][] identityC = new double[n][n];
        double[][] bb = new double[n][1];
        double[][] zeroD = new double[n][1];
        for (int i = 0; i < n; i++) {
            identityC[i][i] = 1;
            bb[i][0] = b[i];
        }
        StateSpace toStates = StateSpace.of(a, bb, identityC, zeroD);
        double[] out = new double[n];
        double[] re = new double[2];
        double largest = 0;
        for (int i = 0; i < n; i++) {
            toStates.evaluateInto(frequencyHz, i, 0, re);
            out[i] = inputV * Math.hypot(re[0], re[1]);
            largest = Math.max(largest, out[i]);
        }
        for (int i = 0; i < n; i++) {
            out[i] = Math.max(out[i], 1e-12 * Math.max(largest, Double.MIN_NORMAL));
        }
        return out;
    }
}
