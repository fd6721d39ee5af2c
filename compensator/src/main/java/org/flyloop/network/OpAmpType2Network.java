package org.flyloop.network;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flyloop.linear.Polynomial;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;

/**
 * Op-amp type 2: r_upper from the output to the inverting input; from the op-amp output to the
 * inverting input, r_zero in series with c_zero, and c_pole across that pair; r_lower from the
 * inverting input to ground (DC setting only).
 *
 * @param rUpper output to inverting input, Ω
 * @param rLower inverting input to ground, Ω
 * @param rZero  series resistor of the feedback zero branch, Ω
 * @param cZero  series capacitor of the feedback zero branch, F
 * @param cPole  capacitor across the zero branch, F
 * @param gbwHz  op-amp gain-bandwidth product, Hz; +∞ for an ideal op-amp
 */
public record OpAmpType2Network(double rUpper, double rLower, double rZero, double cZero, double cPole,
                                double gbwHz) implements CompensatorNetwork {

    public OpAmpType2Network {
        PartChecks.positive(PartNames.R_UPPER, rUpper);
        PartChecks.positive(PartNames.R_LOWER, rLower);
        PartChecks.positive(PartNames.R_ZERO, rZero);
        PartChecks.positive(PartNames.C_ZERO, cZero);
        PartChecks.positive(PartNames.C_POLE, cPole);
        PartChecks.positiveOrInfinite(PartNames.GBW, gbwHz);
    }

    /** With an ideal op-amp. */
    public static OpAmpType2Network ideal(double rUpper, double rLower, double rZero, double cZero,
                                          double cPole) {
        return new OpAmpType2Network(rUpper, rLower, rZero, cZero, cPole, Double.POSITIVE_INFINITY);
    }

    /**
     * Parts from a zero, a pole and a gain target, for an ideal op-amp. With ωI the integrator
     * gain the target asks for, Cz + Cp = 1/(r_upper·ωI) and the branch follows from
     * {@link ZeroPoleBranch#design}.
     *
     * @throws UnrealisablePlacementException unless zeroHz &lt; poleHz
     */
    public static OpAmpType2Network place(FeedbackDivider divider, GainTarget gain, double zeroHz,
                                          double poleHz) {
        PartChecks.positive("zero frequency", zeroHz);
        PartChecks.positive("pole frequency", poleHz);
        double wI = gain.integratorRadPerS(List.of(Root.realAtHz(zeroHz)), List.of(Root.realAtHz(poleHz)));
        ZeroPoleBranch b = ZeroPoleBranch.design(1 / (divider.rUpper() * wI), zeroHz, poleHz,
                NetworkKind.OPAMP_TYPE2.specName());
        return ideal(divider.rUpper(), divider.rLower(), b.rZero(), b.cZero(), b.cPole());
    }

    /** Builds from named parts: r_upper, r_lower, r_zero, c_zero, c_pole, optional gbw. */
    public static OpAmpType2Network fromParts(Map<String, Double> parts) {
        PartReader r = new PartReader(NetworkKind.OPAMP_TYPE2.specName(), parts);
        OpAmpType2Network n = new OpAmpType2Network(r.required(PartNames.R_UPPER),
                r.required(PartNames.R_LOWER), r.required(PartNames.R_ZERO),
                r.required(PartNames.C_ZERO), r.required(PartNames.C_POLE),
                r.optional(PartNames.GBW, Double.POSITIVE_INFINITY));
        r.requireAllUsed();
        return n;
    }

    /** The same network with an op-amp of the given gain-bandwidth (+∞: ideal). */
    public OpAmpType2Network withGainBandwidth(double newGbwHz) {
        return new OpAmpType2Network(rUpper, rLower, rZero, cZero, cPole, newGbwHz);
    }

    @Override
    public NetworkKind kind() {
        return NetworkKind.OPAMP_TYPE2;
    }

    @Override
    public Map<String, Double> parts() {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put(PartNames.R_UPPER, rUpper);
        m.put(PartNames.R_LOWER, rLower);
        m.put(PartNames.R_ZERO, rZero);
        m.put(PartNames.C_ZERO, cZero);
        m.put(PartNames.C_POLE, cPole);
        if (Double.isFinite(gbwHz)) {
            m.put(PartNames.GBW, gbwHz);
        }
        return Collections.unmodifiableMap(m);
    }

    /**
     * Ideal op-amp: Gc = Zf/r_upper with Zf the {@link ZeroPoleBranch}:
     * Gc = (1 + s·Rz·Cz) / (s·r_upper·(Cz + Cp)·(1 + s·Rz·Cz·Cp/(Cz + Cp))).
     * With finite gbw: the exact single-pole response of {@link FiniteGainBandwidth}.
     */
    @Override
    public TransferFunction transferFunction() {
        ZeroPoleBranch b = new ZeroPoleBranch(rZero, cZero, cPole);
        List<Root> zeros = List.of(b.zero());
        if (Double.isInfinite(gbwHz)) {
            return TransferFunction.of(1 / (rUpper * b.totalCapacitance()), 1, zeros, List.of(b.pole()));
        }
        return FiniteGainBandwidth.response(b.numerator(), b.denominator(), Polynomial.ofAscending(rUpper),
                Polynomial.ofAscending(1), rLower, gbwHz, zeros);
    }
}
