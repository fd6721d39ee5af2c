package org.flyloop.network;

/**
 * The parts of a shunt-opto network that are chosen before placing its zero and pole: the divider,
 * the LED and bias resistors (from {@link ShuntOptoBias}), the optocoupler and the controller's
 * pull-up.
 *
 * @param divider     r_upper/r_lower into the shunt regulator's reference
 * @param rLed        output to LED anode, Ω
 * @param rBias       across the LED, Ω
 * @param ctr         optocoupler current transfer ratio for the transfer function
 * @param rPullup     feedback pin to the feedback supply, Ω
 * @param cOpto       equivalent capacitance of the optocoupler's own pole, F (0: none)
 * @param rLedDynamic LED dynamic resistance, Ω (0: ideal LED)
 */
public record ShuntOptoFixedParts(FeedbackDivider divider, double rLed, double rBias, double ctr,
                                  double rPullup, double cOpto, double rLedDynamic) {

    public ShuntOptoFixedParts {
        if (divider == null) {
            throw new IllegalArgumentException("the shunt-opto network needs a divider");
        }
        PartChecks.positive(PartNames.R_LED, rLed);
        PartChecks.positive(PartNames.R_BIAS, rBias);
        PartChecks.positive(PartNames.CTR, ctr);
        PartChecks.positive(PartNames.R_PULLUP, rPullup);
        PartChecks.nonNegative(PartNames.C_OPTO, cOpto);
        PartChecks.nonNegative(PartNames.R_LED_DYNAMIC, rLedDynamic);
    }

    /**
     * Fixed parts with an ideal LED and the optocoupler pole given in hertz at this r_pullup,
     * turned into C_opto = 1/(2π·opto_pole·r_pullup).
     */
    public static ShuntOptoFixedParts withOptoPoleHz(FeedbackDivider divider, double rLed, double rBias,
                                                     double ctr, double rPullup, double optoPoleHz) {
        return new ShuntOptoFixedParts(divider, rLed, rBias, ctr, rPullup,
                ShuntOptoNetwork.equivalentOptoCapacitance(optoPoleHz, rPullup), 0);
    }
}
