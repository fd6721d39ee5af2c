package org.flyloop.network;

/**
 * The output divider r_upper/r_lower that feeds the amplifier's sensing input.
 *
 * @param rUpper from the output to the sensing node, Ω
 * @param rLower from the sensing node to ground, Ω
 */
public record FeedbackDivider(double rUpper, double rLower) {

    public FeedbackDivider {
        PartChecks.positive(PartNames.R_UPPER, rUpper);
        PartChecks.positive(PartNames.R_LOWER, rLower);
    }

    /**
     * The divider that regulates the output at {@code voutV} against a reference {@code vrefV}:
     * r_lower = r_upper·Vref/(Vout − Vref), from Vref = Vout·r_lower/(r_upper + r_lower).
     *
     * @throws IllegalArgumentException unless 0 &lt; Vref &lt; Vout
     */
    public static FeedbackDivider forOutput(double rUpper, double voutV, double vrefV) {
        if (!(vrefV > 0 && vrefV < voutV)) {
            throw new IllegalArgumentException("the reference (" + vrefV
                    + " V) must lie between 0 and the output voltage (" + voutV + " V)");
        }
        return new FeedbackDivider(rUpper, rUpper * vrefV / (voutV - vrefV));
    }

    /** Division ratio r_lower/(r_upper + r_lower). */
    public double ratio() {
        return rLower / (rUpper + rLower);
    }

    /** The output voltage this divider regulates to with reference {@code vrefV}. */
    public double regulatedOutputV(double vrefV) {
        return vrefV / ratio();
    }
}
