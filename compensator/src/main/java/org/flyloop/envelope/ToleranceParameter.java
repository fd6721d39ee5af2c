package org.flyloop.envelope;

import org.flyloop.spec.Tolerance;

/**
 * One toleranced quantity: what it is, and its band relative to the nominal value.
 *
 * @param quantity which value the tolerance applies to
 * @param partName the compensator part name for {@link Quantity#PART}, else null
 * @param band     the relative band
 */
public record ToleranceParameter(Quantity quantity, String partName, Tolerance band) {

    /** The toleranced quantities. */
    public enum Quantity {
        /** Magnetizing inductance. */
        LM("stage.lm"),
        /** Output capacitance. */
        COUT("stage.cout"),
        /** Output capacitor ESR. */
        ESR("stage.esr"),
        /** Switching frequency. */
        FSW("stage.fsw"),
        /** A compensator resistor or capacitor. */
        PART("parts."),
        /** The optocoupler CTR, across feedback.ctr. */
        CTR("ctr");

        private final String key;

        Quantity(String key) {
            this.key = key;
        }
    }

    public ToleranceParameter {
        if ((quantity == Quantity.PART) != (partName != null)) {
            throw new IllegalArgumentException("a part name goes with, and only with, a part tolerance");
        }
    }

    /** The key used in reports: "stage.lm", "parts.r_zero", "ctr". */
    public String name() {
        return quantity == Quantity.PART ? quantity.key + partName : quantity.key;
    }

    /** True for a quantity of the power stage. */
    public boolean isStage() {
        return quantity == Quantity.LM || quantity == Quantity.COUT || quantity == Quantity.ESR
                || quantity == Quantity.FSW;
    }

    /** The value at position {@code u} ∈ [0, 1] across the band (0: lowest, 1: highest). */
    public double valueAt(double nominal, double u) {
        return band.at(nominal, u);
    }

    /** The relative deviation at position {@code u}. */
    public double deviationAt(double u) {
        return band.low() + u * (band.high() - band.low());
    }
}
