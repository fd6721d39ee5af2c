package org.flyloop.network;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Comparator;
import java.util.List;
import org.flyloop.linear.Polynomial;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.junit.jupiter.api.Test;

/**
 * The exact single-pole op-amp response: its agreement with the nodal circuit is in
 * {@link NetworkNodalTest}; here its limits and the root finder it relies on.
 */
class FiniteGainBandwidthTest {

    @Test
    void approachesTheIdealResponseAsGainBandwidthGrows() {
        OpAmpType3Network ideal = OpAmpType3Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12, 1e3, 4.7e-9);
        TransferFunction exact = ideal.withGainBandwidth(1e13).transferFunction();
        for (double f : new double[] {1, 100, 1e4, 1e5}) {
            double rel = exact.evaluate(f).subtract(ideal.transferFunction().evaluate(f)).abs()
                    / ideal.transferFunction().magnitude(f);
            assertTrue(rel < 1e-6, "f = " + f + ": " + rel);
        }
    }

    @Test
    void keepsTheIntegratorBecauseTheOpAmpGainIsUnboundedAtDc() {
        assertEquals(1, OpAmpType2Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12)
                .withGainBandwidth(1e6).transferFunction().integrators());
    }

    /**
     * Type 1 by hand: the general result with Zf = 1/(sC), Zin = Ru gives
     * Gc = ωt·Rl / (s·(ωt·Ru·Rl·C + s·Ru·Rl·C + Ru + Rl)), one extra pole at
     * ωt + (Ru + Rl)/(Ru·Rl·C) and low-frequency integrator gain ωt·Rl/(ωt·Ru·Rl·C + Ru + Rl).
     */
    @Test
    void type1ExtraPoleMatchesTheHandDerivation() {
        double ru = 10e3, rl = 2.61e3, c = 47e-9, wt = 2 * Math.PI * 1e5;
        TransferFunction tf = OpAmpType1Network.ideal(ru, rl, c).withGainBandwidth(1e5).transferFunction();
        assertEquals(1, tf.poles().size());
        double pole = wt + (ru + rl) / (ru * rl * c);
        assertEquals(pole, tf.poles().get(0).omega0(), pole * 1e-12);
        double gain = wt * rl / (wt * ru * rl * c + ru + rl);
        assertEquals(gain, tf.gain(), gain * 1e-12);
    }

    @Test
    void polesOfAWidelySpreadDenominator() {
        // (s + 1)(s + 1e6)(s² + 2s + 5) = (s² + 1000001 s + 1e6)(s² + 2 s + 5), multiplied out by hand:
        // s⁴ + 1000003 s³ + 3000007 s² + 7000005 s + 5e6.
        List<Root> roots = TransferFunction.fromPolynomials(Polynomial.constant(1),
                Polynomial.ofAscending(5e6, 7000005, 3000007, 1000003, 1)).poles();
        roots = roots.stream().sorted(Comparator.comparingDouble(Root::omega0)).toList();
        assertEquals(3, roots.size());
        assertEquals(-1, roots.get(0).re(), 1e-12);
        assertEquals(0, roots.get(0).im(), 0);
        assertEquals(-1, roots.get(1).re(), 1e-12);
        assertEquals(2, roots.get(1).im(), 1e-12);
        assertEquals(-1e6, roots.get(2).re(), 1e-6);
    }
}
