package org.flyloop.network;

import org.flyloop.linear.Polynomial;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flyloop.linear.TransferFunction;

/**
 * Op-amp integrator: r_upper from the output to the inverting input, c_fb from the op-amp output
 * to the inverting input, r_lower from the inverting input to ground (DC setting only).
 *
 * @param rUpper output to inverting input, Ω
 * @param rLower inverting input to ground, Ω
 * @param cFb    op-amp output to inverting input, F
 * @param gbwHz  op-amp gain-bandwidth product, Hz; +∞ for an ideal op-amp
 */
public record OpAmpType1Network(double rUpper, double rLower, double cFb, double gbwHz)
        implements CompensatorNetwork {

    public OpAmpType1Network {
        PartChecks.positive(PartNames.R_UPPER, rUpper);
        PartChecks.positive(PartNames.R_LOWER, rLower);
        PartChecks.positive(PartNames.C_FB, cFb);
        PartChecks.positiveOrInfinite(PartNames.GBW, gbwHz);
    }

    /** With an ideal op-amp. */
    public static OpAmpType1Network ideal(double rUpper, double rLower, double cFb) {
        return new OpAmpType1Network(rUpper, rLower, cFb, Double.POSITIVE_INFINITY);
    }

    /**
     * Parts for an integrator meeting {@code gain}: Gc = ωI/s, so c_fb = 1/(r_upper·ωI).
     * A mid-band target is meaningless here (no zero) and is rejected.
     */
    public static OpAmpType1Network place(FeedbackDivider divider, GainTarget gain) {
        double wI = gain.integratorRadPerS(List.of(), List.of());
        return ideal(divider.rUpper(), divider.rLower(), 1 / (divider.rUpper() * wI));
    }

    /** Builds from named parts: r_upper, r_lower, c_fb, optional gbw. */
    public static OpAmpType1Network fromParts(Map<String, Double> parts) {
        PartReader r = new PartReader(NetworkKind.OPAMP_TYPE1.specName(), parts);
        OpAmpType1Network n = new OpAmpType1Network(r.required(PartNames.R_UPPER),
                r.required(PartNames.R_LOWER), r.required(PartNames.C_FB),
                r.optional(PartNames.GBW, Double.POSITIVE_INFINITY));
        r.requireAllUsed();
        return n;
    }

    /** The same network with an op-amp of the given gain-bandwidth (+∞: ideal). */
    public OpAmpType1Network withGainBandwidth(double newGbwHz) {
        return new OpAmpType1Network(rUpper, rLower, cFb, newGbwHz);
    }

    @Override
    public NetworkKind kind() {
        return NetworkKind.OPAMP_TYPE1;
    }

    @Override
    public Map<String, Double> parts() {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put(PartNames.R_UPPER, rUpper);
        m.put(PartNames.R_LOWER, rLower);
        m.put(PartNames.C_FB, cFb);
        if (Double.isFinite(gbwHz)) {
            m.put(PartNames.GBW, gbwHz);
        }
        return Collections.unmodifiableMap(m);
    }

    /**
     * Ideal op-amp: Gc = 1/(s·r_upper·c_fb) (virtual earth at the inverting input, so r_lower
     * carries no signal current). With finite gbw: the exact single-pole response of
     * {@link FiniteGainBandwidth} with Zf = 1/(s·c_fb), Zin = r_upper.
     */
    @Override
    public TransferFunction transferFunction() {
        if (Double.isInfinite(gbwHz)) {
            return TransferFunction.integrators(1 / (rUpper * cFb), 1);
        }
        return FiniteGainBandwidth.response(Polynomial.ofAscending(1), Polynomial.ofAscending(0, cFb),
                Polynomial.ofAscending(rUpper), Polynomial.ofAscending(1), rLower, gbwHz, List.of());
    }
}
