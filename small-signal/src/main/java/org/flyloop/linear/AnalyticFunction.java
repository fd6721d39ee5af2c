package org.flyloop.linear;

/**
 * A complex-analytic function f(s) that can report its value and derivative, used to polish roots
 * by Newton's method against the most accurate representation available (Horner on the given
 * coefficients, or a sum of factored products).
 */
@FunctionalInterface
interface AnalyticFunction {

    /** Writes {Re f, Im f, Re f', Im f'} at s = re + j·im into {@code out} (length ≥ 4). */
    void valueAndDerivative(double re, double im, double[] out);
}
