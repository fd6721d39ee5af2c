package org.flyloop.averaged;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.Complex_F64;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.flyloop.linear.StateSpace;
import org.flyloop.linear.TransferFunction;

/**
 * The averaged model linearized at an equilibrium: dx/dt = A·x + B·u, y = C·x + D·u, all in
 * deviations from the operating point, SI units, time in seconds. Inputs in
 * {@link AveragedInputs#NAMES} order (control, vin, istep); outputs as named by the circuit
 * (vout, il). Matrices are copied in and out; instances are immutable.
 */
public final class LinearizedModel {

    private final DMatrixRMaj a;
    private final DMatrixRMaj b;
    private final DMatrixRMaj c;
    private final DMatrixRMaj d;
    private final List<String> stateNames;
    private final List<String> outputNames;
    private final Equilibrium operatingPoint;
    private final StateSpace stateSpace;

    LinearizedModel(DMatrixRMaj a, DMatrixRMaj b, DMatrixRMaj c, DMatrixRMaj d, List<String> stateNames,
                    List<String> outputNames, Equilibrium operatingPoint) {
        this.a = a.copy();
        this.b = b.copy();
        this.c = c.copy();
        this.d = d.copy();
        this.stateNames = Collections.unmodifiableList(new ArrayList<>(stateNames));
        this.outputNames = Collections.unmodifiableList(new ArrayList<>(outputNames));
        this.operatingPoint = operatingPoint;
        this.stateSpace = StateSpace.of(a, b, c, d);
    }

    public DMatrixRMaj a() {
        return a.copy();
    }

    public DMatrixRMaj b() {
        return b.copy();
    }

    public DMatrixRMaj c() {
        return c.copy();
    }

    public DMatrixRMaj d() {
        return d.copy();
    }

    public List<String> stateNames() {
        return stateNames;
    }

    public List<String> inputNames() {
        return AveragedInputs.NAMES;
    }

    public List<String> outputNames() {
        return outputNames;
    }

    public Equilibrium operatingPoint() {
        return operatingPoint;
    }

    /** Row of the named output. */
    public int outputIndex(String name) {
        int i = outputNames.indexOf(name);
        if (i < 0) {
            throw new IllegalArgumentException("no output called " + name);
        }
        return i;
    }

    /** The model as the core's {@link StateSpace} (same matrices, same input and output order). */
    public StateSpace toStateSpace() {
        return StateSpace.of(a, b, c, d);
    }

    /**
     * The transfer from input column {@code input} to output row {@code output} at s = j·2π·f:
     * H = C·(sI − A)⁻¹·B + D, evaluated exactly (complex LU solve, no polynomial coefficients).
     */
    public Complex response(int output, int input, double frequencyHz) {
        double[] out = new double[2];
        stateSpace.evaluateInto(frequencyHz, output, input, out);
        return new Complex(out[0], out[1]);
    }

    /**
     * The factored transfer function of one channel (poles: eigenvalues of A; zeros: the channel's
     * invariant zeros), from the core's conversion.
     */
    public TransferFunction transferFunction(int output, int input) {
        return stateSpace.toTransferFunction(output, input);
    }

    /** DC gain from input column to output row: D − C·A⁻¹·B. */
    public double dcGain(int output, int input) {
        return stateSpace.evaluateAt(Complex.ZERO, output, input).getReal();
    }

    /** Eigenvalues of A, rad/s. */
    public List<Complex> poles() {
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(a.numRows, false);
        if (!eig.decompose(a.copy())) {
            throw new ArithmeticException("eigenvalue decomposition of A failed");
        }
        List<Complex> out = new ArrayList<>();
        for (int i = 0; i < a.numRows; i++) {
            Complex_F64 e = eig.getEigenvalue(i);
            out.add(new Complex(e.real, e.imaginary));
        }
        return out;
    }
}
