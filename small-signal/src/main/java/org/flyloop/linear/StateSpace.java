package org.flyloop.linear;

import org.apache.commons.math3.complex.Complex;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.LinearSolverFactory_ZDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * A continuous-time linear state-space model x' = A·x + B·u, y = C·x + D·u on EJML matrices, with
 * n states, m inputs and p outputs. Single-input single-output use (input 0 → output 0) is the
 * default; other channels are picked by index.
 *
 * <p>The frequency response is evaluated exactly as C·(sI − A)⁻¹·B + D at s = j·2π·f by a complex
 * LU solve, never through polynomial coefficients, so it is an independent check on a factored
 * {@link TransferFunction}. Evaluation allocates and costs O(n³) per point: fine for checks and
 * plots, not for the hot loop-gain sweep (use the factored form there).
 *
 * <p>Instances are immutable: matrices are copied in and out.
 */
public final class StateSpace implements ComplexResponse {

    private final DMatrixRMaj a, b, c, d;

    private StateSpace(DMatrixRMaj a, DMatrixRMaj b, DMatrixRMaj c, DMatrixRMaj d) {
        int n = a.numRows;
        if (a.numCols != n || b.numRows != n || c.numCols != n || d.numRows != c.numRows
                || d.numCols != b.numCols) {
            throw new IllegalArgumentException(String.format(
                    "inconsistent sizes: A %dx%d, B %dx%d, C %dx%d, D %dx%d", a.numRows, a.numCols,
                    b.numRows, b.numCols, c.numRows, c.numCols, d.numRows, d.numCols));
        }
        for (DMatrixRMaj m : new DMatrixRMaj[] {a, b, c, d}) {
            for (int i = 0; i < m.getNumElements(); i++) {
                if (!Double.isFinite(m.data[i])) {
                    throw new IllegalArgumentException("matrix entries must be finite");
                }
            }
        }
        this.a = a;
        this.b = b;
        this.c = c;
        this.d = d;
    }

    /** A model from copies of the given matrices (A n×n, B n×m, C p×n, D p×m). */
    public static StateSpace of(DMatrixRMaj a, DMatrixRMaj b, DMatrixRMaj c, DMatrixRMaj d) {
        return new StateSpace(a.copy(), b.copy(), c.copy(), d.copy());
    }

    /**
     * A model from row-major arrays; D fixes the numbers of outputs and inputs, so a static gain
     * (no states) may pass empty A, B and C.
     */
    public static StateSpace of(double[][] a, double[][] b, double[][] c, double[][] d) {
        int n = a.length;
        int p = d.length;
        int m = p == 0 ? 0 : d[0].length;
        if (n == 0) {
            return of(new DMatrixRMaj(0, 0), new DMatrixRMaj(0, m), new DMatrixRMaj(p, 0), new DMatrixRMaj(d));
        }
        return of(new DMatrixRMaj(a), new DMatrixRMaj(b), new DMatrixRMaj(c), new DMatrixRMaj(d));
    }

    /**
     * A minimal realisation of a proper transfer function as a cascade of real first- and
     * second-order sections; see {@link CascadeRealization} for why a cascade rather than a
     * companion form.
     *
     * @throws IllegalArgumentException if {@code h} is improper (more zeros than poles)
     */
    public static StateSpace fromTransferFunction(TransferFunction h) {
        return CascadeRealization.realize(h);
    }

    public int stateCount() {
        return a.numRows;
    }

    public int inputCount() {
        return b.numCols;
    }

    public int outputCount() {
        return c.numRows;
    }

    /** Copy of A. */
    public DMatrixRMaj a() {
        return a.copy();
    }

    /** Copy of B. */
    public DMatrixRMaj b() {
        return b.copy();
    }

    /** Copy of C. */
    public DMatrixRMaj c() {
        return c.copy();
    }

    /** Copy of D. */
    public DMatrixRMaj d() {
        return d.copy();
    }

    /** H(j·2π·f) from input 0 to output 0. */
    @Override
    public void evaluateInto(double frequencyHz, double[] out) {
        evaluateInto(frequencyHz, 0, 0, out);
    }

    /** H(j·2π·f) from {@code input} to {@code output}, into out[0] (real) and out[1] (imaginary). */
    public void evaluateInto(double frequencyHz, int output, int input, double[] out) {
        solveAt(0, 2 * Math.PI * frequencyHz, output, input, out);
    }

    /** H(s) = C·(sI − A)⁻¹·B + D at a complex s (rad/s), from {@code input} to {@code output}. */
    public Complex evaluateAt(Complex s, int output, int input) {
        double[] out = new double[2];
        solveAt(s.getReal(), s.getImaginary(), output, input, out);
        return new Complex(out[0], out[1]);
    }

