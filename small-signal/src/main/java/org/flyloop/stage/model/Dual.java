package org.flyloop.stage.model;

/**
 * A value with its exact first derivatives with respect to a fixed list of variables
 * (forward-mode automatic differentiation). The averaged flyback equations are written once with
 * these, and their exact Jacobian at an operating point comes out without finite-difference
 * error; the tests check that Jacobian against finite differences of independently written
 * equations.
 */
final class Dual {
    final double v;
    final double[] g;

    private Dual(double v, double[] g) {
        this.v = v;
        this.g = g;
    }

    static Dual constant(double v, int n) {
        return new Dual(v, new double[n]);
    }

    static Dual variable(double v, int index, int n) {
        double[] g = new double[n];
        g[index] = 1;
        return new Dual(v, g);
    }

    Dual plus(Dual o) {
        double[] r = new double[g.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = g[i] + o.g[i];
        }
        return new Dual(v + o.v, r);
    }

    Dual plus(double c) {
        return new Dual(v + c, g.clone());
    }

    Dual minus(Dual o) {
        return plus(o.times(-1));
    }

    Dual times(Dual o) {
        double[] r = new double[g.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = g[i] * o.v + v * o.g[i];
        }
        return new Dual(v * o.v, r);
    }

    Dual times(double c) {
        double[] r = new double[g.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = g[i] * c;
        }
        return new Dual(v * c, r);
    }

    Dual dividedBy(Dual o) {
        double[] r = new double[g.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = (g[i] * o.v - v * o.g[i]) / (o.v * o.v);
        }
        return new Dual(v / o.v, r);
    }

    Dual dividedBy(double c) {
        return times(1 / c);
    }
}
