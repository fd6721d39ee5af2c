package org.flyloop.network;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;

/** Compares a network's transfer function with the nodal solve of its circuit. */
final class NodalAgreement {
    /** Relative tolerance the brief sets for formula vs. nodal analysis. */
    static final double RELATIVE_TOLERANCE = 1e-9;
    static final int POINTS = 50;

    private NodalAgreement() {
    }

    /**
     * Worst relative difference |Gc − Gnodal|/|Gnodal| over 50 log-spaced frequencies from
     * {@code fromHz} to {@code toHz}.
     */
    static double worstRelativeError(CompensatorNetwork network, double fromHz, double toHz) {
        double worst = 0;
        for (int i = 0; i < POINTS; i++) {
            double f = fromHz * Math.pow(toHz / fromHz, i / (POINTS - 1.0));
            Complex nodal = ReferenceCircuits.response(network, f);
            Complex formula = network.transferFunction().evaluate(f);
            worst = Math.max(worst, formula.subtract(nodal).abs() / nodal.abs());
        }
        return worst;
    }

    /** Asserts agreement within 1e-9 relative from 0.1 Hz to 10 MHz. */
    static void assertAgrees(CompensatorNetwork network) {
        double worst = worstRelativeError(network, 0.1, 1e7);
        assertTrue(worst <= RELATIVE_TOLERANCE, () -> network + ": worst relative error " + worst);
    }
}
