package org.flyloop.switching;

/**
 * The circuit's two energy-storage states at an instant.
 *
 * @param imA magnetizing current referred to the primary, A (never negative: the rectifier blocks)
 * @param vcV output-capacitor voltage (behind the ESR), V
 */
public record CircuitState(double imA, double vcV) {

    /** Everything discharged: the start of a power-up. */
    public static final CircuitState DISCHARGED = new CircuitState(0, 0);

    public CircuitState {
        if (!Double.isFinite(imA) || !Double.isFinite(vcV)) {
            throw new IllegalArgumentException("state must be finite: im=" + imA + ", vc=" + vcV);
        }
    }
}
