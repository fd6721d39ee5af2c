package org.flyloop.network;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flyloop.linear.Polynomial;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;

/**
 * Op-amp type 3: the type 2 network plus r_ff in series with c_ff, that pair across r_upper.
 *
 * <p>Naming of the singularities: the feedback branch gives zero 1 and pole 2, the r_ff–c_ff pair
 * gives zero 2 and pole 1 (common practice, no source: pole 1 usually sits on the output
 * capacitor's ESR zero, pole 2 near half the switching frequency).
 *
 * @param rUpper output to inverting input, Ω
 * @param rLower inverting input to ground, Ω
 * @param rZero  series resistor of the feedback zero branch, Ω
 * @param cZero  series capacitor of the feedback zero branch, F
 * @param cPole  capacitor across the feedback zero branch, F
 * @param rFf    resistor of the pair across r_upper, Ω
 * @param cFf    capacitor of the pair across r_upper, F
 * @param gbwHz  op-amp gain-bandwidth product, Hz; +∞ for an ideal op-amp
 */
public record OpAmpType3Network(double rUpper, double rLower, double rZero, double cZero, double cPole,
                                double rFf, double cFf, double gbwHz) implements CompensatorNetwork {

    public OpAmpType3Network {
        PartChecks.positive(PartNames.R_UPPER, rUpper);
        PartChecks.positive(PartNames.R_LOWER, rLower);
        PartChecks.positive(PartNames.R_ZERO, rZero);
        PartChecks.positive(PartNames.C_ZERO, cZero);
        PartChecks.positive(PartNames.C_POLE, cPole);
        PartChecks.positive(PartNames.R_FF, rFf);
        PartChecks.positive(PartNames.C_FF, cFf);
        PartChecks.positiveOrInfinite(PartNames.GBW, gbwHz);
    }

    /** With an ideal op-amp. */
    public static OpAmpType3Network ideal(double rUpper, double rLower, double rZero, double cZero,
                                          double cPole, double rFf, double cFf) {
        return new OpAmpType3Network(rUpper, rLower, rZero, cZero, cPole, rFf, cFf,
                Double.POSITIVE_INFINITY);
    }

    /**
     * Parts from two zeros, two poles and a gain target, for an ideal op-amp. The pair across
     * r_upper has zero ωz2 = 1/((r_upper + r_ff)·c_ff) and pole ωp1 = 1/(r_ff·c_ff), hence
     * r_ff = r_upper·ωz2/(ωp1 − ωz2) and c_ff = 1/(r_ff·ωp1); the feedback branch takes zero 1 and
     * pole 2 with Cz + Cp = 1/(r_upper·ωI).
     *
     * @throws UnrealisablePlacementException unless zero1Hz &lt; pole2Hz and zero2Hz &lt; pole1Hz
     */
    public static OpAmpType3Network place(FeedbackDivider divider, GainTarget gain, double zero1Hz,
                                          double zero2Hz, double pole1Hz, double pole2Hz) {
        PartChecks.positive("zero 1 frequency", zero1Hz);
        PartChecks.positive("zero 2 frequency", zero2Hz);
        PartChecks.positive("pole 1 frequency", pole1Hz);
        PartChecks.positive("pole 2 frequency", pole2Hz);
        if (!(pole1Hz > zero2Hz)) {
            throw new UnrealisablePlacementException(NetworkKind.OPAMP_TYPE3.specName()
                    + ": pole 1 (" + pole1Hz + " Hz, from r_ff–c_ff) must lie above zero 2 ("
                    + zero2Hz + " Hz); swap the pole assignments if pole 2 is the higher one");
        }
        double rUpper = divider.rUpper();
        double wI = gain.integratorRadPerS(List.of(Root.realAtHz(zero1Hz), Root.realAtHz(zero2Hz)),
                List.of(Root.realAtHz(pole1Hz), Root.realAtHz(pole2Hz)));
        ZeroPoleBranch b = ZeroPoleBranch.design(1 / (rUpper * wI), zero1Hz, pole2Hz,
                NetworkKind.OPAMP_TYPE3.specName() + " feedback branch");
        double rFf = rUpper * zero2Hz / (pole1Hz - zero2Hz);
        double cFf = 1 / (rFf * 2 * Math.PI * pole1Hz);
        return ideal(rUpper, divider.rLower(), b.rZero(), b.cZero(), b.cPole(), rFf, cFf);
    }

    /** Builds from named parts: r_upper, r_lower, r_zero, c_zero, c_pole, r_ff, c_ff, optional gbw. */
    public static OpAmpType3Network fromParts(Map<String, Double> parts) {
        PartReader r = new PartReader(NetworkKind.OPAMP_TYPE3.specName(), parts);
        OpAmpType3Network n = new OpAmpType3Network(r.required(PartNames.R_UPPER),
                r.required(PartNames.R_LOWER), r.required(PartNames.R_ZERO),
                r.required(PartNames.C_ZERO), r.required(PartNames.C_POLE),
                r.required(PartNames.R_FF), r.required(PartNames.C_FF),
                r.optional(PartNames.GBW, Double.POSITIVE_INFINITY));
        r.requireAllUsed();
        return n;
    }

    /** The same network with an op-amp of the given gain-bandwidth (+∞: ideal). */
    public OpAmpType3Network withGainBandwidth(double newGbwHz) {
        return new OpAmpType3Network(rUpper, rLower, rZero, cZero, cPole, rFf, cFf, newGbwHz);
    }

    @Override
    public NetworkKind kind() {
        return NetworkKind.OPAMP_TYPE3;
    }

    @Override
    public Map<String, Double> parts() {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put(PartNames.R_UPPER, rUpper);
        m.put(PartNames.R_LOWER, rLower);
        m.put(PartNames.R_ZERO, rZero);
        m.put(PartNames.C_ZERO, cZero);
        m.put(PartNames.C_POLE, cPole);
        m.put(PartNames.R_FF, rFf);
        m.put(PartNames.C_FF, cFf);
        if (Double.isFinite(gbwHz)) {
            m.put(PartNames.GBW, gbwHz);
        }
        return Collections.unmodifiableMap(m);
    }

    /**
     * Ideal op-amp: Gc = Zf/Zin with Zf the {@link ZeroPoleBranch} and
     * 1/Zin = 1/r_upper + s·c_ff/(1 + s·r_ff·c_ff), i.e.
     * Zin = r_upper·(1 + s·r_ff·c_ff)/(1 + s·(r_upper + r_ff)·c_ff). So
     * Gc = (1 + s·Rz·Cz)(1 + s·(Ru + Rff)·Cff) / (s·Ru·(Cz + Cp)·(1 + s·Rff·Cff)(1 + s·Rz·Cz·Cp/(Cz + Cp))).
     * With finite gbw: the exact single-pole response of {@link FiniteGainBandwidth}.
     */
    @Override
    public TransferFunction transferFunction() {
        ZeroPoleBranch b = new ZeroPoleBranch(rZero, cZero, cPole);
        List<Root> zeros = List.of(b.zero(), Root.real(-1 / ((rUpper + rFf) * cFf)));
        if (Double.isInfinite(gbwHz)) {
            return TransferFunction.of(1 / (rUpper * b.totalCapacitance()), 1, zeros,
                    List.of(Root.real(-1 / (rFf * cFf)), b.pole()));
        }
        return FiniteGainBandwidth.response(b.numerator(), b.denominator(),
                Polynomial.ofAscending(rUpper, rUpper * rFf * cFf), Polynomial.ofAscending(1, (rUpper + rFf) * cFf),
                rLower, gbwHz, zeros);
    }
}
