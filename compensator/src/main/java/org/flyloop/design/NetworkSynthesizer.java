package org.flyloop.design;

import java.util.Locale;
import org.flyloop.eseries.ESeries;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.FeedbackDivider;
import org.flyloop.network.GainTarget;
import org.flyloop.network.OpAmpType1Network;
import org.flyloop.network.OpAmpType2Network;
import org.flyloop.network.OpAmpType3Network;
import org.flyloop.network.OtaType2Network;
import org.flyloop.network.ShuntOptoBias;
import org.flyloop.network.ShuntOptoFixedParts;
import org.flyloop.network.ShuntOptoNetwork;
import org.flyloop.network.UnrealisablePlacementException;
import org.flyloop.spec.FeedbackSpec;

/**
 * Turns a {@link Placement} and a gain requirement into part values of the chosen network
 * (ideal values, before rounding).
 */
public final class NetworkSynthesizer {

    /** r_lower when the spec gives neither divider resistor, Ω (common practice, no source). */
    public static final double DEFAULT_R_LOWER = 10e3;

    private NetworkSynthesizer() {
    }

    /** The result: the network, and a note when the request had to be bent (fast-lane floor). */
    public record Synthesis(CompensatorNetwork network, String note) {
    }

    /**
     * Parts that give |Gc(j2π·fc)| = {@code gainAtCrossover} with the placement's zeros and poles.
     *
     * @param ctrNominal the CTR the shunt-opto network is designed at (ignored otherwise)
     */
    public static Synthesis synthesize(DesignRequest request, Placement p, double gainAtCrossover,
                                       double ctrNominal) {
        FeedbackSpec fb = request.feedback();
        FeedbackDivider divider = divider(fb, request.stage().vout());
        GainTarget gain = GainTarget.atFrequency(gainAtCrossover, p.crossoverHz());
        CompensatorNetwork n;
        switch (fb.amplifier()) {
            case OPAMP -> {
                n = switch (p.type()) {
                    case 1 -> OpAmpType1Network.place(divider, gain);
                    case 2 -> OpAmpType2Network.place(divider, gain, p.zerosHz().get(0), p.polesHz().get(0));
                    default -> OpAmpType3Network.place(divider, gain, p.zerosHz().get(0), p.zerosHz().get(1),
                            p.polesHz().get(0), p.polesHz().get(1));
                };
                if (!Double.isNaN(fb.gbwHz())) {
                    n = withGbw(n, fb.gbwHz());
                }
                return new Synthesis(n, null);
            }
            case OTA -> {
                return new Synthesis(OtaType2Network.place(fb.gmS(), divider, gain, p.zerosHz().get(0),
                        p.polesHz().get(0)), null);
            }
            default -> {
                return shuntOpto(request, divider, p, gain, ctrNominal);
            }
        }
    }

    private static CompensatorNetwork withGbw(CompensatorNetwork n, double gbw) {
        if (n instanceof OpAmpType1Network t) {
            return t.withGainBandwidth(gbw);
        }
        if (n instanceof OpAmpType2Network t) {
            return t.withGainBandwidth(gbw);
        }
        return ((OpAmpType3Network) n).withGainBandwidth(gbw);
    }

    private static Synthesis shuntOpto(DesignRequest request, FeedbackDivider divider, Placement p,
                                       GainTarget gain, double ctrNominal) {
        FeedbackSpec fb = request.feedback();
        ShuntOptoBias bias = bias(request);
        if (!(bias.ledResistorHeadroomV() > 0)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "feedback.amplifier: shunt-opto needs the output above led_drop + shunt_min_voltage "
                            + "(%.3g V + %.3g V), but vout is %.3g V; use a low-voltage shunt regulator "
                            + "(set feedback.reference and shunt_min_voltage) or another amplifier",
                    fb.ledDropV(), fb.shuntMinVoltageV(), request.stage().vout()));
        }
        ESeries rSeries = ESeries.parse(request.series().resistors());
        double rBias = Double.isNaN(fb.parts().getOrDefault("r_bias", Double.NaN))
                ? rSeries.atOrBelow(bias.maxBiasResistance()) : fb.parts().get("r_bias");
        double rLed = !Double.isNaN(fb.rLed()) ? fb.rLed()
                : rSeries.atOrBelow(bias.maxLedResistance(fb.rPullup(), rBias));
        ShuntOptoFixedParts fixed = new ShuntOptoFixedParts(divider, rLed, rBias, ctrNominal, fb.rPullup(),
                fb.optoCapacitance(), 0);
        if (p.type() == 1) {
            return new Synthesis(ShuntOptoNetwork.placeType1(fixed, fbZero(p), p.polesHz().get(0)), null);
        }
        try {
            return new Synthesis(ShuntOptoNetwork.place(fixed, gain, p.zerosHz().get(0), p.polesHz().get(0)), null);
        } catch (UnrealisablePlacementException floor) {
            // The fast lane sets a mid-band gain above what the crossover asks for: keep r_led (the
            // bias needs it) and take the type 1 form at the floor gain; the crossover then rises.
            ShuntOptoNetwork n = ShuntOptoNetwork.placeType1(fixed, p.zerosHz().get(0), p.polesHz().get(0));
            return new Synthesis(n, String.format(Locale.ROOT,
                    "fast-lane floor: with r_led = %.4g Ω the mid-band gain cannot fall below CTR·r_pullup/r_led "
                            + "= %.3g, above what a %.4g Hz crossover needs; r_zero is left out and the "
                            + "crossover rises", rLed, n.fastLaneFloor(), p.crossoverHz()));
        }
    }

    private static double fbZero(Placement p) {
        return p.zerosHz().isEmpty() ? p.crossoverHz() / 3 : p.zerosHz().get(0);
    }

    /** The bias constraints of the spec's shunt-opto choices at the lowest CTR. */
    public static ShuntOptoBias bias(DesignRequest request) {
        FeedbackSpec fb = request.feedback();
        return new ShuntOptoBias(request.stage().vout(), fb.pullupSupplyV(), fb.fbMinV(), fb.ledDropV(),
                fb.shuntMinVoltageV(), fb.shuntMinCurrentA(), fb.ctr().min());
    }

    /**
     * The divider: r_upper as given, else from r_lower (given or {@value #DEFAULT_R_LOWER} Ω) as
     * r_upper = r_lower·(Vout − Vref)/Vref.
     */
    public static FeedbackDivider divider(FeedbackSpec fb, double vout) {
        double vref = fb.referenceV();
        if (!(vref > 0 && vref < vout)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "feedback.reference (%.4g V) must lie between 0 and the output voltage (%.4g V)", vref, vout));
        }
        if (!Double.isNaN(fb.rUpper())) {
            return Double.isNaN(fb.rLower()) ? FeedbackDivider.forOutput(fb.rUpper(), vout, vref)
                    : new FeedbackDivider(fb.rUpper(), fb.rLower());
        }
        double rLower = Double.isNaN(fb.rLower()) ? DEFAULT_R_LOWER : fb.rLower();
        return new FeedbackDivider(rLower * (vout - vref) / vref, rLower);
    }
}
