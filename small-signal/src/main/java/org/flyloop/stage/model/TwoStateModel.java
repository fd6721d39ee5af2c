package org.flyloop.stage.model;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;

/**
 * A linear two-state, single-output model ẋ = A·x + B·u, y = C·x + D·u with a few inputs, turned
 * into factored transfer functions in closed form.
 *
 * <p>For a 2×2 A, C·(sI − A)⁻¹·b + d = [d·s² + (c·b − d·tr A)·s + (c₁(a₁₂b₂ − a₂₂b₁) +
 * c₂(a₂₁b₁ − a₁₁b₂) + d·det A)] / (s² − tr A·s + det A), and both quadratics are factored with the
 * cancellation-free form of the quadratic formula, so no polynomial of higher order is ever formed.
 */
final class TwoStateModel {
    private final double a11, a12, a21, a22;
    private final double[][] b; // b[input] = {b1, b2}
    private final double c1, c2;
    private final double[] d;

    TwoStateModel(double[][] a, double[][] b, double[] c, double[] d) {
        this.a11 = a[0][0];
        this.a12 = a[0][1];
        this.a21 = a[1][0];
        this.a22 = a[1][1];
        this.b = b;
        this.c1 = c[0];
        this.c2 = c[1];
        this.d = d;
    }

    double[][] a() {
        return new double[][] {{a11, a12}, {a21, a22}};
    }

    /** Transfer function from input {@code k} to the output. */
    TransferFunction transfer(int k) {
        double b1 = b[k][0], b2 = b[k][1], dk = d[k];
        double tr = a11 + a22;
        double det = a11 * a22 - a12 * a21;
        double n2 = dk;
        double n1 = c1 * b1 + c2 * b2 - dk * tr;
        double n0 = c1 * (a12 * b2 - a22 * b1) + c2 * (a21 * b1 - a11 * b2) + dk * det;
        return ratio(n2, n1, n0, 1, -tr, det);
    }

    /** The poles: roots of s² − tr A·s + det A. */
    List<Root> poles() {
        return roots(1, -(a11 + a22), a11 * a22 - a12 * a21);
    }

    static TransferFunction ratio(double n2, double n1, double n0, double d2, double d1, double d0) {
        if (n2 == 0 && n1 == 0 && n0 == 0) {
            return TransferFunction.constant(0);
        }
        int integrators = 0;
        // Exact zeros at the origin become differentiators (never expected in a flyback stage).
        while (n0 == 0) {
            n0 = n1;
            n1 = n2;
            n2 = 0;
            integrators--;
        }
        while (d0 == 0) {
            d0 = d1;
            d1 = d2;
            d2 = 0;
            integrators++;
        }
        return TransferFunction.of(n0 / d0, integrators, roots(n2, n1, n0), roots(d2, d1, d0));
    }

    /**
     * Non-zero roots of a2·s² + a1·s + a0 (a0 ≠ 0) as {@link Root}s, using q = −(a1 + sign(a1)·√Δ)/2
     * so that neither root suffers cancellation.
     */
    static List<Root> roots(double a2, double a1, double a0) {
        List<Root> out = new ArrayList<>();
        if (a2 == 0) {
            if (a1 != 0) {
                out.add(Root.real(-a0 / a1));
            }
            return out;
        }
        double disc = a1 * a1 - 4 * a2 * a0;
        if (disc >= 0) {
            double q = -0.5 * (a1 + Math.copySign(Math.sqrt(disc), a1));
            out.add(Root.real(q / a2));
            out.add(Root.real(a0 / q));
        } else {
            out.add(new Root(-a1 / (2 * a2), Math.sqrt(-disc) / (2 * Math.abs(a2))));
        }
        return out;
    }
}
