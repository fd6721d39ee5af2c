package org.flyloop.network;

import java.util.List;
import org.flyloop.linear.Polynomial;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;

/**
 * The exact response of an inverting op-amp stage whose op-amp has a single-pole open-loop gain
 * A(s) = ωt/s, ωt = 2π·gbw.
 *
 * <p>With feedback impedance Zf = Nf/Df, input impedance Zin = Ni/Di (from the output being
 * regulated to the inverting input) and r_lower from the inverting input to ground, the node
 * equation at the inverting input gives the standard inverting-amplifier result
 * <pre>
 *   Gc = (Zf/Zin) · 1 / (1 + (1 + Zf/(Zin‖r_lower)) / A)
 * </pre>
 * which, multiplied out with A = ωt/s, is the rational function
 * <pre>
 *   Gc = ωt·Rl·Nf·Di / ( ωt·Rl·Ni·Df + s·(Rl·Ni·Df + Nf·(Ni + Rl·Di)) ).
 * </pre>
 * No approximation is made: the zeros are those of the ideal network (roots of Nf·Di) and the
 * poles are the roots of the denominator, found numerically. When Df has a root at the origin
 * (an integrating network) the denominator keeps it exactly, because A(s) is unbounded at DC.
 */
final class FiniteGainBandwidth {

    private FiniteGainBandwidth() {
    }

    /**
     * Gc(s) = −v_c/v_out of the stage, exact for a single-pole op-amp.
     *
     * @param nf         numerator of Zf
     * @param df         denominator of Zf
     * @param ni         numerator of Zin
     * @param di         denominator of Zin
     * @param rLower     inverting input to ground, Ω
     * @param gbwHz      op-amp gain-bandwidth product, Hz
     * @param idealZeros the roots of Nf·Di, as the ideal network reports them
     */
    static TransferFunction response(Polynomial nf, Polynomial df, Polynomial ni, Polynomial di,
                                     double rLower, double gbwHz, List<Root> idealZeros) {
        double wt = 2 * Math.PI * gbwHz;
        Polynomial niDf = ni.times(df).times(rLower);
        Polynomial den = niDf.times(wt)
                .plus(niDf.plus(nf.times(ni.plus(di.times(rLower)))).times(Polynomial.monomial(1)));
        // The core's root finder (scaled companion matrix, Newton polishing) gives the poles.
        TransferFunction poles = TransferFunction.fromPolynomials(Polynomial.constant(1), den);
        int integrators = poles.integrators();
        double gain = wt * rLower * nf.coefficient(0) * di.coefficient(0) / den.coefficient(integrators);
        return TransferFunction.of(gain, integrators, idealZeros, poles.poles());
    }
}
