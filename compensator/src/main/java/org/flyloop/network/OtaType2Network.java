package org.flyloop.network;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;

/**
 * Transconductance amplifier type 2: the divider r_upper/r_lower feeds the OTA's inverting input;
 * from the OTA output to ground, r_zero in series with c_zero, and c_pole alongside.
 *
 * <p>Unlike the op-amp networks, the divider scales the AC gain here: there is no virtual earth,
 * the OTA senses the divided output directly. The OTA is ideal: infinite input and output
 * resistance, flat transconductance.
 *
 * @param gm     OTA transconductance, S
 * @param rUpper output to sensing node, Ω
 * @param rLower sensing node to ground, Ω
 * @param rZero  series resistor of the output zero branch, Ω
 * @param cZero  series capacitor of the output zero branch, F
 * @param cPole  capacitor from the OTA output to ground, F
 */
public record OtaType2Network(double gm, double rUpper, double rLower, double rZero, double cZero,
                              double cPole) implements CompensatorNetwork {

    public OtaType2Network {
        PartChecks.positive(PartNames.GM, gm);
        PartChecks.positive(PartNames.R_UPPER, rUpper);
        PartChecks.positive(PartNames.R_LOWER, rLower);
        PartChecks.positive(PartNames.R_ZERO, rZero);
        PartChecks.positive(PartNames.C_ZERO, cZero);
        PartChecks.positive(PartNames.C_POLE, cPole);
    }

    /**
     * Parts from a zero, a pole and a gain target. With k the divider ratio and ωI the integrator
     * gain the target asks for, Cz + Cp = gm·k/ωI and the branch follows from
     * {@link ZeroPoleBranch#design}. The mid-band gain is then about gm·k·r_zero.
     *
     * @throws UnrealisablePlacementException unless zeroHz &lt; poleHz
     */
    public static OtaType2Network place(double gm, FeedbackDivider divider, GainTarget gain,
                                        double zeroHz, double poleHz) {
        PartChecks.positive(PartNames.GM, gm);
        PartChecks.positive("zero frequency", zeroHz);
        PartChecks.positive("pole frequency", poleHz);
        double wI = gain.integratorRadPerS(List.of(Root.realAtHz(zeroHz)), List.of(Root.realAtHz(poleHz)));
        ZeroPoleBranch b = ZeroPoleBranch.design(gm * divider.ratio() / wI, zeroHz, poleHz,
                NetworkKind.OTA.specName());
        return new OtaType2Network(gm, divider.rUpper(), divider.rLower(), b.rZero(), b.cZero(), b.cPole());
    }

    /** Builds from named parts: gm, r_upper, r_lower, r_zero, c_zero, c_pole. */
    public static OtaType2Network fromParts(Map<String, Double> parts) {
        PartReader r = new PartReader(NetworkKind.OTA.specName(), parts);
        OtaType2Network n = new OtaType2Network(r.required(PartNames.GM), r.required(PartNames.R_UPPER),
                r.required(PartNames.R_LOWER), r.required(PartNames.R_ZERO),
                r.required(PartNames.C_ZERO), r.required(PartNames.C_POLE));
        r.requireAllUsed();
        return n;
    }

    @Override
    public NetworkKind kind() {
        return NetworkKind.OTA;
    }

    @Override
    public Map<String, Double> parts() {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put(PartNames.GM, gm);
        m.put(PartNames.R_UPPER, rUpper);
        m.put(PartNames.R_LOWER, rLower);
        m.put(PartNames.R_ZERO, rZero);
        m.put(PartNames.C_ZERO, cZero);
        m.put(PartNames.C_POLE, cPole);
        return Collections.unmodifiableMap(m);
    }

    /**
     * v_fb = k·v_out with k = r_lower/(r_upper + r_lower); the OTA drives i = −gm·v_fb into the
     * output impedance Z of the {@link ZeroPoleBranch}; so Gc = −v_c/v_out = gm·k·Z:
     * Gc = gm·k·(1 + s·Rz·Cz) / (s·(Cz + Cp)·(1 + s·Rz·Cz·Cp/(Cz + Cp))).
     */
    @Override
    public TransferFunction transferFunction() {
        ZeroPoleBranch b = new ZeroPoleBranch(rZero, cZero, cPole);
        double k = rLower / (rUpper + rLower);
        return TransferFunction.of(gm * k / b.totalCapacitance(), 1, List.of(b.zero()), List.of(b.pole()));
    }
}