    /** H(s) at a complex s (rad/s), input 0 to output 0. */
    public Complex evaluateAt(Complex s) {
        return evaluateAt(s, 0, 0);
    }

    /**
     * Solves (sI − A)·x = B[:, input] by complex LU with partial pivoting and returns
     * C[output, :]·x + D[output, input]. At an exact eigenvalue the result is not finite.
     */
    private void solveAt(double sr, double si, int output, int input, double[] out) {
        checkChannel(output, input);
        int n = stateCount();
        double yr = d.get(output, input);
        double yi = 0;
        if (n > 0) {
            ZMatrixRMaj m = new ZMatrixRMaj(n, n);
            ZMatrixRMaj rhs = new ZMatrixRMaj(n, 1);
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    m.set(i, j, (i == j ? sr : 0) - a.get(i, j), i == j ? si : 0);
                }
                rhs.set(i, 0, b.get(i, input), 0);
            }
            LinearSolverDense<ZMatrixRMaj> solver = LinearSolverFactory_ZDRM.lu(n);
            ZMatrixRMaj x = new ZMatrixRMaj(n, 1);
            if (!solver.setA(m)) {
                out[0] = Double.NaN;
                out[1] = Double.NaN;
                return;
            }
            solver.solve(rhs, x);
            for (int i = 0; i < n; i++) {
                double ci = c.get(output, i);
                yr += ci * x.getReal(i, 0);
                yi += ci * x.getImag(i, 0);
            }
        }
        out[0] = yr;
        out[1] = yi;
    }

    private void checkChannel(int output, int input) {
        if (output < 0 || output >= outputCount() || input < 0 || input >= inputCount()) {
            throw new IndexOutOfBoundsException("no channel from input " + input + " to output " + output);
        }
    }

    /** The single-input single-output model from {@code input} to {@code output}. */
    public StateSpace channel(int output, int input) {
        checkChannel(output, input);
        int n = stateCount();
        return new StateSpace(a.copy(), CommonOps_DDRM.extract(b, 0, n, input, input + 1),
                CommonOps_DDRM.extract(c, output, output + 1, 0, n),
                CommonOps_DDRM.extract(d, output, output + 1, input, input + 1));
    }

    /**
     * The transfer function from input 0 to output 0; see {@link #toTransferFunction(int, int)}.
     */
    public TransferFunction toTransferFunction() {
        return toTransferFunction(0, 0);
    }

    /**
     * The factored transfer function of one channel: poles are the eigenvalues of A, zeros the
     * invariant zeros of the channel, the gain matched to the exact response at a test frequency
     * away from all roots; see {@link StateSpaceToTransferFunction}. Pole-zero pairs closer than
     * 1e-8 (relative) — uncontrollable or unobservable modes — cancel.
     */
    public TransferFunction toTransferFunction(int output, int input) {
        return StateSpaceToTransferFunction.convert(channel(output, input));
    }

    /**
     * Series connection: u → this → next → y (this model's outputs feed {@code next}'s inputs).
     * With x = [x₁; x₂]: A = [A₁ 0; B₂C₁ A₂], B = [B₁; B₂D₁], C = [D₂C₁ C₂], D = D₂D₁.
     */
    public StateSpace series(StateSpace next) {
        if (outputCount() != next.inputCount()) {
            throw new IllegalArgumentException("outputs of the first model must match inputs of the second");
        }
        int n1 = stateCount();
        int n2 = next.stateCount();
        DMatrixRMaj aa = new DMatrixRMaj(n1 + n2, n1 + n2);
        CommonOps_DDRM.insert(a, aa, 0, 0);
        CommonOps_DDRM.insert(next.a, aa, n1, n1);
        CommonOps_DDRM.insert(product(next.b, c), aa, n1, 0);
        DMatrixRMaj bb = new DMatrixRMaj(n1 + n2, inputCount());
        CommonOps_DDRM.insert(b, bb, 0, 0);
        CommonOps_DDRM.insert(product(next.b, d), bb, n1, 0);
        DMatrixRMaj cc = new DMatrixRMaj(next.outputCount(), n1 + n2);
        CommonOps_DDRM.insert(product(next.d, c), cc, 0, 0);
        CommonOps_DDRM.insert(next.c, cc, 0, n1);
        return new StateSpace(aa, bb, cc, product(next.d, d));
    }

    /**
     * Parallel connection (sum of outputs for the same inputs): A = diag(A₁, A₂), B = [B₁; B₂],
     * C = [C₁ C₂], D = D₁ + D₂.
     */
    public StateSpace plus(StateSpace other) {
        if (inputCount() != other.inputCount() || outputCount() != other.outputCount()) {
            throw new IllegalArgumentException("models must have the same inputs and outputs");
        }
        int n1 = stateCount();
        int n2 = other.stateCount();
        DMatrixRMaj aa = new DMatrixRMaj(n1 + n2, n1 + n2);
        CommonOps_DDRM.insert(a, aa, 0, 0);
        CommonOps_DDRM.insert(other.a, aa, n1, n1);
        DMatrixRMaj bb = new DMatrixRMaj(n1 + n2, inputCount());
        CommonOps_DDRM.insert(b, bb, 0, 0);
        CommonOps_DDRM.insert(other.b, bb, n1, 0);
        DMatrixRMaj cc = new DMatrixRMaj(outputCount(), n1 + n2);
        CommonOps_DDRM.insert(c, cc, 0, 0);
        CommonOps_DDRM.insert(other.c, cc, 0, n1);
        DMatrixRMaj dd = new DMatrixRMaj(outputCount(), inputCount());
        CommonOps_DDRM.add(d, other.d, dd);
        return new StateSpace(aa, bb, cc, dd);
    }

    /**
     * Unity negative feedback of a single-input single-output loop: u = r − y. Eliminating y from
     * y = C·x + D·(r − y) gives A − B·C/(1+D), B/(1+D), C/(1+D), D/(1+D).
     *
     * @throws ArithmeticException if D = −1 (algebraic loop without solution)
     */
    public StateSpace feedback() {
        if (inputCount() != 1 || outputCount() != 1) {
            throw new IllegalArgumentException("feedback() is for single-input single-output models");
        }
        double dd = d.get(0, 0);
        if (1 + dd == 0) {
            throw new ArithmeticException("1 + D = 0: the feedback loop is ill-posed");
        }
        double k = 1 / (1 + dd);
        DMatrixRMaj aa = a.copy();
        CommonOps_DDRM.multAdd(-k, b, c, aa);
        DMatrixRMaj bb = b.copy();
        CommonOps_DDRM.scale(k, bb);
        DMatrixRMaj cc = c.copy();
        CommonOps_DDRM.scale(k, cc);
        return new StateSpace(aa, bb, cc, new DMatrixRMaj(1, 1, true, dd * k));
    }

    private static DMatrixRMaj product(DMatrixRMaj x, DMatrixRMaj y) {
        DMatrixRMaj r = new DMatrixRMaj(x.numRows, y.numCols);
        if (x.numCols > 0) {
            CommonOps_DDRM.mult(x, y, r);
        }
        return r;
    }

    /** Unit-step response of input 0 at output 0; see {@link #stepResponse(double[], int, int)}. */
    public double[] stepResponse(double[] timesS) {
        return stepResponse(timesS, 0, 0);
    }

    /**
     * Output {@code output} at the given times (seconds, ≥ 0) for a unit step on {@code input} at
     * t = 0 from zero state. Exact for the linear model: with M = [A b; 0 0],
     * exp(M·t) = [exp(A·t) Γ(t); 0 1] and x(t) = Γ(t) = ∫₀ᵗ exp(A·τ)·b dτ (C. F. Van Loan,
     * "Computing integrals involving the matrix exponential", IEEE Trans. Automatic Control 23(3),
     * 1978), so y(t) = C·Γ(t) + D. Each time is computed independently (no error accumulation),
     * with {@link MatrixExponential}.
     */
    public double[] stepResponse(double[] timesS, int output, int input) {
        checkChannel(output, input);
        int n = stateCount();
        DMatrixRMaj m = new DMatrixRMaj(n + 1, n + 1);
        CommonOps_DDRM.insert(a, m, 0, 0);
        for (int i = 0; i < n; i++) {
            m.set(i, n, b.get(i, input));
        }
        double[] y = new double[timesS.length];
        DMatrixRMaj mt = new DMatrixRMaj(n + 1, n + 1);
        for (int k = 0; k < timesS.length; k++) {
            double t = timesS[k];
            if (!(t >= 0) || !Double.isFinite(t)) {
                throw new IllegalArgumentException("times must be finite and >= 0: " + t);
            }
            CommonOps_DDRM.scale(t, m, mt);
            DMatrixRMaj e = MatrixExponential.of(mt);
            double v = d.get(output, input);
            for (int i = 0; i < n; i++) {
                v += c.get(output, i) * e.get(i, n);
            }
            y[k] = v;
        }
        return y;
    }

    @Override
    public String toString() {
        return "StateSpace[" + stateCount() + " states, " + inputCount() + " inputs, " + outputCount()
                + " outputs]";
    }
}
