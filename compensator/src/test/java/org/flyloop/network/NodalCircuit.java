package org.flyloop.network;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.DoubleFunction;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;

/**
 * A small modified-nodal-analysis (MNA) solver for linear AC circuits, used as the independent
 * reference for the network formulas: it knows nothing of poles, zeros or transfer functions, only
 * Kirchhoff's current law at each node plus one equation per voltage-defined branch, solved with
 * EJML's complex LU at one frequency at a time.
 *
 * <p>Nodes are named; "0" is ground. Unknowns are the node voltages and the currents of voltage
 * sources, ideal amplifiers and controlled voltage sources. KCL rows sum the currents leaving a node.
 */
final class NodalCircuit {
    static final String GROUND = "0";

    private interface Stamp {
        void apply(double omega, ZMatrixRMaj a, ZMatrixRMaj b);
    }

    private final Map<String, Integer> nodes = new LinkedHashMap<>();
    private final List<Stamp> stamps = new ArrayList<>();
    private int branches;

    /** Index of a node's voltage among the unknowns; −1 for ground. */
    private int node(String name) {
        if (GROUND.equals(name)) {
            return -1;
        }
        return nodes.computeIfAbsent(name, k -> nodes.size());
    }

    /** A new branch-current unknown; its final index is the node count plus this slot. */
    private int newBranch() {
        return branches++;
    }

    private int size() {
        return nodes.size() + branches;
    }

    private int branchIndex(int slot) {
        return nodes.size() + slot;
    }

    private static void add(ZMatrixRMaj m, int row, int col, double re, double im) {
        if (row < 0 || col < 0) {
            return;
        }
        m.set(row, col, m.getReal(row, col) + re, m.getImag(row, col) + im);
    }

    /** A two-terminal admittance y(ω) = re + j·im between a and b. */
    private void admittance(String a, String b, DoubleFunction<double[]> y) {
        int i = node(a);
        int j = node(b);
        stamps.add((w, m, rhs) -> {
            double[] v = y.apply(w);
            add(m, i, i, v[0], v[1]);
            add(m, j, j, v[0], v[1]);
            add(m, i, j, -v[0], -v[1]);
            add(m, j, i, -v[0], -v[1]);
        });
    }

    void resistor(String a, String b, double ohms) {
        admittance(a, b, w -> new double[] {1 / ohms, 0});
    }

    void capacitor(String a, String b, double farads) {
        admittance(a, b, w -> new double[] {0, w * farads});
    }

    /**
     * An independent voltage source v(plus) − v(minus) = volts; returns a handle to its current,
     * which flows from plus through the source to minus.
     */
    int voltageSource(String plus, String minus, double volts) {
        int p = node(plus);
        int n = node(minus);
        int slot = newBranch();
        stamps.add((w, m, rhs) -> {
            int k = branchIndex(slot);
            add(m, p, k, 1, 0);
            add(m, n, k, -1, 0);
            add(m, k, p, 1, 0);
            add(m, k, n, -1, 0);
            rhs.set(k, 0, rhs.getReal(k, 0) + volts, rhs.getImag(k, 0));
        });
        return slot;
    }

    /**
     * An ideal amplifier as a nullor: v(inPlus) = v(inMinus) exactly, and the output node may
     * source or sink any current (to ground). No large gain is involved.
     */
    void nullor(String out, String inPlus, String inMinus) {
        int o = node(out);
        int p = node(inPlus);
        int n = node(inMinus);
        int slot = newBranch();
        stamps.add((w, m, rhs) -> {
            int k = branchIndex(slot);
            add(m, o, k, 1, 0);
            add(m, k, p, 1, 0);
            add(m, k, n, -1, 0);
        });
    }

    /** A voltage-controlled voltage source to ground: v(out) = A(jω)·(v(inPlus) − v(inMinus)). */
    void vcvs(String out, String inPlus, String inMinus, DoubleFunction<Complex> gainAtOmega) {
        int o = node(out);
        int p = node(inPlus);
        int n = node(inMinus);
        int slot = newBranch();
        stamps.add((w, m, rhs) -> {
            int k = branchIndex(slot);
            Complex g = gainAtOmega.apply(w);
            add(m, o, k, 1, 0);
            add(m, k, o, 1, 0);
            add(m, k, p, -g.getReal(), -g.getImaginary());
            add(m, k, n, g.getReal(), g.getImaginary());
        });
    }

    /** A current gm·(v(ctrlPlus) − v(ctrlMinus)) flowing out of node {@code from} into node {@code to}. */
    void vccs(String from, String to, String ctrlPlus, String ctrlMinus, double gm) {
        int f = node(from);
        int t = node(to);
        int p = node(ctrlPlus);
        int n = node(ctrlMinus);
        stamps.add((w, m, rhs) -> {
            add(m, f, p, gm, 0);
            add(m, f, n, -gm, 0);
            add(m, t, p, -gm, 0);
            add(m, t, n, gm, 0);
        });
    }

    /** A current gain·i(branch) flowing out of node {@code from} into node {@code to}. */
    void cccs(String from, String to, int controllingBranch, double gain) {
        int f = node(from);
        int t = node(to);
        stamps.add((w, m, rhs) -> {
            int k = branchIndex(controllingBranch);
            add(m, f, k, gain, 0);
            add(m, t, k, -gain, 0);
        });
    }

    /** Node voltages at {@code frequencyHz}, by name. */
    Map<String, Complex> solve(double frequencyHz) {
        int n = size();
        double w = 2 * Math.PI * frequencyHz;
        ZMatrixRMaj a = new ZMatrixRMaj(n, n);
        ZMatrixRMaj b = new ZMatrixRMaj(n, 1);
        for (Stamp s : stamps) {
            s.apply(w, a, b);
        }
        ZMatrixRMaj x = new ZMatrixRMaj(n, 1);
        if (!CommonOps_ZDRM.solve(a, b, x)) {
            throw new IllegalStateException("singular nodal matrix at " + frequencyHz + " Hz");
        }
        Map<String, Complex> out = new LinkedHashMap<>();
        out.put(GROUND, Complex.ZERO);
        for (Map.Entry<String, Integer> e : nodes.entrySet()) {
            out.put(e.getKey(), new Complex(x.getReal(e.getValue(), 0), x.getImag(e.getValue(), 0)));
        }
        return out;
    }

    /** Voltage of one node at {@code frequencyHz}. */
    Complex voltage(String node, double frequencyHz) {
        return solve(frequencyHz).get(node);
    }
}
