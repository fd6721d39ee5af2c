package org.flyloop.stage.model;

import org.flyloop.linear.Root;

/**
 * One pole or zero of a stage transfer function, as an engineer reads it.
 *
 * @param kind        pole or zero
 * @param frequencyHz corner (real) or natural (pair) frequency, Hz
 * @param q           quality factor (0.5 reported for a real root; negative in the right half-plane)
 * @param order       1 for a real root, 2 for a complex pair
 * @param rightHalfPlane true for a right-half-plane root
 * @param label       what it is physically, e.g. "RHP zero", "ESR zero", "double pole"
 */
public record PoleZero(Kind kind, double frequencyHz, double q, int order, boolean rightHalfPlane,
                       String label) {

    /** Pole or zero. */
    public enum Kind { POLE, ZERO }

    static PoleZero of(Kind kind, Root root, String label) {
        double q = root.isPair() ? root.q() : (root.isRightHalfPlane() ? -0.5 : 0.5);
        return new PoleZero(kind, root.frequencyHz(), q, root.order(), root.isRightHalfPlane(), label);
    }
}
